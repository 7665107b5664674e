/**
 * Matrix exponential of a dense square matrix, by scaling and squaring with a
 * diagonal Padé approximant.
 *
 * Hand-written because ml-matrix has no matrix exponential, and the Van Loan
 * discretisation (./van-loan.ts) exponentiates one 2n x 2n block per segment
 * and per source, on the row-major Float64Array layout the hot path uses.
 *
 * Algorithm: N. J. Higham, "The scaling and squaring method for the matrix
 * exponential revisited", SIAM J. Matrix Anal. Appl. 26(4):1179–1193, 2005,
 * Algorithm 2.3 (degrees 3, 5, 7, 9, 13 chosen by the 1-norm against the
 * θ_m of its Table 2.3; balancing is not done).
 */

import { InputError } from '../errors';
import { identity, multiply, oneNorm } from './dense-matrix';

/** Padé coefficients b_0..b_m of r_m (Higham 2005, eq. 2.2 and §2; b_j = (2m−j)! m! / ((2m)! j! (m−j)!) up to a common factor). */
const PADE_COEFFICIENTS: Readonly<Record<number, readonly number[]>> = {
  3: [120, 60, 12, 1],
  5: [30240, 15120, 3360, 420, 30, 1],
  7: [17297280, 8648640, 1995840, 277200, 25200, 1512, 56, 1],
  9: [17643225600, 8821612800, 2075673600, 302702400, 30270240, 2162160, 110880, 3960, 90, 1],
  13: [
    64764752532480000, 32382376266240000, 7771770303897600, 1187353796428800, 129060195264000,
    10559470521600, 670442572800, 33522128640, 1323241920, 40840800, 960960, 16380, 182, 1,
  ],
};

/** θ_m: largest 1-norm for which r_m needs no scaling (Higham 2005, Table 2.3, double precision). */
const THETA: ReadonlyArray<readonly [degree: number, theta: number]> = [
  [3, 1.495585217958292e-2],
  [5, 2.539398330063230e-1],
  [7, 9.504178996162932e-1],
  [9, 2.097847961257068],
];
const THETA_13 = 5.371920351148152;

/**
 * e^A for a real n x n matrix A.
 *
 * @param a row-major n x n matrix (length n*n); any units, as long as the
 *   entries are dimensionless in the product A (e.g. F·Δt). Not modified.
 * @param n matrix order, a positive integer.
 * @returns a new row-major n x n Float64Array holding e^A.
 * @throws InputError when n is not a positive integer, the length is not
 *   n*n, or an entry is not finite.
 */
export function expm(a: Float64Array, n: number): Float64Array {
  checkSquare(a, n);
  const norm = oneNorm(a, n);
  for (const [degree, theta] of THETA) {
    if (norm <= theta) return padeRatio(a, n, degree);
  }
  // Higham 2005, Algorithm 2.3: s = ⌈log2(‖A‖₁/θ13)⌉, then r13(A/2^s)^(2^s).
  const s = Math.max(0, Math.ceil(Math.log2(norm / THETA_13)));
  const scaled = a.map((x) => x / 2 ** s);
  let result = padeRatio(scaled, n, 13);
  for (let k = 0; k < s; k++) result = multiply(result, result, n);
  return result;
}

