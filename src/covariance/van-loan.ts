/**
 * Discretisation of a linear time-invariant error model over one step by Van
 * Loan's block-exponential method (docs/planar-model.md §4).
 *
 * Source: C. F. Van Loan, "Computing integrals involving the matrix
 * exponential", IEEE Trans. Automatic Control AC-23(3):395–404, 1978. For
 * ẋ = F x + G w with E[w(t) w(s)ᵀ] = Q_c δ(t − s):
 *   M = [[−F, G Q_c Gᵀ], [0, Fᵀ]]·T,  E = e^M = [[·, Φ⁻¹ Q_d], [0, Φᵀ]],
 *   Φ = E₂₂ᵀ,  Q_d = Φ E₁₂ = ∫₀ᵀ e^{Fs} G Q_c Gᵀ e^{Fᵀs} ds.
 */

import { InputError } from '../errors';
import { expm } from './matrix-exponential';

/** State transition and discrete process noise of one step. */
export interface DiscreteModel {
  /** Φ = e^{F T}, row-major n x n (state units per state unit). */
  phi: Float64Array;
  /** Q_d, row-major n x n, exactly symmetric (state units squared). */
  qd: Float64Array;
}

/**
 * Φ and Q_d for a step of length dtS.
 *
 * Q_d is linear in G Q_c Gᵀ, so per-source Q_d comes from calling this with
 * each source's own G Q_c Gᵀ (docs/planar-model.md §4); never slice a total Q_d.
 *
 * @param f continuous dynamics F, row-major n x n, in 1/s (state units per
 *   state unit per second); frame is whatever frame the states are in.
 * @param gqgT G Q_c Gᵀ, row-major n x n, symmetric positive semi-definite,
 *   two-sided PSD in state units squared per second.
 * @param n number of states, a positive integer.
 * @param dtS step length in seconds, finite and ≥ 0.
 * @returns fresh arrays Φ and Q_d; Q_d is symmetrised as (Q_d + Q_dᵀ)/2 to
 *   remove round-off asymmetry, its positive semi-definiteness is not forced.
 * @throws InputError when n is not a positive integer, an array is not n*n
 *   long, an entry is not finite, or dtS is negative or not finite.
 */
export function discretiseVanLoan(
  f: Float64Array,
  gqgT: Float64Array,
  n: number,
  dtS: number,
): DiscreteModel {
  if (!Number.isInteger(n) || n < 1) {
    throw new InputError('n', `number of states must be a positive integer, got ${n}`);
  }
  if (f.length !== n * n) throw new InputError('f', `expected ${n * n} entries, got ${f.length}`);
  if (gqgT.length !== n * n) throw new InputError('gqgT', `expected ${n * n} entries, got ${gqgT.length}`);
  if (!f.every(Number.isFinite)) throw new InputError('f', 'every entry of F must be a finite number');
  if (!gqgT.every(Number.isFinite)) throw new InputError('gqgT', 'every entry of G Q Gᵀ must be a finite number');
  if (!Number.isFinite(dtS) || dtS < 0) {
    throw new InputError('dtS', `step length must be a finite number of seconds ≥ 0, got ${dtS}`);
  }

  const m = 2 * n;
  const block = new Float64Array(m * m);
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) {
      block[i * m + j] = -f[i * n + j] * dtS;
      block[i * m + n + j] = gqgT[i * n + j] * dtS;
      block[(n + i) * m + n + j] = f[j * n + i] * dtS;
    }
  }
  const e = expm(block, m);

  const phi = new Float64Array(n * n);
  const e12 = new Float64Array(n * n);
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) {
      phi[i * n + j] = e[(n + j) * m + n + i];
      e12[i * n + j] = e[i * m + n + j];
    }
  }

  const product = new Float64Array(n * n);
  for (let i = 0; i < n; i++) {
    for (let k = 0; k < n; k++) {
      const phiIk = phi[i * n + k];
      if (phiIk === 0) continue;
      for (let j = 0; j < n; j++) product[i * n + j] += phiIk * e12[k * n + j];
    }
  }
  const qd = new Float64Array(n * n);
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) qd[i * n + j] = 0.5 * (product[i * n + j] + product[j * n + i]);
  }
  return { phi, qd };
}
