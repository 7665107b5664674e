/** `allan` in the command table: its options and help (the command itself is allan-command.ts). */
import { ALLAN_CLI_OPTIONS, allanCommand, allanOptionsFromArgs } from './allan-command';
import { JSON_OPTION, withHelp, type CliCommand, type CliOption } from './cli-command';
import { INTO_OPTIONS } from './calibrate-cli';

const HELP: Record<string, Pick<CliOption, 'value' | 'help'>> = {
  'column': { value: 'NAME', help: 'header of the value column' },
  'unit': { value: 'UNIT', help: 'its unit: a rate (deg/s, m/s², m/s) or an increment per sample (deg, m/s, m)' },
  'time-column': { value: 'NAME', help: 'header of the time column (else --rate)' },
  'time-unit': { value: 'U', help: 'unit of the time column (default s)' },
  'rate': { value: 'HZ', help: 'sample rate, for a log without a time column' },
  'kind': { value: 'gyro|accelerometer|speed', help: "the sensor's kind (default: from the unit)" },
  'gap-tolerance': { value: 'REL', help: 'relative tolerance of a time step (default 0.5)' },
};

export const ALLAN_COMMAND: CliCommand = {
  operands: ['LOG'],
  synopsis: '--column NAME --unit UNIT [--time-column NAME] [--time-unit U] [--rate HZ]\n      [--kind gyro|accelerometer|speed] [--gap-tolerance REL] [--json] [--into BUDGET --sensor ID [--terms slope|fit]]',
  description: [
    'overlapping Allan deviation of a static log (CSV or TSV) and its IEEE Std 952',
    'noise terms, read off by slope and fitted over the whole curve; with',
    '--into BUDGET --sensor ID the terms are written into that sensor\'s rows with',
    '"fitted from LOG, DATE, N samples" as provenance',
  ].join('\n'),
  options: {
    ...withHelp(ALLAN_CLI_OPTIONS, HELP),
    ...JSON_OPTION,
    ...INTO_OPTIONS,
    terms: { type: 'string', value: 'slope|fit', help: 'which reading of the sloped terms --into writes (default slope)' },
  },
  run: ([file], values, io) => allanCommand(allanOptionsFromArgs(file, values), io),
};
