/**
 * Changing a value's unit keeps the physical value: a number is converted
 * (src/units `convert`), a formula is wrapped in the sheet's conversion
 * function, and formulas that refer to the cell by name are wrapped back so
 * they still see the number in the unit they were written for.
 */
import type { BudgetDocument, Cell, QuantityCell } from '../document';
import { getAtPath } from '../document/document-path';
import { listCells } from '../sheet/cell-list';
import { convert, unitDimension } from '../units';
import { isFormula } from './cell-text';
import { keepReferencesInUnit, quote } from './references';

/** Digits kept of a converted number: enough for a double, without its last-digit noise (0.1*3). */
const KEPT_DIGITS = 15;

/** True when both units are readable and of the same dimension, so a value can be converted. Throws nothing. */
export function convertible(from: string, to: string): boolean {
  const a = unitDimension(from);
  return a !== undefined && a === unitDimension(to);
}

/** True when the parentheses of `text` (outside string literals) balance and never close early. */
function balanced(text: string): boolean {
  let depth = 0;
  for (const ch of text.replace(/"(?:[^"]|"")*"/g, '""')) {
    if (ch === '(') depth++;
    if (ch === ')' && --depth < 0) return false;
  }
  return depth === 0;
}

const OUTER_CONVERSION = /^=\s*CONVERTUNIT\(([\s\S]*),\s*"((?:[^"]|"")*)"\s*,\s*"((?:[^"]|"")*)"\s*\)\s*$/i;

/** `=CONVERTUNIT(x, "a", "b")` as its parts when the call spans the whole formula. */
function outerConversion(formula: string): { inner: string; from: string; to: string } | undefined {
  const m = OUTER_CONVERSION.exec(formula);
  if (!m || !balanced(m[1])) return undefined;
  return { inner: m[1].trim(), from: m[2].replace(/""/g, '"'), to: m[3].replace(/""/g, '"') };
}

/**
 * A formula in `from` restated in `to`: `=CONVERTUNIT(<formula>, "from", "to")`;
 * a formula that already ends in a conversion to `from` has its target
 * changed instead (and is unwrapped when the target is its own source unit).
 * Throws nothing.
 */
export function convertFormula(formula: string, from: string, to: string): string {
  const outer = outerConversion(formula);
  if (outer && outer.to === from) return outer.from === to ? `=${outer.inner}` : `=CONVERTUNIT(${outer.inner}, ${quote(outer.from)}, ${quote(to)})`;
  return `=CONVERTUNIT(${formula.slice(1).trim()}, ${quote(from)}, ${quote(to)})`;
}

/** A cell's content restated from `from` to `to` when they convert; otherwise unchanged. Throws nothing. */
export function convertCell(content: Cell, from: string, to: string): { content: Cell; converted: boolean } {
  if (from === to || !convertible(from, to)) return { content, converted: false };
  if (isFormula(content)) return { content: convertFormula(content, from, to), converted: true };
  if (typeof content !== 'number' || !Number.isFinite(content)) return { content, converted: false };
  return { content: Number(convert(content, from, to, 'unit').toPrecision(KEPT_DIGITS)), converted: true };
}

/**
 * Sets the unit of the `{ value, unit }` at `quantityPath` (a row, a named
 * value or any quantity) to `unit` inside an edit, converting its value and
 * wrapping references to it. Returns a sentence for the status line.
 * @throws InputError when nothing is at `quantityPath`.
 */
export function changeUnit(doc: BudgetDocument, quantityPath: string, unit: string): string {
  const q = getAtPath(doc, quantityPath) as QuantityCell | undefined;
  if (!q || typeof q !== 'object') throw new Error(`no value at ${quantityPath}`);
  const from = q.unit;
  const { content, converted } = convertCell(q.value, from, unit);
  const name = listCells(doc).find((c) => c.unitPath === `${quantityPath}.unit`)?.location.name;
  q.value = content;
  q.unit = unit;
  if (!converted) return `Unit set to ${unit}; the value was kept as written (${from} does not convert to ${unit}): check it.`;
  const wrapped = name ? keepReferencesInUnit(doc, name, unit, from) : 0;
  const also = wrapped ? ` ${wrapped} formula${wrapped > 1 ? 's' : ''} using ${name} now convert${wrapped > 1 ? '' : 's'} it back to ${from}.` : '';
  return `Converted from ${from} to ${unit}.${also}`;
}
