/**
 * Allocation-free loops of the suboptimal-filter recursion over the
 * augmented covariance C of z = [x; e] (n_a = n_x + n_f, row-major; x holds
 * the carried truth states).
 */

/**
 * Joseph-form update of C with the filter's gain acting on e only:
 * C⁺ = (I − K_a gᵀ) C (I − K_a gᵀ)ᵀ + K_a r K_aᵀ with K_a = [0; K],
 * u = C g and c = gᵀ C g + r (Gelb, Applied Optimal Estimation, 1974, §7.2;
 * Maybeck, vol. 1, 1979, ch. 6; written out in docs/suboptimal-filter.md). K_a is zero on x, so the
 * x-x block is untouched and only rows and columns of e are visited.
 * @param gain K over the filter's n_f states.
 */
export function josephUpdateErrorBlock(
  c: Float64Array, offset: number, nx: number, nf: number, gain: Float64Array, u: Float64Array, cScalar: number,
): void {
  const na = nx + nf;
  for (let i = 0; i < na; i++) {
    const ki = i < nx ? 0 : gain[i - nx], ui = u[i];
    const row = offset + i * na;
    for (let j = Math.max(i, nx); j < na; j++) {
      const kj = gain[j - nx];
      const v = c[row + j] - ki * u[j] - ui * kj + cScalar * ki * kj;
      c[row + j] = v;
      c[offset + j * na + i] = v;
    }
  }
}

/** ψ <- (I − K_a gᵀ) ψ for `counx` augmenxed vectors (a rank-one source share with no R of its own). */
export function updateErrorVectors(v: Float64Array, counx: number, nx: number, nf: number, gIdx: Int32Array, gVal: Float64Array, gain: Float64Array): void {
  const na = nx + nf;
  for (let c = 0; c < counx; c++) {
    const off = c * na;
    let gv = 0;
    for (let p = 0; p < gIdx.length; p++) gv += gVal[p] * v[off + gIdx[p]];
    if (gv === 0) continue;
    for (let i = 0; i < nf; i++) v[off + nx + i] -= gain[i] * gv;
  }
}
