/**
 * Synthetic rate logs with known noise terms, for the recovery tests and the
 * benchmark. Not a test file itself.
 *
 * - white rate noise of random-walk coefficient N: independent samples of
 *   σ_d = N·√f_s (docs/checks.md §2: N = σ_d/√f_s);
 * - rate random walk K: b_{k+1} = b_k + K·√τ₀·w_k (the integral of white
 *   noise of PSD K² over one sample);
 * - first-order Gauss-Markov bias (σ, T): x_{k+1} = φx_k + σ√(1 − φ²)·w_k,
 *   φ = e^{−τ₀/T}, started in its stationary distribution (exact
 *   discretisation, docs/checks.md §3.2 (c));
 * - angle quantum s: the angle at each sample carries an independent error
 *   uniform on (−s/2, s/2) (the busy-input model of Widrow, Kollár & Liu,
 *   IEEE Trans. Instrum. Meas. 45(2), 1996, as docs/checks.md §1.5 simulates it).
 * All in SI-consistent units (rad/s, rad/√s, rad/s/√s, rad).
 */
import { SeededRandom } from './seeded-random';

/** Noise terms of a synthetic log; omitted terms are zero. */
export interface SyntheticTerms {
  readonly rateHz: number;
  readonly sampleCount: number;
  readonly seed: number;
  /** White rate noise N (rate unit·√s). */
  readonly randomWalk?: number;
  /** Rate random walk K (rate unit/√s). */
  readonly rateRandomWalk?: number;
  /** Gauss-Markov bias: stationary σ (rate unit) and correlation time T (s). */
  readonly gaussMarkov?: { readonly sigma: number; readonly correlationTimeS: number };
  /** Angle quantum s (rate unit·s). */
  readonly angleQuantum?: number;
  /** A constant offset added to every sample (rate unit). */
  readonly offset?: number;
}

/** Rate samples with the given terms. */
export function syntheticRateLog(terms: SyntheticTerms): Float64Array {
  const rng = new SeededRandom(terms.seed);
  const tau0 = 1 / terms.rateHz;
  const out = new Float64Array(terms.sampleCount);
  const white = (terms.randomWalk ?? 0) * Math.sqrt(terms.rateHz);
  const walkStep = (terms.rateRandomWalk ?? 0) * Math.sqrt(tau0);
  const gm = terms.gaussMarkov;
  const phi = gm ? Math.exp(-tau0 / gm.correlationTimeS) : 0;
  const gmStep = gm ? gm.sigma * Math.sqrt(1 - phi * phi) : 0;
  let walk = 0, bias = gm ? gm.sigma * rng.normal() : 0;
  let previousAngleError = 0;
  for (let k = 0; k < out.length; k++) {
    let y = (terms.offset ?? 0) + walk + bias;
    if (white) y += white * rng.normal();
    if (terms.angleQuantum) {
      const angleError = terms.angleQuantum * (rng.uniform() - 0.5);
      y += (angleError - previousAngleError) / tau0;
      previousAngleError = angleError;
    }
    out[k] = y;
    if (walkStep) walk += walkStep * rng.normal();
    if (gm) bias = phi * bias + gmStep * rng.normal();
  }
  return out;
}
