/**
 * A pass over raw JSON text that finds what `JSON.parse` hides: nesting
 * deeper than a limit (checked before parsing, so a hostile file never
 * builds a deep structure) and keys written twice in one object (parse
 * silently keeps the last, so a reviewer reading the diff could see one
 * value while the tool uses another).
 *
 * It only tracks strings, brackets, colons and commas; grammar errors are
 * left to `JSON.parse`. Paths are in the document's own terms (`a.b[2]`).
 */
import { joinPath } from '../errors';

/** What the scan found wrong, with the path where it happens. */
export interface JsonScanProblem {
  kind: 'too-deep' | 'duplicate-key';
  path: string;
  /** The repeated key, for 'duplicate-key'. */
  key?: string;
}

interface Frame {
  isObject: boolean;
  keys: Set<string>;
  key: string;
  index: number;
  expectKey: boolean;
}

/** Path of the value currently being read, from the open containers. */
function pathOf(stack: Frame[]): string {
  let path = '';
  for (const f of stack) path = f.isObject ? joinPath(path, f.key) : joinPath(path, f.index);
  return path;
}

/** Index just past the closing quote of the string starting at `start`. */
function endOfString(text: string, start: number): number {
  let i = start + 1;
  while (i < text.length && text[i] !== '"') i += text[i] === '\\' ? 2 : 1;
  return i + 1;
}

/** Decodes a key's raw text; an invalid escape is left for JSON.parse to report. */
function decodeKey(raw: string): string {
  try {
    return JSON.parse(raw) as string;
  } catch {
    return raw;
  }
}

/**
 * Scans `text` and returns the first problem, or undefined. Runs in one
 * linear pass; never throws.
 * @param maxDepth most containers ({} or []) that may be open at once.
 */
export function scanJsonStructure(text: string, maxDepth: number): JsonScanProblem | undefined {
  const stack: Frame[] = [];
  let i = 0;
  while (i < text.length) {
    const c = text[i];
    const top = stack[stack.length - 1];
    if (c === '"') {
      const end = endOfString(text, i);
      if (top?.isObject && top.expectKey) {
        const key = decodeKey(text.slice(i, end));
        top.key = key;
        top.expectKey = false;
        if (top.keys.has(key)) return { kind: 'duplicate-key', path: pathOf(stack), key };
        top.keys.add(key);
      }
      i = end;
      continue;
    }
    if (c === '{' || c === '[') {
      if (stack.length >= maxDepth) return { kind: 'too-deep', path: pathOf(stack) };
      stack.push({ isObject: c === '{', keys: new Set(), key: '', index: 0, expectKey: c === '{' });
    } else if (c === '}' || c === ']') {
      stack.pop();
    } else if (c === ',' && top) {
      if (top.isObject) top.expectKey = true;
      else top.index += 1;
    }
    i += 1;
  }
  return undefined;
}
