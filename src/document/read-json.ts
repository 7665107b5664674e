/**
 * Text to a plain JSON value, with the limits that make a budget file safe
 * to open: a size cap, a nesting cap checked before parsing, no key written
 * twice, and none of the keys that can reach an object's prototype.
 */
import { BudgetFileError } from './budget-file-error';
import { findForbiddenKey } from './forbidden-keys';
import { scanJsonStructure } from './json-scan';

/** Largest text accepted, in UTF-16 code units (about 5 MB of mostly ASCII JSON). */
export const MAX_TEXT_CHARS = 5_000_000;

/** Most containers open at once; a budget needs 6 (root, sensors, sensor, sources, row, quantity). */
export const MAX_DEPTH = 12;

/** " at line L, column C" (both from 1) for a character offset. */
function whereIs(text: string, offset: number): string {
  const before = text.slice(0, offset);
  return `line ${before.split('\n').length}, column ${offset - before.lastIndexOf('\n')}`;
}

/**
 * Where JSON.parse stopped: V8 gives "at position N" for some errors and
 * only a snippet of about ten characters either side for others
 * (`Unexpected token '}', ..."a": 1, }" is not valid JSON`), so the snippet
 * is found in the text and its middle taken.
 */
function errorOffset(text: string, detail: string): number | undefined {
  const position = /at position (\d+)/.exec(detail);
  if (position) return Number(position[1]);
  const snippet = /, (?:\.\.\.)?"([\s\S]*?)"(?:\.\.\.)? is not valid JSON/.exec(detail)?.[1];
  if (!snippet) return undefined;
  const at = text.indexOf(snippet);
  return at < 0 ? undefined : at + Math.min(10, snippet.length - 1);
}

/** JSON.parse, its SyntaxError turned into a message with a line and column where the parser gave a position. */
function parseOrExplain(text: string, fileName: string): unknown {
  try {
    return JSON.parse(text);
  } catch (e) {
    const detail = e instanceof Error ? e.message : String(e);
    const offset = errorOffset(text, detail);
    const where = offset === undefined ? '' : ` near ${whereIs(text, offset)}`;
    const reason = detail.replace(/,\s*(?:\.\.\.)?"[\s\S]*$/, '').replace(/ in JSON.*$/, '');
    throw new BudgetFileError(fileName, '', `is not valid JSON${where}: ${reason}; check for a missing or extra comma, quote or bracket`);
  }
}

/**
 * Parses budget text into a plain JSON value.
 * @throws BudgetFileError (an InputError) when the text is over
 *   {@link MAX_TEXT_CHARS}, nests deeper than {@link MAX_DEPTH}, is not valid
 *   JSON, repeats a key in one object, or has a `__proto__`, `constructor`
 *   or `prototype` key anywhere.
 */
export function readJson(text: string, fileName: string): unknown {
  if (typeof text !== 'string') throw new BudgetFileError(fileName, '', 'the budget must be given as text');
  if (text.length > MAX_TEXT_CHARS) {
    throw new BudgetFileError(fileName, '', `is ${text.length} characters long; budget files are limited to ${MAX_TEXT_CHARS} (split it or remove unused entries)`);
  }
  // Editors on some systems save a byte-order mark, which JSON.parse refuses.
  const body = text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
  const scan = scanJsonStructure(body, MAX_DEPTH);
  if (scan?.kind === 'too-deep') {
    throw new BudgetFileError(fileName, scan.path, `nests deeper than ${MAX_DEPTH} levels, which no budget needs; check the brackets here`);
  }
  const value = parseOrExplain(body, fileName);
  if (scan?.kind === 'duplicate-key') {
    throw new BudgetFileError(fileName, scan.path, `the key "${scan.key}" is written twice in one object; keep one of them`);
  }
  const forbidden = findForbiddenKey(value, '');
  if (forbidden) {
    throw new BudgetFileError(fileName, forbidden.path, `the key "${forbidden.key}" is not allowed in a budget file (it could change how programs read the data); remove it`);
  }
  return value;
}
