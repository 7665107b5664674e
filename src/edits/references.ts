/**
 * Formula references by name, rewritten when something is renamed or its
 * unit changes. Names ignore letter case (src/document/names.ts); text in
 * string literals and function names is never touched.
 */
import type { BudgetDocument } from '../document';
import { nameKey } from '../document/names';
import { listCells } from '../sheet/cell-list';
import { isFormula } from './cell-text';

// A name as the formula engine reads one (the same token as src/sheet/formula-names.ts); group 2 marks a function call.
const NAME_TOKEN = /(?<![A-Za-z\u00C0-\u02AF0-9_.$])([A-Za-z\u00C0-\u02AF_][A-Za-z\u00C0-\u02AF0-9_.]*)(\s*\()?/g;

/** A formula with its string literals blanked out, keeping every index. */
function withoutStrings(formula: string): string {
  return formula.replace(/"(?:[^"]|"")*"?/g, (s) => ' '.repeat(s.length));
}

/**
 * `formula` with each name token replaced by `replace(token)` (undefined
 * keeps it). Function names and string literals are left alone. Throws nothing.
 */
export function rewriteNames(formula: string, replace: (name: string) => string | undefined): string {
  const blanked = withoutStrings(formula);
  let out = '';
  let last = 0;
  for (const m of blanked.matchAll(NAME_TOKEN)) {
    if (m[2] !== undefined) continue;
    const next = replace(m[1]);
    if (next === undefined) continue;
    out += formula.slice(last, m.index) + next;
    last = m.index! + m[1].length;
  }
  return out + formula.slice(last);
}

/** Applies `replace` to every formula cell of the document; returns how many cells changed. */
function rewriteDocument(doc: BudgetDocument, replace: (name: string) => string | undefined, tidy = (f: string) => f): number {
  let changed = 0;
  for (const cell of listCells(doc)) {
    const content = cell.quantity.value;
    if (!isFormula(content)) continue;
    const renamed = rewriteNames(content, replace);
    if (renamed === content) continue;
    const next = tidy(renamed);
    if (next !== content) {
      cell.quantity.value = next;
      changed++;
    }
  }
  return changed;
}

/** A replacer for `old` and names below it (`old.x.y`), keeping what follows the prefix. */
function prefixReplacer(oldName: string, newName: string, exactToo: boolean): (name: string) => string | undefined {
  const key = nameKey(oldName);
  return (name) => {
    const k = nameKey(name);
    if (exactToo && k === key) return newName;
    return k.startsWith(`${key}.`) ? newName + name.slice(oldName.length) : undefined;
  };
}

/** Rewrites references to a sensor's cells (`gyro.arw` -> `imu.arw`) in every cell; returns the count. */
export function renameSensorReferences(doc: BudgetDocument, oldId: string, newId: string): number {
  return rewriteDocument(doc, prefixReplacer(oldId, newId, false));
}

/** Rewrites references to a row (`gyro.arw`, `gyro.arw.rate` -> `gyro.noise...`) in every cell; returns the count. */
export function renameRowReferences(doc: BudgetDocument, sensorId: string, oldRowId: string, newRowId: string): number {
  return rewriteDocument(doc, prefixReplacer(`${sensorId}.${oldRowId}`, `${sensorId}.${newRowId}`, true));
}

/** Rewrites references to a named value (`cruiseSpeed` -> `cruise`) in every cell; returns the count. */
export function renameValueReferences(doc: BudgetDocument, oldName: string, newName: string): number {
  const key = nameKey(oldName);
  return rewriteDocument(doc, (name) => (nameKey(name) === key ? newName : undefined));
}

/**
 * Wraps every reference to `name` as `CONVERTUNIT(name, "newUnit", "oldUnit")`,
 * so formulas that used the number in the old unit still get it after the
 * referenced cell was converted. Returns the count of cells changed.
 */
export function keepReferencesInUnit(doc: BudgetDocument, name: string, newUnit: string, oldUnit: string): number {
  const key = nameKey(name);
  const wrap = (n: string) => `CONVERTUNIT(${n}, ${quote(newUnit)}, ${quote(oldUnit)})`;
  return rewriteDocument(doc, (n) => (nameKey(n) === key ? wrap(n) : undefined), collapseConversions);
}

const LITERAL = '"(?:[^"]|"")*"';
const NESTED = new RegExp(
  `CONVERTUNIT\\(\\s*CONVERTUNIT\\(([^(),"]+?),\\s*(${LITERAL})\\s*,\\s*(${LITERAL})\\s*\\)\\s*,\\s*(${LITERAL})\\s*,\\s*(${LITERAL})\\s*\\)`, 'gi');

/**
 * Folds `CONVERTUNIT(CONVERTUNIT(name, "a", "b"), "b", "c")` into
 * `CONVERTUNIT(name, "a", "c")`, and that into `name` when a equals c, so
 * repeated unit changes do not pile up calls. Throws nothing.
 */
export function collapseConversions(formula: string): string {
  return formula.replace(NESTED, (whole, name: string, a: string, b: string, b2: string, c: string) => {
    if (b !== b2) return whole;
    return a === c ? name.trim() : `CONVERTUNIT(${name.trim()}, ${a}, ${c})`;
  });
}

/** A formula string literal: "text" with inner quotes doubled. Throws nothing. */
export function quote(text: string): string {
  return `"${text.replace(/"/g, '""')}"`;
}
