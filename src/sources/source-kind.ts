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

/** What every error-source model file exports. */
export interface SourceKindSpec {
  kind: SourceKind;
  label: string;
  /** One line for tooltips and docs. */
  summary: string;
  parameters: ParameterSpec[];
}

/** Reads one quantity of a row, converts it to SI and records the conversion. */
export function readParameter(
  q: Quantity | undefined,
  expected: DimensionName,
  path: string,
  field: string,
  conversions: ConversionStep[],
  positive = false,
): number {
  const si = quantityToSI(q, expected, path, positive);
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
  const si = readParameter(q, expected, path, field, conversions, true);
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
