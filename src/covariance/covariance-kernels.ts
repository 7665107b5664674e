import type { SparseEntries } from './discretise-step';
import type { SparseRows } from './sparse-rows';

/**
 * The hot loops of the covariance analysis, over flat Float64Arrays holding
 * several n x n symmetric matrices back to back (the total P first, then one
 * per source). Kept free of allocation; callers pass scratch space.
 */

/**
 * X <- Φ X Φᵀ for the matrix at `offset`, using Φ's sparse rows; computes
 * the upper triangle and mirrors it, so X stays exactly symmetric.
 * @param scratch n*n workspace.
 */
export function propagateInPlace(x: Float64Array, offset: number, phi: SparseRows, scratch: Float64Array): void {
  const n = phi.n;
  const { rowStart, col, val } = phi;
  // A = Φ X
  for (let i = 0; i < n; i++) {
    const ai = i * n;
    for (let k = 0; k < n; k++) scratch[ai + k] = 0;
    for (let p = rowStart[i]; p < rowStart[i + 1]; p++) {
      const xj = offset + col[p] * n;
      const f = val[p];
      for (let k = 0; k < n; k++) scratch[ai + k] += f * x[xj + k];
    }
  }
  // X = A Φᵀ, upper triangle then mirror: X[i][k] = Σ_p A[i][col_p] Φ[k][col_p]
  for (let i = 0; i < n; i++) {
    const ai = i * n;
    for (let k = i; k < n; k++) {
      let sum = 0;
      for (let p = rowStart[k]; p < rowStart[k + 1]; p++) sum += scratch[ai + col[p]] * val[p];
      x[offset + ai + k] = sum;
      x[offset + k * n + i] = sum;
    }
  }
}

/** X += Q for sparse symmetric Q (both triangles stored). */
export function addSparse(x: Float64Array, offset: number, q: SparseEntries): void {
  const { index, val } = q;
  for (let e = 0; e < index.length; e++) x[offset + index[e]] += val[e];
}

/** X += Q for dense Q. */
export function addDense(x: Float64Array, offset: number, q: Float64Array): void {
  for (let e = 0; e < q.length; e++) x[offset + e] += q[e];
}

/**
 * u = X h for sparse h (indices hIdx, coefficients hVal); returns hᵀ X h.
 * @param u length-n output.
 */
export function multiplySparseVector(
  x: Float64Array, offset: number, n: number, hIdx: Int32Array, hVal: Float64Array, u: Float64Array,
): number {
  for (let i = 0; i < n; i++) u[i] = 0;
  for (let p = 0; p < hIdx.length; p++) {
    const j = hIdx[p];
    const c = hVal[p];
    for (let i = 0; i < n; i++) u[i] += x[offset + i * n + j] * c;
  }
  let hxh = 0;
  for (let p = 0; p < hIdx.length; p++) hxh += hVal[p] * u[hIdx[p]];
  return hxh;
}

/**
 * Joseph-form update of one matrix with a fixed gain K (docs/planar-model.md §6):
 * (I − K hᵀ) X (I − K hᵀ)ᵀ + K r Kᵀ = X − K uᵀ − u Kᵀ + (hᵀXh + r) K Kᵀ, u = X h.
 * With K from the total P this is the fixed-gain recursion of docs/planar-model.md §7
 * (Gelb 1974, sec. 7.3), applied to one source's share with its own r.
 */
export function josephUpdateInPlace(
  x: Float64Array, offset: number, n: number, gain: Float64Array, u: Float64Array, hxh: number, r: number,
): void {
  const c = hxh + r;
  for (let i = 0; i < n; i++) {
    const ki = gain[i], ui = u[i];
    const row = offset + i * n;
    for (let j = i; j < n; j++) {
      const v = x[row + j] - ki * u[j] - ui * gain[j] + c * ki * gain[j];
      x[row + j] = v;
      x[offset + j * n + i] = v;
    }
  }
}

/**
 * ψ <- Φ ψ for `count` state vectors stored back to back. A source that owns
 * only initial variance (a random constant, the initial pose) has a rank-one
 * P_s = ψ ψᵀ for each of its P0 entries, which stays rank one through
 * propagation and fixed-gain updates: carrying ψ costs n operations instead
 * of n², and keeps P_s exactly positive semi-definite.
 * @param scratch length-n workspace.
 */
export function propagateVectors(v: Float64Array, count: number, phi: SparseRows, scratch: Float64Array): void {
  const n = phi.n;
  const { rowStart, col, val } = phi;
  for (let c = 0; c < count; c++) {
    const off = c * n;
    for (let i = 0; i < n; i++) {
      let sum = 0;
      for (let p = rowStart[i]; p < rowStart[i + 1]; p++) sum += val[p] * v[off + col[p]];
      scratch[i] = sum;
    }
    for (let i = 0; i < n; i++) v[off + i] = scratch[i];
  }
}

/** ψ <- (I − K hᵀ) ψ for `count` vectors: the fixed-gain update of a rank-one P_s with no R of its own. */
export function updateVectors(v: Float64Array, count: number, n: number, hIdx: Int32Array, hVal: Float64Array, gain: Float64Array): void {
  for (let c = 0; c < count; c++) {
    const off = c * n;
    let hv = 0;
    for (let p = 0; p < hIdx.length; p++) hv += hVal[p] * v[off + hIdx[p]];
    if (hv === 0) continue;
    for (let i = 0; i < n; i++) v[off + i] -= gain[i] * hv;
  }
}
