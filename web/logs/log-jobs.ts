/**
 * The work of the sensor-log worker, as plain async functions (the worker
 * file only routes messages): stream a log into the parser, then compute its
 * Allan deviation or its calibration, timing the two stages apart.
 */
import { InputError } from '../../src';
import { analyseLogColumn, resolveLogKind } from '../../src';
import { SensorLogReader } from '../../src';
import type { LogParseOptions, SensorLogTable } from '../../src';
import { fitOffsetAndScaleFactor } from '../../src';
import { checkResidualWhiteness } from '../../src';
import { calibrationReport, checkCalibrationUnit } from '../../src';
import { unitFor } from '../../src';
import type { AllanJobOptions, AllanOutcome, CalibrationJobOptions, CalibrationOutcome, LogProgress } from './log-protocol';
import { readBlobInSlices } from './read-log-blob';

/** Largest log read, in bytes (1 GiB, as the command line; about 40 million rows of a time and a value). */
export const MAX_LOG_BYTES = 1024 ** 3;

/** Fewest residuals the whiteness check takes (as the command line). */
const MIN_WHITENESS_SAMPLES = 10;

/** Progress callback; the worker throttles what it posts. */
export type ProgressSink = (p: LogProgress) => void;

/**
 * Streams `file` through {@link SensorLogReader}.
 * @throws InputError when the file is over {@link MAX_LOG_BYTES} or bad inside (line and column named).
 */
export async function readLog(file: File, options: Omit<LogParseOptions, 'sourceName'>, progress: ProgressSink): Promise<SensorLogTable> {
  if (file.size > MAX_LOG_BYTES) {
    throw new InputError(file.name, `is ${(file.size / 1024 ** 3).toFixed(2)} GiB; logs over 1 GiB are refused before reading: split the log or decimate it`);
  }
  const reader = new SensorLogReader({ ...options, sourceName: file.name });
  await readBlobInSlices(file, (text) => reader.push(text), progress);
  return reader.finish();
}

/** Checks what can be checked before a long read, so a wrong choice fails at once. */
function checkAllanOptions(o: AllanJobOptions): void {
  resolveLogKind(o.unit, o.kind);
  if (o.timeUnit !== undefined) unitFor(o.timeUnit, 'time', 'the time unit');
  if (o.timeColumn === undefined && !(Number(o.rateHz) > 0 && Number.isFinite(o.rateHz))) {
    throw new InputError('sample rate', 'the log has no time column, so give its sample rate in Hz (a number above 0)');
  }
}

/**
 * Reads a log and computes the Allan deviation of one column.
 * @throws InputError for a bad choice of unit and kind, a missing rate, or a bad log.
 */
export async function runAllanJob(file: File, o: AllanJobOptions, progress: ProgressSink): Promise<AllanOutcome> {
  checkAllanOptions(o);
  const started = performance.now();
  const table = await readLog(file, {
    valueColumns: [o.valueColumn], timeColumn: o.timeColumn, timeUnit: o.timeUnit,
    optionNames: { [o.valueColumn]: 'the value column', ...(o.timeColumn !== undefined ? { [o.timeColumn]: 'the time column' } : {}) },
  }, progress);
  const parsed = performance.now();
  const rateHz = table.rateHz ?? o.rateHz!;
  const result = analyseLogColumn({ samples: table.values[0], unit: o.unit, rateHz, kind: o.kind, analysis: { sourceName: file.name } });
  return { fileName: file.name, samples: table.rowCount, rateHz, unit: o.unit, parseMs: parsed - started, computeMs: performance.now() - parsed, result };
}

/**
 * Reads a log of sensor output beside truth and fits offset and scale factor.
 * @throws InputError for an unknown unit, the same column twice, or a bad log.
 */
export async function runCalibrationJob(file: File, o: CalibrationJobOptions, progress: ProgressSink): Promise<CalibrationOutcome> {
  checkCalibrationUnit(o.unit);
  if (o.measuredColumn === o.truthColumn) throw new InputError('truth column', 'pick a truth column other than the measured column');
  const started = performance.now();
  const table = await readLog(file, {
    valueColumns: [o.measuredColumn, o.truthColumn], minimumRows: 3,
    optionNames: { [o.measuredColumn]: 'the measured column', [o.truthColumn]: 'the truth column' },
  }, progress);
  const parsed = performance.now();
  const fit = fitOffsetAndScaleFactor(table.values[0], table.values[1]);
  const whiteness = fit.sampleCount >= MIN_WHITENESS_SAMPLES ? checkResidualWhiteness(fit.residuals) : undefined;
  const report = calibrationReport(fit, whiteness, o.unit);
  return { fileName: file.name, samples: table.rowCount, unit: o.unit, parseMs: parsed - started, computeMs: performance.now() - parsed, report };
}
