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
 * Radius in m that holds `probability` of a zero-mean bivariate normal with
 * covariance [[pNN, pNE], [pNE, pEE]] (m²), by the interpolant above.
 * Agrees with {@link radiusForProbability} to about 1e-12 relative.
 */
export function fastRadiusForProbability(pNN: number, pEE: number, pNE: number, probability: number): number {
  const half = 0.5 * (pNN + pEE);
  const major = half + Math.hypot(0.5 * (pNN - pEE), pNE);
  if (!(major > 0)) return 0;
  const minor = Math.max(0, pNN * pEE - pNE * pNE) / major;
  const x = 2 * Math.min(1, minor / major) - 1;
  const c = coefficients(probability);
  // Clenshaw's recurrence.
  let b1 = 0, b2 = 0;
  for (let k = NODES - 1; k >= 1; k--) {
    const b0 = 2 * x * b1 - b2 + c[k];
    b2 = b1;
    b1 = b0;
  }
  return Math.sqrt(major) * (x * b1 - b2 + c[0]);
}
