/**
 * A log column to an Allan analysis: unit and sensor kind checked, values
 * converted to SI once, the curve computed and read. Shared by the CLI and
 * (later) the browser, which differ only in how they read the file.
 */
import { InputError } from '../errors';
import { describeExpected, readUnit, unitDimension, unitFor, unitProblemMessage } from '../units';
import { allanDeviationCurve, type AllanCurve, type AllanCurveOptions } from './allan-curve';
import { analyseAllanCurve, type AllanAnalysis, type AllanAnalysisOptions } from './allan-analysis';
import { ALLAN_SENSOR_KINDS, kindFromDimension, SENSOR_TERM_UNITS, type AllanSensorKind } from './sensor-term-units';

/** What to analyse. */
export interface LogAllanRequest {
  /** The column's values in `unit`: rates, or increments per sample. */
  readonly samples: Float64Array;
  /** Unit of the values: a rate (deg/s, m/s², m/s) or an increment (deg, m/s, m). */
  readonly unit: string;
  /** Sample rate in Hz. */
  readonly rateHz: number;
  /** Sensor kind; default from the unit (kindFromDimension). */
  readonly kind?: AllanSensorKind;
  readonly curve?: AllanCurveOptions;
  readonly analysis?: AllanAnalysisOptions;
}

/** One point of the curve in the display unit. */
export interface AllanPoint {
  readonly tau_s: number;
  readonly adev: number;
  readonly lower: number;
  readonly upper: number;
}

/** The outcome of {@link analyseLogColumn}. */
export interface LogAllanResult {
  readonly kind: AllanSensorKind;
  /** Whether the values were rates or increments per sample. */
  readonly input: 'rate' | 'increment';
  /** Unit of `points` (the log's unit for rates; unit/s for increments). */
  readonly adevUnit: string;
  readonly points: readonly AllanPoint[];
  /** The curve in SI (rad/s, m/s², m/s). */
  readonly curveSI: AllanCurve;
  readonly analysis: AllanAnalysis;
}

/**
 * The sensor kind of a log and whether its values are rates or increments,
 * from its unit and the kind if given. Cheap: call it before reading a big file.
 * @throws InputError at '--unit' (or '--kind') when they do not fit together.
 */
export function resolveLogKind(unit: string, kind: AllanSensorKind | undefined): { kind: AllanSensorKind; input: 'rate' | 'increment' } {
  if (kind !== undefined && !ALLAN_SENSOR_KINDS.includes(kind)) {
    throw new InputError('--kind', `must be one of ${ALLAN_SENSOR_KINDS.join(', ')}, got "${kind}"`);
  }
  const dimension = unitDimension(unit);
  const chosen = kind ?? kindFromDimension(dimension);
  if (chosen === undefined) {
    const reading = readUnit(unit);
    if (!reading.ok) throw new InputError('--unit', `${unitProblemMessage(unit, reading)}; use e.g. deg/s, deg, m/s², m/s or m`);
    throw new InputError('--unit', `'${unit}' is not a rate or an increment of a gyro, accelerometer or speed sensor; use e.g. deg/s, deg, m/s², m/s or m`);
  }
  const units = SENSOR_TERM_UNITS[chosen];
  if (dimension === units.rateDimension) return { kind: chosen, input: 'rate' };
  if (dimension === units.incrementDimension) return { kind: chosen, input: 'increment' };
  throw new InputError('--unit', `a ${chosen} log needs ${describeExpected(units.rateDimension)} (rates) or ${describeExpected(units.incrementDimension)} (increments per sample), got '${unit}'`);
}

/**
 * Computes and reads the Allan curve of one log column.
 * @throws InputError for a unit that fits no sensor kind (or not the kind
 *   given), a bad rate, too few samples, or a constant column.
 */
export function analyseLogColumn(request: LogAllanRequest): LogAllanResult {
  const { kind, input } = resolveLogKind(request.unit, request.kind);
  const units = SENSOR_TERM_UNITS[kind];
  const adevUnit = input === 'rate' ? request.unit : `${request.unit}/s`;
  const toSI = unitFor(request.unit, input === 'rate' ? units.rateDimension : units.incrementDimension, '--unit').factorToSI;
  // Increments become rates Δθ/τ₀: the θ form with θ₀ = 0 (L = N + 1), see allan-estimators.ts.
  const scale = input === 'rate' ? toSI : toSI * request.rateHz;
  const rateSI = new Float64Array(request.samples.length);
  for (let i = 0; i < rateSI.length; i++) rateSI[i] = request.samples[i] * scale;
  const curveSI = allanDeviationCurve(rateSI, request.rateHz, request.curve);
  const fromSI = 1 / unitFor(adevUnit, units.rateDimension, '--unit').factorToSI;
  const points = Array.from(curveSI.tauS, (tau_s, i) => ({
    tau_s, adev: curveSI.adev[i] * fromSI, lower: curveSI.lower[i] * fromSI, upper: curveSI.upper[i] * fromSI,
  }));
  return { kind, input, adevUnit, points, curveSI, analysis: analyseAllanCurve(curveSI, kind, request.analysis) };
}
