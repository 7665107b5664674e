/**
 * Small dense-matrix helpers on row-major Float64Arrays, shared by the
 * matrix exponential and the power-series discretisation (set-up code, not
 * the hot loop, which works on sparse rows).
 */

/** x y for n x n matrices; skips zero entries of x (the model's matrices are sparse). */
export function multiply(x: Float64Array, y: Float64Array, n: number): Float64Array {
  const out = new Float64Array(n * n);
  for (let i = 0; i < n; i++) {
    for (let k = 0; k < n; k++) {
      const xik = x[i * n + k];
      if (xik === 0) continue;
      for (let j = 0; j < n; j++) out[i * n + j] += xik * y[k * n + j];
    }
  }
  return out;
}

/** The n x n identity. */
export function identity(n: number): Float64Array {
  const out = new Float64Array(n * n);
  for (let i = 0; i < n; i++) out[i * n + i] = 1;
  return out;
}

/** ‖A‖₁, the largest absolute column sum. */
export function oneNorm(a: Float64Array, n: number): number {
  let best = 0;
  for (let j = 0; j < n; j++) {
    let sum = 0;
    for (let i = 0; i < n; i++) sum += Math.abs(a[i * n + j]);
    best = Math.max(best, sum);
  }
  return best;
}
