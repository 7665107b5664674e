/** `r-sweep` in the command table: its options and help (the command itself is r-sweep-command.ts). */
import { rSweepCommand } from './r-sweep-command';
import { JSON_OPTION, type CliCommand } from './cli-command';

export const R_SWEEP_COMMAND: CliCommand = {
  operands: ['FILE'],
  synopsis: '--sensor ID [--json]',
  description: [
    "one aiding sensor's R in the filter scaled from x0.1 to x10: each requirement's",
    'actual and believed worst value (what inflating or trusting R costs)',
  ].join('\n'),
  options: {
    sensor: { type: 'string', value: 'ID', help: 'the aiding sensor whose R the filter scales' },
    ...JSON_OPTION,
  },
  run: ([file], values, io) => rSweepCommand(file, values, io),
};
