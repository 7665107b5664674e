/**
 * `sigma-ledger allan FILE --column NAME --unit UNIT [--time-column NAME]
 * [--time-unit s] [--rate HZ] [--kind gyro|accelerometer|speed]
 * [--gap-tolerance REL] [--json]`: the overlapping Allan deviation of one log
 * column and the IEEE Std 952 noise terms read from it.
 *
 * The file is streamed (256 KiB chunks into the pure parser), never loaded
 * whole; files over {@link MAX_LOG_BYTES} are refused before reading.
 */
import { createReadStream } from 'node:fs';
import { stat } from 'node:fs/promises';
import { SigmaLedgerError, InputError } from '../errors';
import { analyseLogColumn, resolveLogKind, type LogAllanResult } from '../allan/log-allan';
import { SensorLogReader, type LogParseOptions, type SensorLogTable } from '../allan/parse-log';
import { ALLAN_SENSOR_KINDS, type AllanSensorKind } from '../allan/sensor-term-units';
import { formatAllanText } from '../allan/allan-text';
import { unitFor } from '../units';
import { EXIT, exitOnInputError, type Io } from './commands';
import { allanCandidates, type TermMethod } from '../edits/allan-rows';
import { ALLAN_TARGET_KIND } from '../edits/log-targets';
import { intoTarget, logSource, openTarget, writePlans, type IntoTarget } from './write-into-budget';

/** Largest log read, in bytes (1 GiB: about 40 million rows of a time and a value; about 1 GB of memory while reading). */
export const MAX_LOG_BYTES = 1024 ** 3;

/** Chunk size of the file stream, in bytes. */
const CHUNK_BYTES = 1 << 18;

/** Options of `allan`, as parsed from the command line. */
export interface AllanCommandOptions {
  readonly file: string;
  /** Header name of the value column. */
  readonly column: string;
  /** Unit of the value column (rates: deg/s, m/s², m/s; increments: deg, m/s, m). */
  readonly unit: string;
  readonly timeColumn?: string;
  /** Unit of the time column; default s. */
  readonly timeUnit?: string;
  /** Sample rate in Hz, when the log has no time column. */
  readonly rateHz?: number;
  readonly kind?: AllanSensorKind;
  /** Relative tolerance of a time step (default 0.5). */
  readonly gapTolerance?: number;
  readonly json: boolean;
  /** Write the terms into this budget's sensor. */
  readonly into?: IntoTarget;
  /** Which reading supplies the sloped terms written with --into (default the slope read-offs). */
  readonly terms?: TermMethod;
}

/** The options `allan` adds to the command line, in node:util parseArgs form (besides `--json`, which main.ts already has). */
export const ALLAN_CLI_OPTIONS = {
  'column': { type: 'string' },
  'unit': { type: 'string' },
  'time-column': { type: 'string' },
  'time-unit': { type: 'string' },
  'rate': { type: 'string' },
  'kind': { type: 'string' },
  'gap-tolerance': { type: 'string' },
} as const;

/** Values as node:util parseArgs returns them. */
export type ParsedValues = Readonly<Record<string, string | boolean | undefined>>;

function text(values: ParsedValues, key: string): string | undefined {
  const v = values[key];
  return typeof v === 'string' ? v : undefined;
}

function positive(values: ParsedValues, key: string): number | undefined {
  const t = text(values, key);
  if (t === undefined) return undefined;
  const v = Number(t);
  if (!(v > 0) || !Number.isFinite(v)) throw new InputError(`--${key}`, `must be a positive number, got "${t}"`);
  return v;
}

function termMethod(values: ParsedValues): TermMethod | undefined {
  const t = text(values, 'terms');
  if (t === undefined || t === 'slope' || t === 'fit') return t;
  throw new InputError('--terms', `must be "slope" (the slope read-offs) or "fit" (the whole-curve fit), got "${t}"`);
}

/**
 * Turns parsed command-line values into {@link AllanCommandOptions}.
 * @throws InputError naming the option when one is missing or malformed.
 */
export function allanOptionsFromArgs(file: string, values: ParsedValues): AllanCommandOptions {
  const column = text(values, 'column'), unit = text(values, 'unit');
  if (!column) throw new InputError('--column', 'name the value column, e.g. --column gyro_z');
  if (!unit) throw new InputError('--unit', 'give the unit of the value column, e.g. --unit deg/s');
  const kind = text(values, 'kind');
  if (kind !== undefined && !(ALLAN_SENSOR_KINDS as readonly string[]).includes(kind)) {
    throw new InputError('--kind', `must be one of ${ALLAN_SENSOR_KINDS.join(', ')}, got "${kind}"`);
  }
  return {
    file, column, unit, timeColumn: text(values, 'time-column'), timeUnit: text(values, 'time-unit'),
    rateHz: positive(values, 'rate'), kind: kind as AllanSensorKind | undefined, gapTolerance: positive(values, 'gap-tolerance'),
    json: values.json === true, into: intoTarget(values), terms: termMethod(values),
  };
}

/**
 * Streams a log file through {@link SensorLogReader}.
 * @throws InputError when the file is missing, not a file, over
 *   {@link MAX_LOG_BYTES}, unreadable, or bad inside (line and column named).
 */
