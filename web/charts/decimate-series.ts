/**
 * Thinning of long series for drawing only. A 10-hour mission at 0.1 s has
 * 360,000 steps, and a canvas has about a thousand pixel columns: drawing
 * every step costs seconds and shows nothing more. The numbers the page
 * reports (tables, verdicts, checkpoints, tooltips of the kept samples) come
 * from the exact result; only the polyline is thinned.
 *
 * Min-max decimation by index buckets: the steps are cut into buckets of
 * equal count, and each bucket keeps its first and last step and, for every
 * dataset, the step of its smallest and of its largest value, plus the steps
 * where a dataset starts or stops having a value (so gaps stay gaps). The
 * kept steps are shared by all datasets, so stacked areas stay aligned, and
 * every peak and trough survives, whatever the axis (chart.js's own
 * decimation plugin needs a linear x axis, unstacked data and {x, y} points,
 * which the share areas and the Allan plot are not). Hand-written because
 * no npm library does min-max over several aligned series; it is a few loops.
 */

/** Fewest samples at which a series is thinned: below it chart.js draws every step quickly. */
export const DECIMATE_ABOVE = 10_000;

/**
 * The indices of `length` samples to draw: all of them when `length` is at
 * most max(DECIMATE_ABOVE, 4 × buckets), otherwise the min-max selection
 * described above over `buckets` buckets, in increasing order.
 */
export function keptIndices(length: number, series: readonly (readonly (number | null)[])[], buckets: number): number[] {
  const all = () => Array.from({ length }, (_, i) => i);
  if (length <= Math.max(DECIMATE_ABOVE, 4 * buckets)) return all();
  const keep = new Uint8Array(length);
  for (let b = 0; b < buckets; b++) {
    const start = Math.floor((b * length) / buckets), end = Math.floor(((b + 1) * length) / buckets);
    if (end <= start) continue;
    keep[start] = 1;
    keep[end - 1] = 1;
    for (const values of series) {
      let lo = -1, hi = -1;
      for (let i = start; i < end; i++) {
        const v = values[i];
        const had = i > 0 && values[i - 1] !== null && values[i - 1] !== undefined;
        const has = v !== null && v !== undefined;
        if (has !== had) {
          keep[i] = 1;
          if (i > 0) keep[i - 1] = 1;
        }
        if (!has || Number.isNaN(v)) continue;
        if (lo < 0 || v < (values[lo] as number)) lo = i;
        if (hi < 0 || v > (values[hi] as number)) hi = i;
      }
      if (lo >= 0) keep[lo] = 1;
      if (hi >= 0) keep[hi] = 1;
    }
  }
  const out: number[] = [];
  for (let i = 0; i < length; i++) if (keep[i]) out.push(i);
  return out;
}

/** `values` at `indices` (the same array when nothing is thinned). */
export function pick<T>(values: readonly T[], indices: readonly number[]): T[] {
  if (indices.length === values.length) return values as T[];
  return indices.map((i) => values[i]);
}
