import { josephUpdateInPlace, multiplySparseVector } from '../covariance/covariance-kernels';

/**
 * One scalar Kalman update of P (n x n, row-major) in Joseph form
 * (docs/planar-model.md §6) with sparse h and variance r: the gain goes into
 * `gain`, `u` (length n) is workspace. Returns the innovation variance
 * hᵀPh + r, or 0 (P unchanged) when it is not positive and finite.
 */
export function scalarJosephUpdate(
  p: Float64Array, n: number, hIdx: Int32Array, hVal: Float64Array, r: number, u: Float64Array, gain: Float64Array,
): number {
  const hph = multiplySparseVector(p, 0, n, hIdx, hVal, u);
  const s = hph + r;
  if (!(s > 0) || !Number.isFinite(s)) return 0;
  for (let i = 0; i < n; i++) gain[i] = u[i] / s;
  josephUpdateInPlace(p, 0, n, gain, u, hph, r);
  return s;
}
