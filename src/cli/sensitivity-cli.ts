/** `sensitivity` in the command table: its options and help (the command itself is sensitivity-command.ts). */
import { sensitivityCommand } from './sensitivity-command';
import { JSON_OPTION, type CliCommand } from './cli-command';

export const SENSITIVITY_COMMAND: CliCommand = {
  operands: ['FILE'],
  synopsis: '[--rows SENSOR.ROW,...] [--range LOW,HIGH] [--json]',
  description: [
    'every value marked assumed (and the rows given) scaled over a range, one at a',
    "time, ranked by the change each makes to every requirement's worst value",
  ].join('\n'),
  options: {
    rows: { type: 'string', value: 'A.B,C.D', help: 'rows to vary besides the assumed values' },
    range: { type: 'string', value: 'LOW,HIGH', help: 'the scales to try (default 0.5,2)' },
    ...JSON_OPTION,
  },
  run: ([file], values, io) => sensitivityCommand(file, values, io),
};
