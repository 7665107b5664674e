/**
 * A calibration result in the units a user reads (offset in the log's unit
 * and in SI, scale factor in ppm), as plain data for JSON and as text.
 */
import { InputError } from '../errors';
import { DIMENSIONS, dimensionOf, formatDimension, formatSignificant, readUnit, unitProblemMessage, type ParsedUnit } from '../units';
import type { LinearCalibration } from './linear-calibration';
import type { WhitenessCheck } from './residual-whiteness';

/** A value with its unit, SI value and one standard uncertainty. */
export interface ReportedValue {
  readonly value: number;
  readonly unit: string;
  readonly valueSI: number;
  readonly unitSI: string;
  /** One standard deviation, in `unit`. */
  readonly uncertainty: number;
}

/** The JSON form of a calibration. */
export interface CalibrationReport {
  readonly samples: number;
  readonly offset: ReportedValue;
  /** Scale-factor error in ppm (SI: the plain ratio). */
  readonly scaleFactor: ReportedValue;
  /** Correlation of the offset and scale-factor estimates. */
  readonly correlation: number;
  /** Residual standard deviation in the log's unit. */
  readonly residualStd: number;
  /** Absent below 10 samples. */
  readonly whiteness: WhitenessCheck | null;
}

function readLogUnit(unit: string): ParsedUnit {
  const reading = readUnit(unit);
  if (!reading.ok) throw new InputError('--unit', `${unitProblemMessage(unit, reading)}; give the unit of both columns, e.g. deg/s or m/s`);
  return reading.unit;
}

/**
 * Checks a log unit before the log is read.
 * @throws InputError at '--unit' when the unit is unknown or malformed.
 */
export function checkCalibrationUnit(unit: string): void {
  readLogUnit(unit);
}

/**
 * Labels a calibration with units.
 * @param unit the log's unit (any unit the unit parser reads).
 * @throws InputError at '--unit' when the unit is unknown or malformed.
 */
export function calibrationReport(c: LinearCalibration, whiteness: WhitenessCheck | undefined, unit: string): CalibrationReport {
  const parsed = readLogUnit(unit);
  const name = dimensionOf(parsed);
  const unitSI = name ? DIMENSIONS[name].si : formatDimension(parsed.dimension);
  const f = parsed.factorToSI;
  return {
    samples: c.sampleCount,
    offset: { value: c.offset, unit, valueSI: c.offset * f, unitSI, uncertainty: c.offsetStd },
    scaleFactor: { value: c.scaleFactor * 1e6, unit: 'ppm', valueSI: c.scaleFactor, unitSI: '1', uncertainty: c.scaleFactorStd * 1e6 },
    correlation: c.correlation,
    residualStd: c.residualStd,
    whiteness: whiteness ?? null,
  };
}

const fmt = (x: number): string => formatSignificant(x, 4);

/** The report as text, ending in a newline. Throws nothing. */
export function formatCalibrationText(source: string, r: CalibrationReport): string {
  const w = r.whiteness;
  const whiteLine = !w
    ? 'residual whiteness: not checked (fewer than 10 samples)'
    : `residual whiteness: lag-1 autocorrelation ${fmt(w.lag1Autocorrelation)} (95 % band ±${fmt(w.lag1Bound95)}); ` +
      `Ljung-Box Q = ${fmt(w.ljungBox)} over ${w.ljungBoxLags} lags, p = ${fmt(w.ljungBoxPValue)}: ` +
      (w.white ? 'consistent with white noise' : 'CORRELATED, so the standard deviations above are too small');
  return [
    `${source}: ${r.samples} samples, model measured = (1 + s)·truth + b`,
    `  offset b        ${fmt(r.offset.value)} ± ${fmt(r.offset.uncertainty)} ${r.offset.unit}   (${fmt(r.offset.valueSI)} ${r.offset.unitSI})`,
    `  scale factor s  ${fmt(r.scaleFactor.value)} ± ${fmt(r.scaleFactor.uncertainty)} ppm`,
    `  correlation of b and s ${fmt(r.correlation)}; residual standard deviation ${fmt(r.residualStd)} ${r.offset.unit}`,
    whiteLine,
    '',
  ].join('\n');
}
