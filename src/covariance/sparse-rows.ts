/**
 * A matrix stored by compressed rows. Φ of the planar model has about 30 of
 * 144 entries non-zero, and the propagation loop over every source's
 * covariance is where the engine spends its time (DEVELOPERS.md: sparse rows
 * are about 6x faster than dense loops here).
 */
export interface SparseRows {
  n: number;
  /** Start of row i in `col`/`val`; length n + 1. */
  rowStart: Int32Array;
  col: Int32Array;
  val: Float64Array;
}

/**
 * Compresses a dense row-major n x n matrix, keeping the non-zero entries
 * where `mask` is true (every entry the mask allows when `keepZeros`).
 */
export function toSparseRows(dense: Float64Array, n: number, mask: Uint8Array, keepZeros = false): SparseRows {
  const rowStart = new Int32Array(n + 1);
  const cols: number[] = [];
  const vals: number[] = [];
  for (let i = 0; i < n; i++) {
    rowStart[i] = cols.length;
    for (let j = 0; j < n; j++) {
      const v = dense[i * n + j];
      if (mask[i * n + j] && (keepZeros || v !== 0)) {
        cols.push(j);
        vals.push(v);
      }
    }
  }
  rowStart[n] = cols.length;
  return { n, rowStart, col: Int32Array.from(cols), val: Float64Array.from(vals) };
}

/**
 * Which entries of e^{F t} can be non-zero: the reflexive transitive closure
 * of F's pattern (state i depends on state j). Entries outside it are exact
 * zeros that a numerical exponential only approximates.
 */
export function reachability(f: Float64Array, n: number): Uint8Array {
  const r = new Uint8Array(n * n);
  for (let i = 0; i < n; i++) {
    r[i * n + i] = 1;
    for (let j = 0; j < n; j++) if (f[i * n + j] !== 0) r[i * n + j] = 1;
  }
  // Warshall's algorithm.
  for (let k = 0; k < n; k++) {
    for (let i = 0; i < n; i++) {
      if (!r[i * n + k]) continue;
      for (let j = 0; j < n; j++) if (r[k * n + j]) r[i * n + j] = 1;
    }
  }
  return r;
}
