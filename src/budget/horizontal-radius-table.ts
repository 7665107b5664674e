import { radiusForProbability } from './horizontal-accuracy';
import { PRECOMPUTED_COEFFICIENTS } from './horizontal-radius-coefficients';

/**
 * Fast CEP and R95 for every output step. The exact radius (a root of a
 * quadrature, {@link radiusForProbability}) costs about 0.1 ms, too much for
 * 6,000 steps on every keystroke. Normalised by the major axis, the radius
 * depends only on s = minor/major in [0, 1], and analytically (the
 * probability is a smooth expectation over the minor-axis error, whose
 * variance is s), so a Chebyshev interpolant in s converges geometrically
 * (L. N. Trefethen, Approximation Theory and Approximation Practice, SIAM
 * 2013, ch. 8). For CEP the convergence is slow (a singularity lies just
 * beyond s = 0): 40 nodes give 5e-7, 64 give 4e-9 and 128 give 6e-13
 * relative error against the exact radius (measured here, and tested).
 *
 * Building a table costs 128 exact radii, about 25 ms, which was a tenth of
 * the command line's start-up; the tables for CEP and R95 are therefore
 * computed ahead of time (horizontal-radius-coefficients.ts, written by
 * test/tools/write-radius-coefficients.ts and checked against
 * {@link chebyshevCoefficients} by test/budget/horizontal-radius-table.test.ts).
 */
export const NODES = 128;

const tables = new Map<number, Float64Array>();

/** The table for `probability`: computed ahead of time for CEP and R95, else on first use and kept. */
function coefficients(probability: number): Float64Array {
  let table = tables.get(probability);
  if (!table) {
    const precomputed = PRECOMPUTED_COEFFICIENTS[String(probability)];
    table = precomputed ? Float64Array.from(precomputed) : chebyshevCoefficients(probability);
    tables.set(probability, table);
  }
  return table;
}

/** Chebyshev coefficients of the normalised radius for `probability` (Chebyshev points of the first kind). */
export function chebyshevCoefficients(probability: number): Float64Array {
  const values = new Float64Array(NODES);
  for (let j = 0; j < NODES; j++) {
    const x = Math.cos((Math.PI * (j + 0.5)) / NODES);
    values[j] = radiusForProbability(1, (x + 1) / 2, 0, probability);
  }
  const c = new Float64Array(NODES);
  for (let k = 0; k < NODES; k++) {
    let sum = 0;
    for (let j = 0; j < NODES; j++) sum += values[j] * Math.cos((Math.PI * k * (j + 0.5)) / NODES);
    c[k] = (2 / NODES) * sum;
  }
  c[0] /= 2;
  return c;
}

/**
 * The global interpolant above re-expanded piecewise: degree-15 Chebyshev
 * pieces on s in [0, 2^-20], [2^-20, 2^-19], …, [1/4, 1/2], [1/2, 3/4],
 * [3/4, 1] (graded towards s = 0, where the radius bends fastest), fitted to
 * the 128-node interpolant's own values. Each evaluation is then 16
 * Clenshaw steps instead of 128; the pieces agree with the global
 * interpolant to 6e-14 relative (measured on 200,000 points, and tested).
 */
const PIECE_NODES = 16;
const PIECE_BREAKS = [0, ...Array.from({ length: 19 }, (_, e) => 2 ** (e - 20)), 0.5, 0.75, 1];

interface Pieces {
  /** Lower end of each piece in s. */
  starts: Float64Array;
  /** PIECE_NODES coefficients per piece. */
  coefficients: Float64Array;
}

const pieceTables = new Map<number, Pieces>();

function pieces(probability: number): Pieces {
  const cached = pieceTables.get(probability);
  if (cached) return cached;
  const count = PIECE_BREAKS.length - 1;
  const starts = Float64Array.from(PIECE_BREAKS.slice(0, count));
  const coefficientsOut = new Float64Array(count * PIECE_NODES);
  const global = coefficients(probability);
  const values = new Float64Array(PIECE_NODES);
  for (let i = 0; i < count; i++) {
    const a = PIECE_BREAKS[i], b = PIECE_BREAKS[i + 1];
    for (let j = 0; j < PIECE_NODES; j++) {
      const s = (a + b) / 2 + ((b - a) / 2) * Math.cos((Math.PI * (j + 0.5)) / PIECE_NODES);
      values[j] = clenshaw(global, 2 * s - 1);
    }
    for (let k = 0; k < PIECE_NODES; k++) {
      let sum = 0;
      for (let j = 0; j < PIECE_NODES; j++) sum += values[j] * Math.cos((Math.PI * k * (j + 0.5)) / PIECE_NODES);
      coefficientsOut[i * PIECE_NODES + k] = ((k === 0 ? 1 : 2) / PIECE_NODES) * sum;
    }
  }
  const made = { starts, coefficients: coefficientsOut };
  pieceTables.set(probability, made);
  return made;
}

/** Σ c_k T_k(x) by Clenshaw's recurrence over c[from, from + count). */
function clenshaw(c: Float64Array, x: number, from = 0, count = c.length): number {
  let b1 = 0, b2 = 0;
  for (let k = from + count - 1; k >= from + 1; k--) {
    const b0 = 2 * x * b1 - b2 + c[k];
    b2 = b1;
    b1 = b0;
  }
  return x * b1 - b2 + c[from];
}

/** The normalised radius at s = minor/major in [0, 1] from the 128-node interpolant (the reference of the pieces). */
export function normalisedRadiusGlobal(s: number, probability: number): number {
  return clenshaw(coefficients(probability), 2 * s - 1);
}

/**
 * Radius in m that holds `probability` of a zero-mean bivariate normal with
 * covariance [[pNN, pNE], [pNE, pEE]] (m²), by the piecewise interpolant
 * above. Agrees with {@link radiusForProbability} to about 1e-12 relative.
 */
export function fastRadiusForProbability(pNN: number, pEE: number, pNE: number, probability: number): number {
  const half = 0.5 * (pNN + pEE);
  const major = half + Math.hypot(0.5 * (pNN - pEE), pNE);
  if (!(major > 0)) return 0;
  const minor = Math.max(0, pNN * pEE - pNE * pNE) / major;
  const s = Math.min(1, minor / major);
  const { starts, coefficients: c } = pieces(probability);
  let i = starts.length - 1;
  while (i > 0 && s < starts[i]) i--;
  const a = starts[i], b = i + 1 < starts.length ? starts[i + 1] : 1;
  return Math.sqrt(major) * clenshaw(c, (2 * s - a - b) / (b - a), i * PIECE_NODES, PIECE_NODES);
}
