/**
 * Point handling for the report's SVG charts: thinning a long series to at
 * most two points per pixel column (its smallest and largest value there, so
 * update saw-teeth and peaks survive), and reading a series at any x.
 */

/**
 * Keeps, per pixel column, the first, smallest, largest and last point in
 * x order; `sx`, `sy` map data to px. Non-finite values are skipped.
 * @returns px coordinates in x order.
 */
export function decimateMinMax(x: number[], y: number[], sx: (v: number) => number, sy: (v: number) => number): [number, number][] {
  const out: [number, number][] = [];
  let column = NaN, lo = -1, hi = -1, first = -1, last = -1;
  const flush = () => {
    if (first < 0) return;
    for (const k of [...new Set([first, lo, hi, last])].sort((a, b) => a - b)) out.push([sx(x[k]), sy(y[k])]);
  };
  for (let k = 0; k < x.length; k++) {
    if (!Number.isFinite(y[k])) continue;
    const c = Math.round(sx(x[k]));
    if (c !== column) {
      flush();
      column = c; first = lo = hi = last = k;
      continue;
    }
    if (y[k] < y[lo]) lo = k;
    if (y[k] > y[hi]) hi = k;
    last = k;
  }
  flush();
  return out;
}

/** y at `at` by linear interpolation over ascending `x` (NaN outside the range). */
export function valueAt(x: number[], y: number[], at: number): number {
  if (x.length === 0 || at < x[0] || at > x[x.length - 1]) return NaN;
  let lo = 0, hi = x.length - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (x[mid] <= at) lo = mid; else hi = mid;
  }
  const span = x[hi] - x[lo];
  return span > 0 ? y[lo] + ((at - x[lo]) / span) * (y[hi] - y[lo]) : y[lo];
}
