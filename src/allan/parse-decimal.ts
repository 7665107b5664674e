/**
 * Strict reading of a decimal number from a log cell.
 */

/**
 * The number in `cell` (surrounding spaces allowed), or NaN unless the cell
 * is a finite decimal number: blank cells, 'NaN', 'Infinity' and the
 * hexadecimal, binary and octal forms that JavaScript's Number() would accept
 * ('0x1f') are refused. Throws nothing.
 */
export function parseDecimal(cell: string): number {
  const v = Number(cell);
  if (!Number.isFinite(v)) return Number.NaN;
  // Number('') and Number('  ') are 0.
  if (v === 0 && cell.trim() === '') return Number.NaN;
  const t = cell.charCodeAt(0) <= 32 ? cell.trim() : cell;
  if (t.length > 1 && t.charCodeAt(0) === 48) {
    const second = t.charCodeAt(1) | 32;
    if (second === 120 || second === 98 || second === 111) return Number.NaN;
  }
  return v;
}
