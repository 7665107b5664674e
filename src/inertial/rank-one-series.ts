/**
 * Q_d of white noise of unit PSD entering through one column g, over a step
 * of length h with constant F:
 *   Q_d = ∫₀ʰ e^{Fs} g gᵀ e^{Fᵀs} ds = h Σ_{j,l} w_j w_lᵀ / (j + l + 1),  w_j = (F h)^j g / j!,
 * the term-by-term integral of the two exponential series (the integral Van
 * Loan's method evaluates: C. F. Van Loan, IEEE Trans. Automatic Control
 * 23(3), 1978; the same expansion as ../covariance/series-discretisation.ts,
 * for an arbitrary column instead of a unit one: the IMU's white noise enters
 * the attitude and velocity blocks through C_b^n). The inertial error
 * dynamics are nearly nilpotent over a step (one g in the ψ → v → r chain,
 * Schuler and Earth-rate feedback of order 1e-3/s), so the series converges
 * in about ten terms at h = 0.1 s without scaling; each entry stops when its
 * next term is below 1e-17 of its sum (at most 40 terms). Agrees with Van
 * Loan to about 1e-13 relative (tested).
 */

const MAX_TERMS = 40;

/** The series vectors w_0 … w_m for F·h (row-major n x n, already multiplied by h) and column g. */
export function seriesVectors(fh: Float64Array, n: number, g: Float64Array): Float64Array[] {
  const terms = [Float64Array.from(g)];
  const sum = Float64Array.from(g, Math.abs);
  // F h by compressed rows: the zero entries add nothing to the sums, so skipping them keeps every bit.
  const rowStart = new Int32Array(n + 1), col: number[] = [], val: number[] = [];
  for (let i = 0; i < n; i++) {
    for (let k = 0; k < n; k++) if (fh[i * n + k] !== 0) { col.push(k); val.push(fh[i * n + k]); }
    rowStart[i + 1] = col.length;
  }
  for (let j = 1; j < MAX_TERMS; j++) {
    const prev = terms[j - 1];
    const next = new Float64Array(n);
    let done = true;
    for (let i = 0; i < n; i++) {
      let s = 0;
      for (let p = rowStart[i]; p < rowStart[i + 1]; p++) s += val[p] * prev[col[p]];
      s /= j;
      next[i] = s;
      if (s !== 0 && Math.abs(s) > 1e-17 * sum[i]) done = false;
      sum[i] += Math.abs(s);
    }
    if (done) break;
    terms.push(next);
  }
  return terms;
}

/** out += scale · h Σ_{j,l} w_j w_lᵀ / (j + l + 1), symmetric, for the vectors of {@link seriesVectors}. */
export function addRankOneQd(terms: Float64Array[], n: number, h: number, scale: number, out: Float64Array): void {
  const m = terms.length;
  const u = new Float64Array(n);
  for (let j = 0; j < m; j++) {
    u.fill(0);
    for (let l = 0; l < m; l++) {
      const c = 1 / (j + l + 1), w = terms[l];
      for (let i = 0; i < n; i++) u[i] += c * w[i];
    }
    const wj = terms[j], k = scale * h;
    for (let a = 0; a < n; a++) {
      const x = k * wj[a];
      if (x === 0) continue;
      for (let b = 0; b < n; b++) out[a * n + b] += x * u[b];
    }
  }
  for (let a = 0; a < n; a++) {
    for (let b = a + 1; b < n; b++) {
      const s = 0.5 * (out[a * n + b] + out[b * n + a]);
      out[a * n + b] = s;
      out[b * n + a] = s;
    }
  }
}
