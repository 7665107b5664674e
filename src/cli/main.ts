import { parseArgs } from 'node:util';
import { SigmaLedgerError } from '../errors';
import { CAUTION } from '../report/caution';
import { checkCommand, EXIT, runCommand, sizeCommand, type Io } from './commands';
import { ALLAN_CLI_OPTIONS, allanCommand, allanOptionsFromArgs } from './allan-command';
import { CALIBRATE_CLI_OPTIONS, calibrateCommand, calibrateOptionsFromArgs } from './calibrate-command';
import { INTO_CLI_OPTIONS } from './write-into-budget';

const USAGE = `sigma-ledger: sensor error budgets by covariance analysis

usage:
  sigma-ledger run FILE [--json] [--every N] [--output OUT]
      the budget's summary: requirement verdicts, margins, time to exceed per
      outage, budgets at checkpoints, the R, Q and P0 used; --json prints the
      full result; --every N keeps the series at every N-th step (plus checkpoints
      and the last) to bound memory; verdicts are still evaluated at every step
  sigma-ledger size FILE --requirement ID --vary SENSOR.ROW [--tolerance REL] [--json]
      the largest value of one row's magnitude that still meets a requirement
  sigma-ledger check FILE
      validate the file and evaluate its cells without running the analysis
  sigma-ledger allan LOG --column NAME --unit UNIT [--time-column NAME] [--time-unit U]
                     [--rate HZ] [--kind gyro|accelerometer|speed] [--gap-tolerance REL] [--json]
      overlapping Allan deviation of a static log (CSV or TSV; without --time-column or
      --rate, a column named time, t or time_s is the time axis) and its IEEE Std 952
      noise terms, read off by slope and fitted over the whole curve; with
      --into BUDGET --sensor ID [--terms slope|fit] the terms are written into
      that sensor's rows with "fitted from LOG, DATE, N samples" as provenance
  sigma-ledger calibrate LOG --measured NAME --truth NAME --unit UNIT [--json]
      offset and scale factor of a sensor against known truth, by least squares;
      with --into BUDGET --sensor ID their uncertainties go into the sensor's
      turn-on-bias and scale-factor rows

exit codes: 0 every requirement holds, 1 some requirement fails, 2 bad input

${CAUTION}
`;

const OPTIONS = {
  json: { type: 'boolean', default: false },
  every: { type: 'string' },
  output: { type: 'string' },
  requirement: { type: 'string' },
  vary: { type: 'string' },
  tolerance: { type: 'string' },
  help: { type: 'boolean', default: false },
  ...ALLAN_CLI_OPTIONS,
  ...CALIBRATE_CLI_OPTIONS,
  ...INTO_CLI_OPTIONS,
} as const;

/** Runs the command line; returns the exit code. Messages for bad input go to `io.err`, never as a stack trace. */
export async function main(argv: string[], io: Io = processIo()): Promise<number> {
  try {
    const { values, positionals } = parseArgs({ args: argv, options: OPTIONS, allowPositionals: true });
    const [command, file, ...extra] = positionals;
    if (values.help || command === 'help') {
      io.out(USAGE);
      return EXIT.pass;
    }
    if (command === undefined) {
      io.err(USAGE);
      return EXIT.badInput;
    }
    if (!file) return usageError(io, `"${command}" needs a file`);
    if (extra.length) return usageError(io, `unexpected argument "${extra[0]}"`);
    switch (command) {
      case 'run':
        return runCommand(file, { json: values.json, every: positiveNumber(values.every, '--every', 1), output: values.output }, io);
      case 'size':
        if (!values.requirement || !values.vary) return usageError(io, 'size needs --requirement ID and --vary SENSOR.ROW');
        return sizeCommand(file, values.requirement, values.vary, relativeTolerance(values.tolerance), values.json, io);
      case 'check':
        return checkCommand(file, io);
      case 'allan':
        return await allanCommand(allanOptionsFromArgs(file, values), io);
      case 'calibrate':
        return await calibrateCommand(calibrateOptionsFromArgs(file, values), io);
      default:
        return usageError(io, `unknown command "${command}"; use run, size, check, allan or calibrate`);
    }
  } catch (e) {
    if (e instanceof SigmaLedgerError) {
      io.err(`error: ${e.message}\n`);
      return EXIT.badInput;
    }
    if (e instanceof TypeError && 'code' in e && String(e.code).startsWith('ERR_PARSE_ARGS')) return usageError(io, e.message);
    throw e;
  }
}

function positiveNumber(text: string | undefined, option: string, fallback: number): number {
  if (text === undefined) return fallback;
  const v = Number(text);
  if (!(v > 0) || !Number.isFinite(v)) throw new SigmaLedgerError(option, `must be a positive number, got "${text}"`);
  return v;
}

function relativeTolerance(text: string | undefined): number {
  const v = positiveNumber(text, '--tolerance', 1e-3);
  if (v >= 0.5) throw new SigmaLedgerError('--tolerance', `is a relative width and must be below 0.5 (e.g. 0.001), got "${text}"`);
  return v;
}

function usageError(io: Io, message: string): number {
  io.err(`error: ${message}\n(see sigma-ledger help)\n`);
  return EXIT.badInput;
}

function processIo(): Io {
  return { out: (t) => process.stdout.write(t), err: (t) => process.stderr.write(t) };
}
