/** A numerical condition found in the covariance run, reported as data (never thrown). */
export interface CovarianceIssue {
  kind: 'not-finite' | 'not-positive-semidefinite' | 'asymmetric' | 'singular-innovation';
  /** Mission time of the first occurrence, s. */
  tS: number;
  detail: string;
}

/** Relative tolerance for a negative pivot or an asymmetry, against the largest diagonal entry. */
const RELATIVE_TOLERANCE = 1e-9;

/**
 * Checks an n x n covariance for finiteness, symmetry and positive
 * semi-definiteness (an LDLᵀ factorisation whose pivots may not fall below
 * −1e-9 of the largest diagonal entry after scaling by the diagonal).
 * @returns the problem found, or undefined.
 */
export function checkCovariance(p: Float64Array, offset: number, n: number, tS: number, scratch: Float64Array): CovarianceIssue | undefined {
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) {
      const v = p[offset + i * n + j];
      if (!Number.isFinite(v)) return { kind: 'not-finite', tS, detail: `P[${i}][${j}] = ${v}` };
      const sym = p[offset + j * n + i];
      if (v === sym) continue;
      const scale = Math.sqrt(Math.abs(p[offset + i * n + i] * p[offset + j * n + j]));
      if (Math.abs(v - sym) > RELATIVE_TOLERANCE * scale) return { kind: 'asymmetric', tS, detail: `P[${i}][${j}] ≠ P[${j}][${i}]` };
    }
  }
  // Scale to a correlation-like matrix so states of different units compare.
  for (let i = 0; i < n; i++) {
    if (p[offset + i * n + i] < 0) return { kind: 'not-positive-semidefinite', tS, detail: `variance of state ${i} is negative (${p[offset + i * n + i]})` };
  }
  for (let i = 0; i < n; i++) {
    const di = inverseSigma(p[offset + i * n + i]);
    for (let j = 0; j <= i; j++) scratch[i * n + j] = p[offset + i * n + j] * di * inverseSigma(p[offset + j * n + j]);
  }
  for (let k = 0; k < n; k++) {
    const pivot = scratch[k * n + k];
    if (pivot < -RELATIVE_TOLERANCE) return { kind: 'not-positive-semidefinite', tS, detail: `pivot ${k} is ${pivot.toExponential(3)}` };
    if (pivot <= RELATIVE_TOLERANCE) continue; // semi-definite direction: nothing to eliminate
    // Only the lower triangle is filled and updated.
    for (let i = k + 1; i < n; i++) {
      const l = scratch[i * n + k] / pivot;
      if (l === 0) continue;
      for (let j = k + 1; j <= i; j++) scratch[i * n + j] -= l * scratch[j * n + k];
    }
  }
  return undefined;
}

function inverseSigma(variance: number): number {
  return variance > 0 ? 1 / Math.sqrt(variance) : 0;
}
