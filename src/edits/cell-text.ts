/**
 * Between what the user types and what a cell holds: a number, a formula
 * text starting with "=", or nothing (an optional cell left empty).
 */
import type { Cell } from '../document';
import { formatSignificant } from '../units';

/** Significant digits of evaluated numbers shown under formulas. */
export const SHOWN_DIGITS = 6;

/** What typed text means as a cell: the content, or why it is not one. */
export type CellReading = { ok: true; content: Cell | undefined } | { ok: false; message: string };

/**
 * Reads typed text as a cell: "=..." is a formula, a plain number (a
 * decimal comma is accepted when there is no point) is a number, empty
 * text is an empty cell. Anything else is refused with a message, so the
 * caller can keep the text for the user to fix. Throws nothing.
 */
export function readCellText(text: string): CellReading {
  const t = text.trim();
  if (t === '') return { ok: true, content: undefined };
  if (t.startsWith('=')) {
    return t.length > 1 ? { ok: true, content: t } : { ok: false, message: 'a formula needs something after "="' };
  }
  const spelled = /^[+-]?\d+,\d+$/.test(t) ? t.replace(',', '.') : t;
  const n = Number(spelled);
  if (spelled !== '' && Number.isFinite(n) && !/^0x|^0b|^0o/i.test(spelled)) return { ok: true, content: n };
  return { ok: false, message: 'type a number (e.g. 0.15 or 2e-3) or a formula starting with "="' };
}

/** The text an editor shows for a cell's content. Throws nothing. */
export function cellText(content: Cell | undefined): string {
  if (content === undefined) return '';
  return typeof content === 'number' ? String(content) : content;
}

/** True when the content is a formula. Throws nothing. */
export function isFormula(content: unknown): content is string {
  return typeof content === 'string' && content.startsWith('=');
}

/** An evaluated number as shown beside a formula: six significant digits. Throws nothing. */
export function formatValue(x: number): string {
  return formatSignificant(x, SHOWN_DIGITS);
}