/** r_m(A) = [q_m(A)]⁻¹ p_m(A) with p_m = V + U, q_m = V − U (Higham 2005, eqs. 2.10–2.12). */
function padeRatio(a: Float64Array, n: number, degree: number): Float64Array {
  const b = PADE_COEFFICIENTS[degree];
  const a2 = multiply(a, a, n);
  let u: Float64Array;
  let v: Float64Array;
  if (degree < 13) {
    // Even powers A^0, A^2, ... A^(m−1); U = A Σ b_(2k+1) A^(2k), V = Σ b_(2k) A^(2k).
    const powers = [identity(n), a2];
    for (let k = 2; 2 * k <= degree; k++) powers.push(multiply(powers[k - 1], a2, n));
    const odd = new Float64Array(n * n);
    v = new Float64Array(n * n);
    powers.forEach((p, k) => {
      addScaled(odd, p, b[2 * k + 1]);
      addScaled(v, p, b[2 * k]);
    });
    u = multiply(a, odd, n);
  } else {
    // Eq. 2.12: six multiplications instead of twelve.
    const a4 = multiply(a2, a2, n);
    const a6 = multiply(a4, a2, n);
    const inner = combine(n, [a6, b[13]], [a4, b[11]], [a2, b[9]]);
    const outer = multiply(a6, inner, n);
    addScaled(outer, combine(n, [a6, b[7]], [a4, b[5]], [a2, b[3]], [identity(n), b[1]]), 1);
    u = multiply(a, outer, n);
    v = multiply(a6, combine(n, [a6, b[12]], [a4, b[10]], [a2, b[8]]), n);
    addScaled(v, combine(n, [a6, b[6]], [a4, b[4]], [a2, b[2]], [identity(n), b[0]]), 1);
  }
  const numerator = combine(n, [v, 1], [u, 1]);
  const denominator = combine(n, [v, 1], [u, -1]);
  return solveInPlace(denominator, numerator, n);
}

/**
 * Solves D X = B for X by LU with partial pivoting; D and B are overwritten,
 * X is returned in B's storage. q_m(A) is well conditioned for ‖A‖₁ ≤ θ_m
 * (Higham 2005, §2), so partial pivoting is enough.
 */
function solveInPlace(d: Float64Array, b: Float64Array, n: number): Float64Array {
  for (let col = 0; col < n; col++) {
    let pivot = col;
    for (let row = col + 1; row < n; row++) {
      if (Math.abs(d[row * n + col]) > Math.abs(d[pivot * n + col])) pivot = row;
    }
    if (pivot !== col) {
      swapRows(d, n, col, pivot);
      swapRows(b, n, col, pivot);
    }
    const diag = d[col * n + col];
    for (let row = col + 1; row < n; row++) {
      const factor = d[row * n + col] / diag;
      if (factor === 0) continue;
      for (let k = col; k < n; k++) d[row * n + k] -= factor * d[col * n + k];
      for (let k = 0; k < n; k++) b[row * n + k] -= factor * b[col * n + k];
    }
  }
  for (let row = n - 1; row >= 0; row--) {
    for (let k = row + 1; k < n; k++) {
      const factor = d[row * n + k];
      if (factor === 0) continue;
      for (let j = 0; j < n; j++) b[row * n + j] -= factor * b[k * n + j];
    }
    const diag = d[row * n + row];
    for (let j = 0; j < n; j++) b[row * n + j] /= diag;
  }
  return b;
}

function swapRows(m: Float64Array, n: number, i: number, j: number): void {
  for (let k = 0; k < n; k++) {
    const t = m[i * n + k];
    m[i * n + k] = m[j * n + k];
    m[j * n + k] = t;
  }
}

function combine(n: number, ...terms: Array<[Float64Array, number]>): Float64Array {
  const out = new Float64Array(n * n);
  for (const [m, c] of terms) addScaled(out, m, c);
  return out;
}

function addScaled(target: Float64Array, m: Float64Array, c: number): void {
  for (let k = 0; k < target.length; k++) target[k] += c * m[k];
}

function checkSquare(a: Float64Array, n: number): void {
  if (!Number.isInteger(n) || n < 1) {
    throw new InputError('n', `matrix order must be a positive integer, got ${n}`);
  }
  if (a.length !== n * n) {
    throw new InputError('a', `expected ${n * n} entries for a ${n} x ${n} matrix, got ${a.length}`);
  }
  if (!a.every(Number.isFinite)) {
    throw new InputError('a', 'every matrix entry must be a finite number');
  }
}
