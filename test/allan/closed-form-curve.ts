/**
 * Noise-free Allan curves built from closed forms, for testing the read-offs
 * and the fit without sampling noise. Not a test file itself.
 */
import type { CurvePoints } from '../../src/allan/log-log-lines';
import { noiseTerm, type NoiseTermId } from '../../src/allan/noise-terms';

/** τ from 10^startExp to 10^endExp s at `perDecade` points per decade. */
export function logTaus(startExp: number, endExp: number, perDecade = 10): Float64Array {
  const count = Math.round((endExp - startExp) * perDecade) + 1;
  return Float64Array.from({ length: count }, (_, i) => 10 ** (startExp + i / perDecade));
}

/** A curve σ(τ) = √(variance(τ)) with the same percentage error at every point. */
export function curveFromVariance(tauS: Float64Array, variance: (tauS: number) => number, percentageError = 0.01): CurvePoints {
  return {
    tauS,
    adev: tauS.map((t) => Math.sqrt(variance(t))),
    percentageError: new Float64Array(tauS.length).fill(percentageError),
  };
}

/** The variance of a sum of IEEE Std 952 terms with the given coefficients. */
export function termsVariance(coefficients: Partial<Record<NoiseTermId, number>>): (tauS: number) => number {
  return (t) => Object.entries(coefficients).reduce((s, [id, c]) => s + c! * c! * noiseTerm(id as NoiseTermId).unitVariance(t), 0);
}
