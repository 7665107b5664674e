import { InputError } from '../errors';
import { quantityToSI } from '../inputs/checks';
import type { Quantity, SourceInput, SourceKind } from '../inputs/budget-input';
import type { ConversionStep } from '../covariance/error-model';
import { describeConversion, DIMENSIONS, labelWithArticle, unitDimension, type DimensionName } from '../units';

/** A parameter a source kind declares: its field, the dimensions it accepts and its valid range. */
export interface ParameterSpec {
  field: 'value' | 'correlationTime' | 'rate';
  label: string;
  /** Accepted dimensions; which one the unit has decides the form (e.g. a random walk or a per-sample sigma). */
  dimensions: DimensionName[];
  /** Human-readable valid range, also enforced by the resolver. */
  range: string;
  required: boolean;
}

/** The option fields a row can carry (one applies to a row at most; see {@link RowOptionSpec}). */
export type OptionField = 'biasForm' | 'densitySides' | 'multipathModel' | 'component' | 'quantum';

/** A model option of a row: its field, the choices in words, and the value meant when it is omitted. */
export interface RowOptionSpec {
  field: OptionField;
  label: string;
  choices: readonly { value: string; label: string }[];
  /** The value meant when the field is omitted, given the dimension of the row's unit (undefined: unknown unit). */
  fallback(unitDimension: DimensionName | undefined): string;
  /** Whether the option applies to a row with this unit dimension and this value of the field (default: always). */
  appliesTo?(unitDimension: DimensionName | undefined, current: string | undefined): boolean;
}

/** A cell a new row gets when nobody typed one, marked as assumed with a note saying so. */
export interface AssumedCell {
  field: 'correlationTime';
  value: number;
  unit: string;
  /** Provenance text added to the row. */
  note: string;
}

/** What every error-source model file exports. */
export interface SourceKindSpec {
  kind: SourceKind;
  label: string;
  /** One line for tooltips and docs. */
  summary: string;
  parameters: ParameterSpec[];
  /** Id stem of a new row of this kind (`bi`, then `bi2`, ...). */
  idBase: string;
  /** The model option of this kind's rows, when it has one (a sensor may declare its own instead). */
  option?: RowOptionSpec;
  /** Value written into the option field of a new row, when the kind wants one written out. */
  newRowOption?: string;
  /** Required cells a new row gets filled in, marked as assumed. */
  assumedCells?: readonly AssumedCell[];
}

/** Reads one quantity of a row, converts it to SI and records the conversion. */
export function readParameter(
  q: Quantity | undefined,
  expected: DimensionName,
  path: string,
  field: string,
  conversions: ConversionStep[],
): number {
  const si = quantityToSI(q, expected, path);
  conversions.push({ field, text: describeConversion(q!.value, q!.unit, expected).text });
  return si;
}

/** Like {@link readParameter}; the value must be >= 0 (sigmas, coefficients, LSBs). */
export function readMagnitude(q: Quantity | undefined, expected: DimensionName, path: string, conversions: ConversionStep[]): number {
  const si = readParameter(q, expected, path, 'value', conversions);
  if (si < 0) throw new InputError(`${path}.value`, `must be zero or more (a sigma or coefficient), got ${q!.value}`);
  return si;
}

/** Like {@link readParameter}; the value must be > 0 (correlation times, rates). */
export function readPositive(
  q: Quantity | undefined, expected: DimensionName, path: string, field: string, conversions: ConversionStep[],
): number {
  const si = readParameter(q, expected, path, field, conversions);
  if (!(si > 0)) throw new InputError(`${path}.value`, `must be greater than zero, got ${q!.value}`);
  return si;
}

/** The output rate a per-sample row refers to: the row's own rate, else the sensor's. */
export function rowRateHz(row: SourceInput, sensorRateHz: number, path: string, conversions: ConversionStep[]): number {
  if (row.rate === undefined) return sensorRateHz;
  return readPositive(row.rate, 'frequency', `${path}.rate`, 'rate', conversions);
}

/**
 * Which of `allowed` the quantity's unit belongs to; the unit decides a row's
 * form (deg/√h is a random walk coefficient, deg/s a per-sample sigma).
 * @throws InputError naming the unit field and the dimensions accepted.
 */
export function pickDimension(q: Quantity | undefined, allowed: DimensionName[], path: string): DimensionName {
  if (q === undefined || q === null || typeof q !== 'object' || typeof q.unit !== 'string') {
    throw new InputError(path, 'is missing; expected { "value": number, "unit": text }');
  }
  const dim = unitDimension(q.unit);
  if (dim !== undefined && allowed.includes(dim)) return dim;
  const wanted = allowed.map((d) => `${labelWithArticle(d)} (${DIMENSIONS[d].picker.slice(0, 3).join(', ')})`).join(' or ');
  const got = dim === undefined ? `unknown or unsupported unit '${q.unit}'` : `'${q.unit}' is ${labelWithArticle(dim)}`;
  throw new InputError(`${path}.unit`, `${got}; expected ${wanted}`);
}