export async function readLogFile(file: string, options: Omit<LogParseOptions, 'sourceName'>): Promise<SensorLogTable> {
  let size: number;
  try {
    const info = await stat(file);
    if (!info.isFile()) throw new InputError(file, 'is not a file; give the path of a CSV or TSV log');
    size = info.size;
  } catch (e) {
    if (e instanceof SigmaLedgerError) throw e;
    throw new InputError(file, `cannot be read (${(e as NodeJS.ErrnoException).code ?? 'error'}); check the path`);
  }
  if (size > MAX_LOG_BYTES) {
    throw new InputError(file, `is ${(size / 1024 ** 3).toFixed(2)} GiB; logs over 1 GiB are refused before reading: split the log or decimate it`);
  }
  const reader = new SensorLogReader({ ...options, sourceName: file });
  try {
    for await (const chunk of createReadStream(file, { encoding: 'utf8', highWaterMark: CHUNK_BYTES })) reader.push(chunk as string);
  } catch (e) {
    if (e instanceof SigmaLedgerError) throw e;
    throw new InputError(file, `reading failed (${(e as NodeJS.ErrnoException).code ?? String(e)})`);
  }
  return reader.finish();
}

/** Time-column names found without --time-column (matched ignoring case), in order. */
export const TIME_COLUMN_NAMES: readonly string[] = ['time', 't', 'time_s'];

/** The JSON form of the result: { file, samples, rateHz, points, terms, … }. */
export function allanJson(file: string, samples: number, rateHz: number, r: LogAllanResult): object {
  return {
    file, samples, rateHz, kind: r.kind, input: r.input, adevUnit: r.adevUnit, estimator: r.curveSI.estimator,
    points: r.points, terms: r.analysis.terms, biasInstability: r.analysis.biasInstability ?? null,
    fit: { chiSquare: r.analysis.fitChiSquare, degreesOfFreedom: r.analysis.fitDegreesOfFreedom },
  };
}

/** Writes the terms that make rows (not held at zero, not mere bounds) into the target; returns what was written and skipped. */
function writeTerms(options: AllanCommandOptions, target: IntoTarget, samples: number, rateHz: number, result: LogAllanResult): string[] {
  const { doc, index } = openTarget(target, ALLAN_TARGET_KIND[result.kind]);
  const candidates = allanCandidates({ result, rateHz }, options.terms ?? 'slope', doc.sensors[index].kind, logSource(options.file, samples));
  const plans = candidates.flatMap((c) => (c.plan && !c.caution ? [c.plan] : []));
  const skipped = candidates.filter((c) => !c.plan || c.caution).map((c) => `  skipped ${c.label}: ${c.refusal ?? c.caution}`);
  const notes = candidates.filter((c) => c.plan && !c.caution && c.note).map((c) => `  ${c.label}: ${c.note}`);
  return [...writePlans(target, doc, index, plans), ...notes, ...skipped];
}

/**
 * Runs `allan`. Writes the table and terms (or JSON) to `io.out`, problems
 * to `io.err` as one message without a stack trace.
 * @returns 0 when done, 2 for bad input (file, options or log contents).
 */
export async function allanCommand(options: AllanCommandOptions, io: Io): Promise<number> {
  return exitOnInputError(io, async () => {
    if (options.rateHz !== undefined && options.timeColumn !== undefined) {
      throw new InputError('--rate', 'give either --time-column (the rate comes from the time stamps) or --rate, not both');
    }
    resolveLogKind(options.unit, options.kind);
    if (options.timeUnit !== undefined) unitFor(options.timeUnit, 'time', '--time-unit');
    const started = performance.now();
    const table = await readLogFile(options.file, {
      valueColumns: [options.column], timeColumn: options.timeColumn, timeUnit: options.timeUnit, gapTolerance: options.gapTolerance,
      // Without --time-column or --rate, a column named time, t or time_s is the time axis.
      timeColumnCandidates: options.rateHz === undefined && options.timeColumn === undefined ? TIME_COLUMN_NAMES : undefined,
      optionNames: { [options.column]: '--column', timeColumn: '--time-column', ...(options.timeColumn ? { [options.timeColumn]: '--time-column' } : {}) },
    });
    const parsed = performance.now();
    const rateHz = table.rateHz ?? options.rateHz!;
    const result = analyseLogColumn({ samples: table.values[0], unit: options.unit, rateHz, kind: options.kind, analysis: { sourceName: options.file } });
    const seconds = (performance.now() - started) / 1000;
    if (seconds > 2) io.err(`read ${table.rowCount} rows in ${((parsed - started) / 1000).toFixed(1)} s, computed in ${((performance.now() - parsed) / 1000).toFixed(1)} s\n`);
    const written = options.into ? writeTerms(options, options.into, table.rowCount, rateHz, result) : [];
    io.out(options.json ? JSON.stringify({ ...allanJson(options.file, table.rowCount, rateHz, result), written }) + '\n' : formatAllanText(options.file, table.rowCount, rateHz, result));
    for (const line of written) io.out(options.json ? '' : `${line}\n`);
    return EXIT.pass;
  });
}
