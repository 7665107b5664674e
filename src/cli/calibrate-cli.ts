/** `calibrate` in the command table: its options and help (the command itself is calibrate-command.ts). */
import { CALIBRATE_CLI_OPTIONS, calibrateCommand, calibrateOptionsFromArgs } from './calibrate-command';
import { JSON_OPTION, withHelp, type CliCommand, type CliOption } from './cli-command';

/** `--into BUDGET --sensor ID`, shared by the commands that write rows into a budget. */
export const INTO_OPTIONS: Record<string, CliOption> = {
  into: { type: 'string', value: 'BUDGET', help: 'write the rows into this budget file' },
  sensor: { type: 'string', value: 'ID', help: 'the sensor of BUDGET whose rows are written' },
};

export const CALIBRATE_COMMAND: CliCommand = {
  operands: ['LOG'],
  synopsis: '--measured NAME --truth NAME --unit UNIT [--json] [--into BUDGET --sensor ID]',
  description: [
    'offset and scale factor of a sensor against known truth, by least squares;',
    "with --into BUDGET --sensor ID their uncertainties go into the sensor's",
    'turn-on-bias and scale-factor rows',
  ].join('\n'),
  options: {
    ...withHelp(CALIBRATE_CLI_OPTIONS, {
      measured: { value: 'NAME', help: 'header of the measured column' },
      truth: { value: 'NAME', help: 'header of the truth column' },
      unit: { value: 'UNIT', help: 'unit of both columns' },
    }),
    ...JSON_OPTION,
    ...INTO_OPTIONS,
  },
  run: ([file], values, io) => calibrateCommand(calibrateOptionsFromArgs(file, values), io),
};
