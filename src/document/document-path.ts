import { InputError } from '../errors';

/** One step of a document path: an object key or an array index. */
export type PathStep = string | number;

/** Splits `sensors[2].sources[1].value` into ['sensors', 2, 'sources', 1, 'value']. @throws InputError for a malformed path. */
export function splitPath(path: string): PathStep[] {
  const steps: PathStep[] = [];
  const re = /([A-Za-z_$][\w$]*)|\[(\d+)\]|\./gy;
  let m: RegExpExecArray | null;
  let last = 0;
  while ((m = re.exec(path)) !== null) {
    if (m[1] !== undefined) steps.push(m[1]);
    else if (m[2] !== undefined) steps.push(Number(m[2]));
    last = re.lastIndex;
  }
  if (last !== path.length || steps.length === 0) throw new InputError(path, 'is not a document path like sensors[0].sources[1].value');
  for (const s of steps) if (s === '__proto__' || s === 'constructor' || s === 'prototype') throw new InputError(path, `may not contain "${s}"`);
  return steps;
}

/** The value at `path` in a plain JSON value, or undefined when any step is missing. */
export function getAtPath(root: unknown, path: string): unknown {
  let node: unknown = root;
  for (const step of splitPath(path)) {
    if (node === null || typeof node !== 'object') return undefined;
    node = (node as Record<string | number, unknown>)[step];
  }
  return node;
}

/**
 * Sets the value at `path`, creating nothing: every step but the last must exist.
 * @throws InputError naming the path when a parent is missing.
 */
export function setAtPath(root: unknown, path: string, value: unknown): void {
  const steps = splitPath(path);
  const parent = getAtPath(root, joinSteps(steps.slice(0, -1)));
  if (parent === null || typeof parent !== 'object') throw new InputError(path, 'has no parent in the document');
  (parent as Record<string | number, unknown>)[steps[steps.length - 1]] = value;
}

/** The inverse of {@link splitPath}. */
export function joinSteps(steps: PathStep[]): string {
  return steps.map((s, i) => (typeof s === 'number' ? `[${s}]` : i === 0 ? s : `.${s}`)).join('');
}
