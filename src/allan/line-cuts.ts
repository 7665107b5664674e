/**
 * Cutting log text into complete lines between chunks, and matching parsed
 * rows back to line numbers.
 */

/** Number of (non-overlapping) occurrences of `needle` in `text`. Throws nothing. */
export function countOf(text: string, needle: string): number {
  let n = 0;
  for (let i = text.indexOf(needle); i >= 0; i = text.indexOf(needle, i + needle.length)) n++;
  return n;
}

/**
 * For each parsed row, its line offset within the segment. Rows and lines
 * agree unless a quoted cell holds line ends; then each row's extra lines
 * are counted from its cells.
 * @returns row index → line offset (from 0). Throws nothing.
 */
export function rowLineOffsets(rows: string[][], lineCount: number, newline: string): (row: number) => number {
  if (rows.length === lineCount) return (r) => r;
  const offsets: number[] = [];
  let line = 0;
  for (const row of rows) {
    offsets.push(line);
    line += 1 + row.reduce((s, cell) => s + countOf(cell, newline), 0);
  }
  return (r) => offsets[Math.min(r, offsets.length - 1)] ?? 0;
}

/**
 * Where the last complete line of `text` ends: `end` is the index of its line
 * end (outside quotes), `next` the index after it; undefined when there is no
 * complete line yet. A quote is open after an odd number of '"' (RFC 4180
 * doubles a quote inside a quoted cell, which keeps the count even).
 * Throws nothing.
 */
export function lastRecordEnd(text: string, newline: string): { end: number; next: number } | undefined {
  const mark = newline[newline.length - 1];
  let last = -1;
  if (text.indexOf('"') < 0) last = text.lastIndexOf(mark);
  else {
    let quotes = 0;
    for (let i = 0; i < text.length; i++) {
      const ch = text.charCodeAt(i);
      if (ch === 34) quotes++;
      else if (ch === mark.charCodeAt(0) && quotes % 2 === 0) last = i;
    }
  }
  if (last < 0) return undefined;
  const end = newline === '\r\n' && text[last - 1] === '\r' ? last - 1 : last;
  return { end, next: last + 1 };
}

