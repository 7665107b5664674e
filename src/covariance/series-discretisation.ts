/**
 * Φ and unit-PSD Q_d of each noise channel by power series, for steps on a
 * speed ramp, where F changes every step and Van Loan's block exponential
 * (one 2n x 2n exponential per channel per step) costs too much to run while
 * the user types.
 *
 * For white noise of unit PSD driving state c (G = e_c), the integral
 * Q_d = ∫₀ʰ e^{Fs} e_c e_cᵀ e^{Fᵀs} ds expands, with w_j = (F h)^j e_c / j!, into
 *   Q_d = h Σ_{j,l} w_j w_lᵀ / (j + l + 1) = h W H Wᵀ,
 * H the Hilbert matrix (term-by-term integration of the two exponential
 * series; the same integral Van Loan's method evaluates, C. F. Van Loan,
 * IEEE Trans. Automatic Control 23(3), 1978). The step is first halved s
 * times until ‖F h‖₁ ≤ 1/2; each series stops when every entry has
 * converged to 1e-17 relative (at most 18 terms, which would leave below
 * 0.5^19/19! ≈ 1e-23); then Φ(2h) = Φ(h)², Q_d(2h) = Φ(h) Q_d(h) Φ(h)ᵀ + Q_d(h).
 * Agrees with Van Loan to about 1e-13 relative (tested).
 */

import { multiply, oneNorm } from './dense-matrix';

/** Terms kept in both series. */
const TERMS = 18;

/** A Q Aᵀ + Q, the doubling step of Q_d. */
function doubleQd(phi: Float64Array, q: Float64Array, n: number): Float64Array {
  const aq = multiply(phi, q, n);
  const out = new Float64Array(n * n);
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) {
      let s = 0;
      for (let k = 0; k < n; k++) s += aq[i * n + k] * phi[j * n + k];
      out[i * n + j] = s + q[i * n + j];
    }
  }
  return out;
}

/** True when every entry of `term` is negligible (1e-17 relative) against the same entry of `sum`. */
function converged(term: Float64Array, sum: Float64Array): boolean {
  for (let e = 0; e < term.length; e++) {
    if (term[e] !== 0 && !(Math.abs(term[e]) <= 1e-17 * Math.abs(sum[e]))) return false;
  }
  return true;
}

/**
 * e^{F h} by Taylor series (‖F h‖₁ ≤ 1/2), stopped when every entry has
 * converged: the planar model's F is mostly nilpotent, so a handful of terms
 * usually suffice; at most TERMS.
 */
function taylorExp(fh: Float64Array, n: number): Float64Array {
  const out = new Float64Array(n * n);
  let term: Float64Array = new Float64Array(n * n);
  for (let i = 0; i < n; i++) term[i * n + i] = 1;
  for (let k = 1; k <= TERMS + 1; k++) {
    for (let e = 0; e < n * n; e++) out[e] += term[e];
    term = multiply(fh, term, n);
    for (let e = 0; e < n * n; e++) term[e] /= k;
    if (converged(term, out)) break;
  }
  return out;
}

/** w_j = (F h)^j e_c / j! for j = 0.. until every component has converged (at most TERMS). */
function seriesVectors(fh: Float64Array, n: number, c: number): Float64Array[] {
  const w: Float64Array[] = [new Float64Array(n)];
  w[0][c] = 1;
  const sum = w[0].slice();
  for (let j = 1; j <= TERMS; j++) {
    const prev = w[j - 1];
    const next = new Float64Array(n);
    for (let i = 0; i < n; i++) {
      let s = 0;
      for (let k = 0; k < n; k++) s += fh[i * n + k] * prev[k];
      next[i] = s / j;
    }
    if (converged(next, sum)) break;
    w.push(next);
    for (let i = 0; i < n; i++) sum[i] += Math.abs(next[i]);
  }
  return w;
}

/** h W H Wᵀ for channel state c, with w_j = (F h)^j e_c / j! and H_{jl} = 1/(j + l + 1). */
function seriesQd(fh: Float64Array, n: number, c: number, h: number): Float64Array {
  const w = seriesVectors(fh, n, c);
  const q = new Float64Array(n * n);
  const v = new Float64Array(n);
  for (let j = 0; j < w.length; j++) {
    v.fill(0);
    for (let l = 0; l < w.length; l++) {
      const weight = h / (j + l + 1);
      for (let i = 0; i < n; i++) v[i] += weight * w[l][i];
    }
    const wj = w[j];
    for (let a = 0; a < n; a++) {
      if (wj[a] === 0) continue;
      for (let b = 0; b < n; b++) q[a * n + b] += wj[a] * v[b];
    }
  }
  for (let a = 0; a < n; a++) for (let b = 0; b < a; b++) q[a * n + b] = q[b * n + a] = 0.5 * (q[a * n + b] + q[b * n + a]);
  return q;
}

/**
 * Φ = e^{F dt} and, for each channel state in `channelStates`, Q_d of white
 * noise of unit PSD driving that state over dt.
 * @param f continuous dynamics, row-major n x n, 1/s.
 */
export function discretiseBySeries(f: Float64Array, n: number, dtS: number, channelStates: number[]): { phi: Float64Array; unitQd: Float64Array[] } {
  const norm = oneNorm(f, n) * dtS;
  const halvings = norm > 0.5 ? Math.ceil(Math.log2(norm / 0.5)) : 0;
  const h = dtS / 2 ** halvings;
  const fh = f.map((x) => x * h);
  let phi = taylorExp(fh, n);
  let unitQd = channelStates.map((c) => seriesQd(fh, n, c, h));
  for (let s = 0; s < halvings; s++) {
    const p = phi;
    unitQd = unitQd.map((q) => doubleQd(p, q, n));
    phi = multiply(phi, phi, n);
  }
  return { phi, unitQd };
}
