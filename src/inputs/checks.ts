import { InputError } from '../errors';
import { toSI, type DimensionName } from '../units';
import type { Quantity } from './budget-input';

/**
 * Reads a {@link Quantity} at `path`, checks its shape and converts it to SI.
 * @throws InputError naming `path` when the quantity is missing, not a finite
 *   number, or its unit is unknown or of another dimension than `expected`.
 */
export function quantityToSI(q: Quantity | undefined, expected: DimensionName, path: string): number {
  if (q === undefined || q === null || typeof q !== 'object') {
    throw new InputError(path, 'is missing; expected { "value": number, "unit": text }');
  }
  if (typeof q.value !== 'number' || !Number.isFinite(q.value)) {
    throw new InputError(`${path}.value`, `must be a finite number, got ${String(q.value)}`);
  }
  if (typeof q.unit !== 'string') {
    throw new InputError(`${path}.unit`, 'must be a unit text such as "deg/h" or "m"');
  }
  return toSI(q.value, q.unit, expected, `${path}.unit`);
}

/** Like {@link quantityToSI}, and the result must be > 0. */
export function positiveToSI(q: Quantity | undefined, expected: DimensionName, path: string): number {
  const si = quantityToSI(q, expected, path);
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
