/**
 * Ids and names the editors create or accept: the rules of the budget
 * schema (`#/definitions/id`, `#/definitions/valueName`) and of
 * src/document/check-ids.ts (unique ignoring letter case, "mission"
 * reserved), checked before an edit so the user sees why a name is refused.
 */
import { formulaNameProblem, nameKey, RESERVED_SENSOR_ID } from '../document/names';

/** An id: a letter, then letters, digits or '_' (at most 64 characters). */
export const ID_PATTERN = /^[A-Za-z][A-Za-z0-9_]{0,63}$/;

/** A named value's name: a letter or '_', then letters, digits or '_' (at most 64 characters). */
export const VALUE_NAME_PATTERN = /^[A-Za-z_][A-Za-z0-9_]{0,63}$/;

/** True when `id` equals one of `taken`, ignoring letter case as formulas do. Throws nothing. */
export function isTaken(id: string, taken: readonly string[]): boolean {
  return taken.some((t) => nameKey(t) === nameKey(id));
}

/**
 * Why `id` cannot be used for a `what` ("row id", "sensor id") among `taken`
 * (the other ids, not including the item's own), or undefined when it can.
 * Throws nothing.
 */
export function idProblem(id: string, taken: readonly string[], what: string): string | undefined {
  if (!ID_PATTERN.test(id)) return `a ${what} starts with a letter, then letters, digits or "_" (at most 64), e.g. "imu_2"`;
  if (isTaken(id, taken)) return `"${id}" is already used (letter case does not count); choose another ${what}`;
  return undefined;
}

/** Like {@link idProblem} for sensor ids, which also may not be "mission". Throws nothing. */
export function sensorIdProblem(id: string, taken: readonly string[]): string | undefined {
  if (nameKey(id) === RESERVED_SENSOR_ID) return '"mission" is reserved for the start-pose sources; choose another sensor id';
  return idProblem(id, taken, 'sensor id');
}

/** Why a named value cannot be called `name` among `taken`, or undefined. Throws nothing. */
export function valueNameProblem(name: string, taken: readonly string[]): string | undefined {
  if (['__proto__', 'constructor', 'prototype'].includes(name)) return `"${name}" cannot be a name; choose another`;
  if (!VALUE_NAME_PATTERN.test(name)) return 'a name starts with a letter or "_", then letters, digits or "_" (at most 64)';
  const problem = formulaNameProblem(name);
  if (problem) return problem;
  if (isTaken(name, taken)) return `"${name}" is already used (letter case does not count); choose another name`;
  return undefined;
}

/**
 * A valid id built from `base` that is not in `taken`: unusable characters
 * are dropped and a number is added when needed ("gyro", "gyro2", ...).
 * Throws nothing.
 */
export function uniqueId(base: string, taken: readonly string[]): string {
  let stem = base.replace(/[^A-Za-z0-9_]/g, '').replace(/^[^A-Za-z]+/, '').slice(0, 56);
  if (stem === '' || nameKey(stem) === RESERVED_SENSOR_ID) stem = `item${stem}`;
  if (!isTaken(stem, taken)) return stem;
  for (let n = 2; ; n++) if (!isTaken(`${stem}${n}`, taken)) return `${stem}${n}`;
}
