/**
 * Which line of a file each data row came from, kept in little memory: rows
 * follow lines one to one except where blank lines, comments or a quoted
 * cell spanning lines shift them, so only the shifts are stored.
 */

/** Maps data-row indices (from 0) to file line numbers (from 1). */
export class RowLines {
  private readonly startRows: number[] = [];
  private readonly offsets: number[] = [];

  /** Records that data row `row` is on line `line`; rows must come in order. Throws nothing. */
  record(row: number, line: number): void {
    const offset = line - row;
    if (this.offsets.length === 0 || this.offsets[this.offsets.length - 1] !== offset) {
      this.startRows.push(row);
      this.offsets.push(offset);
    }
  }

  /** The line of data row `row`, by binary search over the shifts. Throws nothing. */
  lineOf(row: number): number {
    let lo = 0, hi = this.startRows.length - 1;
    while (lo < hi) {
      const mid = (lo + hi + 1) >> 1;
      if (this.startRows[mid] <= row) lo = mid;
      else hi = mid - 1;
    }
    return row + (this.offsets[lo] ?? 1);
  }
}
