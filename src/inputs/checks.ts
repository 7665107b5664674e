import { InputError } from '../errors';
import { formatSignificant, toSI, unitFor, type DimensionName } from '../units';
import { implausibility } from './plausible-range';
import type { Quantity } from './budget-input';

/**
 * Reads a {@link Quantity} at `path`, checks its shape and converts it to SI
 * (`positive`: a field whose reciprocal is used, with a smallest value too).
 * @throws InputError naming `path` when the quantity is missing, not a finite
 *   number, or its unit is unknown or of another dimension than `expected`;
 *   naming `path.value` when the value is infinite or vanishes in SI, or is
 *   beyond what such a field can mean (see plausible-range.ts).
 */
export function quantityToSI(q: Quantity | undefined, expected: DimensionName, path: string, positive = false): number {
  if (q === undefined || q === null || typeof q !== 'object') {
    throw new InputError(path, 'is missing; expected { "value": number, "unit": text }');
  }
  if (typeof q.value !== 'number' || !Number.isFinite(q.value)) {
    throw new InputError(`${path}.value`, `must be a finite number, got ${String(q.value)}`);
  }
  if (typeof q.unit !== 'string') {
    throw new InputError(`${path}.unit`, 'must be a unit text such as "deg/h" or "m"');
  }
  const si = toSI(q.value, q.unit, expected, `${path}.unit`);
  const factor = unitFor(q.unit, expected, `${path}.unit`).factorToSI;
  const problem = q.value !== 0 && si === 0
    ? 'vanishes once converted to SI (it is below the smallest number a computer holds); write 0 if you mean none'
    : implausibility(si, expected, (bound) => `${formatSignificant(bound / factor, 3)} ${q.unit}`, positive);
  if (problem) throw new InputError(`${path}.value`, `${q.value} ${q.unit} ${problem}`);
  return si;
}

/** Like {@link quantityToSI}, and the result must be > 0. */
export function positiveToSI(q: Quantity | undefined, expected: DimensionName, path: string): number {
  const si = quantityToSI(q, expected, path, true);
  if (!(si > 0)) throw new InputError(`${path}.value`, `must be greater than zero, got ${q!.value}`);
  return si;
}

/** Like {@link quantityToSI}, and the result must be >= 0. */
export function nonNegativeToSI(q: Quantity | undefined, expected: DimensionName, path: string): number {
  const si = quantityToSI(q, expected, path);
  if (si < 0) throw new InputError(`${path}.value`, `must be zero or more, got ${q!.value}`);
  return si;
}

/** Checks that `value` is one of `allowed`, or undefined when `optional`. */
export function requireOneOf<T extends string>(value: unknown, allowed: readonly T[], path: string): T {
  if (typeof value === 'string' && (allowed as readonly string[]).includes(value)) return value as T;
  throw new InputError(path, `must be one of ${allowed.map((a) => `"${a}"`).join(', ')}, got ${JSON.stringify(value)}`);
}

/** Checks that `value` is a non-empty array; returns it typed. */
export function requireArray<T>(value: T[] | undefined, path: string, allowEmpty = false): T[] {
  if (!Array.isArray(value)) throw new InputError(path, 'must be a list');
  if (!allowEmpty && value.length === 0) throw new InputError(path, 'must not be empty');
  return value;
}

/** Checks that an id is a non-empty identifier (letters, digits, '_' and '-', starting with a letter). */
export function requireId(value: unknown, path: string): string {
  if (typeof value === 'string' && /^[A-Za-z][A-Za-z0-9_-]*$/.test(value)) return value;
  throw new InputError(path, `must be an id of letters, digits, "_" or "-" starting with a letter, got ${JSON.stringify(value)}`);
}
