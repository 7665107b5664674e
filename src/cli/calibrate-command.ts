/**
 * `sigma-ledger calibrate FILE --measured NAME --truth NAME --unit UNIT
 * [--json]`: offset and scale factor of a sensor from a log of its output
 * beside known truth, with standard deviations and a residual whiteness
 * check. The file is streamed as for `allan` (same size limit).
 */
import { InputError } from '../errors';
import { fitOffsetAndScaleFactor } from '../calibration/linear-calibration';
import { checkResidualWhiteness } from '../calibration/residual-whiteness';
import { calibrationReport, checkCalibrationUnit, formatCalibrationText } from '../calibration/calibration-report';
import { readLogFile, type ParsedValues } from './allan-command';
import { EXIT, exitOnInputError, type Io } from './commands';
import { calibrationCandidates } from '../edits/calibration-rows';
import { CALIBRATION_TARGET_KIND } from '../edits/log-targets';
import { unitDimension } from '../units';
import { intoTarget, logSource, openTarget, writePlans, type IntoTarget } from './write-into-budget';

/** Options of `calibrate`, as parsed from the command line. */
export interface CalibrateCommandOptions {
  readonly file: string;
  /** Header name of the sensor-output column. */
  readonly measured: string;
  /** Header name of the truth column. */
  readonly truth: string;
  /** Unit of both columns. */
  readonly unit: string;
  readonly json: boolean;
  /** Write the offset's and scale factor's uncertainty into this budget's sensor. */
  readonly into?: IntoTarget;
}

/** The options `calibrate` adds to the command line, in node:util parseArgs form (besides `--json`, which main.ts already has). */
export const CALIBRATE_CLI_OPTIONS = {
  measured: { type: 'string' },
  truth: { type: 'string' },
  unit: { type: 'string' },
} as const;

/** Fewest residuals the whiteness check takes. */
const MIN_WHITENESS_SAMPLES = 10;

/**
 * Turns parsed command-line values into {@link CalibrateCommandOptions}.
 * @throws InputError naming the option when one is missing.
 */
export function calibrateOptionsFromArgs(file: string, values: ParsedValues): CalibrateCommandOptions {
  const get = (key: string, example: string): string => {
    const v = values[key];
    if (typeof v !== 'string' || v === '') throw new InputError(`--${key}`, `is required, e.g. --${key} ${example}`);
    return v;
  };
  return {
    file, measured: get('measured', 'gyro_z'), truth: get('truth', 'table_rate'), unit: get('unit', 'deg/s'), json: values.json === true,
    into: intoTarget(values),
  };
}

/** Writes the turn-on-bias and scale-factor rows the target takes; returns what was written and skipped. */
function writeCalibration(options: CalibrateCommandOptions, target: IntoTarget, samples: number, report: ReturnType<typeof calibrationReport>): string[] {
  const dim = unitDimension(options.unit);
  const { doc, index } = openTarget(target, dim && CALIBRATION_TARGET_KIND[dim]);
  const candidates = calibrationCandidates(report, doc.sensors[index].kind, logSource(options.file, samples));
  const plans = candidates.flatMap((c) => (c.plan ? [c.plan] : []));
  const skipped = candidates.filter((c) => !c.plan).map((c) => `  skipped ${c.label}: ${c.refusal}`);
  return [...writePlans(target, doc, index, plans), ...skipped];
}

/**
 * Runs `calibrate`.
 * @returns 0 when done, 2 for bad input (file, options or log contents).
 */
export async function calibrateCommand(options: CalibrateCommandOptions, io: Io): Promise<number> {
  return exitOnInputError(io, async () => {
    checkCalibrationUnit(options.unit);
    const table = await readLogFile(options.file, {
      valueColumns: [options.measured, options.truth],
      minimumRows: 3,
      optionNames: { [options.measured]: '--measured', [options.truth]: '--truth' },
    });
    const fit = fitOffsetAndScaleFactor(table.values[0], table.values[1]);
    const whiteness = fit.sampleCount >= MIN_WHITENESS_SAMPLES ? checkResidualWhiteness(fit.residuals) : undefined;
    const report = calibrationReport(fit, whiteness, options.unit);
    const written = options.into ? writeCalibration(options, options.into, fit.sampleCount, report) : [];
    io.out(options.json ? JSON.stringify({ file: options.file, ...report, written }) + '\n' : formatCalibrationText(options.file, report));
    for (const line of written) io.out(options.json ? '' : `${line}\n`);
    return EXIT.pass;
  });
}
