/**
 * Value conversion between trade units and SI, with the dimension checked
 * against what the caller expects. This is the one door by which a number
 * the user wrote enters the engine.
 */
import { InputError } from '../errors';
import { formatDimension, sameDimension } from './dimension';
import { describeExpected, dimensionOf, labelWithArticle, type DimensionName } from './named-dimensions';
import { readUnit, unitProblemMessage, type ParsedUnit } from './parse-unit';

/** Throws InputError at `path` unless `value` is a finite number. */
function requireFinite(value: number, path: string): void {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new InputError(path, `the value must be a finite number, got ${String(value)}`);
  }
}

/** What a unit is, in words: "an angular rate", or "of dimension m·rad" when unnamed. */
function whatUnitIs(unit: ParsedUnit): string {
  const name = dimensionOf(unit);
  return name ? `is ${labelWithArticle(name)}` : `has the dimension ${formatDimension(unit.dimension)}`;
}

/**
 * Parses `unit` and checks that it has the `expected` dimension; the
 * returned unit's `factorToSI` converts values to the SI unit
 * `DIMENSIONS[expected].si`.
 * @throws InputError naming `path` when `unit` is not a text, is unknown or
 *   malformed, or has another dimension; the message names the expected
 *   dimension with example units.
 */
export function unitFor(unit: string, expected: DimensionName, path: string): ParsedUnit {
  if (typeof unit !== 'string') {
    throw new InputError(path, `the unit must be a text; expected ${describeExpected(expected)}`);
  }
  const reading = readUnit(unit);
  if (!reading.ok) throw new InputError(path, `${unitProblemMessage(unit, reading)}; expected ${describeExpected(expected)}`);
  if (dimensionOf(reading.unit) !== expected) {
    throw new InputError(path, `'${unit}' ${whatUnitIs(reading.unit)}; expected ${describeExpected(expected)}`);
  }
  return reading.unit;
}

/**
 * Converts `value`, written in `unit`, to SI (the unit `DIMENSIONS[expected].si`:
 * rad, rad/s, rad/√s, m, m/s, m/s², 1, s, Hz, ...).
 * @throws InputError naming `path` when `value` is not finite, or `unit` is
 *   unknown, malformed or not of the `expected` dimension.
 */
export function toSI(value: number, unit: string, expected: DimensionName, path: string): number {
  requireFinite(value, path);
  return value * unitFor(unit, expected, path).factorToSI;
}

/**
 * Converts an SI value (in `DIMENSIONS[expected].si`) to `unit`, for display.
 * @throws InputError naming `path` when `valueSI` is not finite, or `unit` is
 *   unknown, malformed or not of the `expected` dimension.
 */
export function fromSI(valueSI: number, unit: string, expected: DimensionName, path: string): number {
  requireFinite(valueSI, path);
  return valueSI / unitFor(unit, expected, path).factorToSI;
}

/** Parses one side of {@link convert}; an unknown unit's message borrows the other side's dimension. */
function convertSide(unit: string, other: string, path: string): ParsedUnit {
  const otherReading = typeof other === 'string' ? readUnit(other) : undefined;
  const otherName = otherReading?.ok ? dimensionOf(otherReading.unit) : undefined;
  if (otherName) return unitFor(unit, otherName, path);
  const reading = typeof unit === 'string' ? readUnit(unit) : undefined;
  if (reading?.ok) return reading.unit;
  const problem = reading ? unitProblemMessage(unit, reading) : 'the unit must be a text';
  throw new InputError(path, problem);
}

/**
 * Converts `value` from `fromUnit` to `toUnit`, which must have the same
 * dimension (any dimension, named or not). Example: 0.01 deg/s/√Hz -> 0.6 deg/√h.
 * @throws InputError naming `path` when `value` is not finite, a unit is
 *   unknown or malformed, or the two dimensions differ.
 */
export function convert(value: number, fromUnit: string, toUnit: string, path: string): number {
  requireFinite(value, path);
  const from = convertSide(fromUnit, toUnit, path);
  const to = convertSide(toUnit, fromUnit, path);
  if (!sameDimension(from.dimension, to.dimension)) {
    throw new InputError(path, `cannot convert '${fromUnit}', which ${whatUnitIs(from)}, to '${toUnit}', which ${whatUnitIs(to)}`);
  }
  // One multiplication by the ratio keeps exact ratios exact (deg/s/√Hz to deg/√h is 60).
  return value * (from.factorToSI / to.factorToSI);
}
