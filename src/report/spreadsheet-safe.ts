/**
 * Text made safe to paste into a spreadsheet or a Markdown viewer. A cell
 * that begins with =, +, -, @, a tab or a carriage return is read by
 * spreadsheets as a formula, so a provenance of `=HYPERLINK(...)` or
 * `+cmd|...` copied out of a budget would run there ("CSV injection",
 * OWASP); such a cell gets a leading apostrophe, which spreadsheets show as
 * text. Plain numbers (-0.5, 1e-3) are left alone. Markdown text has the
 * characters that open links, images, HTML or code escaped.
 */

/** First characters that make a spreadsheet evaluate a cell (OWASP, "CSV Injection"). */
const FORMULA_START = /^[=+\-@\t\r]/;
const PLAIN_NUMBER = /^[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?$/;

/** `text` for one cell of a TSV, CSV or Markdown table: prefixed with ' when a spreadsheet would evaluate it. Throws nothing. */
export function neutraliseCell(text: string): string {
  return FORMULA_START.test(text) && !PLAIN_NUMBER.test(text) ? `'${text}` : text;
}

/** The inverse of {@link neutraliseCell} for text pasted back in: drops the ' it added. Throws nothing. */
export function restoreCell(text: string): string {
  return text.startsWith("'") && FORMULA_START.test(text.slice(1)) && !PLAIN_NUMBER.test(text.slice(1)) ? text.slice(1) : text;
}

/** `text` for Markdown: on one line, with \ ` | < [ ] ! escaped so it renders as the same text. Throws nothing. */
export function markdownText(text: string): string {
  return text.replace(/\s*[\r\n]+\s*/g, ' ').replace(/[\\`|<[\]!]/g, (c) => `\\${c}`);
}
