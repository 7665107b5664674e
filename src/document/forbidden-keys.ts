import { joinPath } from '../errors';

/**
 * Keys that can reach or replace an object's prototype when data is merged
 * or copied naively. `JSON.parse` makes `__proto__` an ordinary own
 * property, so it has to be looked for explicitly.
 */
export const FORBIDDEN_KEYS: readonly string[] = ['__proto__', 'constructor', 'prototype'];

/**
 * The first forbidden key in `value` (depth first, in key order), with its
 * path, or undefined. Recursion depth is bounded by the caller's nesting
 * limit. Throws nothing.
 */
export function findForbiddenKey(value: unknown, path: string): { path: string; key: string } | undefined {
  if (Array.isArray(value)) {
    for (let i = 0; i < value.length; i++) {
      const found = findForbiddenKey(value[i], joinPath(path, i));
      if (found) return found;
    }
    return undefined;
  }
  if (value === null || typeof value !== 'object') return undefined;
  for (const key of Object.keys(value)) {
    const at = joinPath(path, key);
    if (FORBIDDEN_KEYS.includes(key)) return { path: at, key };
    const found = findForbiddenKey((value as Record<string, unknown>)[key], at);
    if (found) return found;
  }
  return undefined;
}
