/**
 * Cutting one log line that holds no quote into its cells, reading only the
 * cells wanted (the fast path of parse-log.ts; quoted text goes to
 * papaparse, which this never sees).
 */

/**
 * Puts the wanted cells of `text` into `cells` (by field index) and returns
 * how many fields were seen, up to the last wanted one and stopping there;
 * -1 for a blank line or a '#' comment, as papaparse's rows are skipped.
 * Throws nothing.
 * @param wanted per field index up to the last wanted field: whether to read it.
 */
export function cutWantedCells(text: string, delimiter: string, wanted: readonly boolean[], cells: string[]): number {
  const c0 = text.charCodeAt(0);
  // Only lines starting with '#', a space or nothing can be comments or blank: test cheaply first.
  if (c0 === 35 || !(c0 > 32)) {
    const firstEnd = text.indexOf(delimiter);
    if ((firstEnd < 0 && text.trim() === '') || (firstEnd < 0 ? text : text.slice(0, firstEnd)).trimStart().startsWith('#')) return -1;
  }
  let fields = 0;
  for (let start = 0; fields < wanted.length; ) {
    const end = text.indexOf(delimiter, start);
    if (wanted[fields]) cells[fields] = end < 0 ? text.slice(start) : text.slice(start, end);
    fields++;
    if (end < 0) break;
    start = end + delimiter.length;
  }
  return fields;
}
