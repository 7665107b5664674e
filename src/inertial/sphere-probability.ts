/**
 * Spherical error probable from the exact trivariate normal (docs/checks.md §6):
 * the radius of the sphere centred on the truth holding half of a zero-mean
 * 3-D normal error with covariance P (3 x 3).
 *
 * Method (derived here): with principal variances a ≥ b ≥ c (ml-matrix's
 * symmetric eigen-decomposition), the error along the first principal axis is
 * z ~ N(0, a), independent of the other two, so
 *   P(|x| ≤ r) = ∫_{−r}^{r} φ_a(z) P₂(b, c; √(r² − z²)) dz,
 * P₂ the bivariate disc probability of ../budget/horizontal-accuracy.ts.
 * With z = r sin θ the integrand is smooth on [−π/2, π/2]; Gauss-Legendre with
 * 48 nodes (nodes by Newton's method on the Legendre recurrence, Abramowitz &
 * Stegun 25.4.29) integrates it to about 1e-12. Integrating along the
 * largest-variance axis keeps the normal density wide against r
 * (r₅₀ ≤ 1.54 √a), so the rule needs no more nodes for flat ellipsoids. The
 * radius comes from bisection between the 1-D and the spherical bounds.
 */
import { EigenvalueDecomposition, Matrix } from 'ml-matrix';
import { probabilityInsideCircle } from '../budget/horizontal-accuracy';

const NODES = 48;
const { nodes, weights } = gaussLegendre(NODES);

function gaussLegendre(m: number): { nodes: Float64Array; weights: Float64Array } {
  const x = new Float64Array(m), w = new Float64Array(m);
  for (let i = 0; i < m; i++) {
    let t = Math.cos((Math.PI * (i + 0.75)) / (m + 0.5));
    let dp = 0;
    for (let it = 0; it < 100; it++) {
      let p0 = 1, p1 = t;
      for (let k = 2; k <= m; k++) [p0, p1] = [p1, ((2 * k - 1) * t * p1 - (k - 1) * p0) / k];
      dp = (m * (t * p1 - p0)) / (t * t - 1);
      const dt = p1 / dp;
      t -= dt;
      if (Math.abs(dt) < 1e-16) break;
    }
    x[i] = t;
    w[i] = 2 / ((1 - t * t) * dp * dp);
  }
  return { nodes: x, weights: w };
}

/** Principal variances of a symmetric 3 x 3 covariance (row-major, m²), largest first, clipped at 0. */
export function principalVariances3(p: ArrayLike<number>): [number, number, number] {
  const m = new Matrix([[p[0], p[1], p[2]], [p[3], p[4], p[5]], [p[6], p[7], p[8]]]);
  const ev = new EigenvalueDecomposition(m, { assumeSymmetric: true }).realEigenvalues.map((x) => Math.max(0, x));
  ev.sort((u, v) => v - u);
  return [ev[0], ev[1], ev[2]];
}

/** P(|x| ≤ r) for x ~ N(0, diag(a, b, c)), a the largest variance, m² and m. */
export function probabilityInsideSphere(a: number, b: number, c: number, radiusM: number): number {
  if (a === 0) return 1;
  const sigma = Math.sqrt(a);
  let sum = 0;
  for (let i = 0; i < NODES; i++) {
    const theta = (Math.PI / 2) * nodes[i];
    const z = radiusM * Math.sin(theta), rho = radiusM * Math.cos(theta);
    const density = Math.exp((-0.5 * z * z) / a) / (sigma * Math.sqrt(2 * Math.PI));
    sum += weights[i] * density * (b + c > 0 ? probabilityInsideCircle(b, c, rho) : 1) * rho;
  }
  return Math.min(1, (Math.PI / 2) * sum);
}

/**
 * SEP: the radius holding 50 % of the 3-D error, m.
 * @param p 3 x 3 position covariance, row-major, m².
 */
export function sphericalErrorProbableM(p: ArrayLike<number>, probability = 0.5): number {
  const [a, b, c] = principalVariances3(p);
  if (a === 0) return 0;
  let lo = 0, hi = 3 * Math.sqrt(a + b + c);
  for (let it = 0; it < 60 && hi - lo > 1e-13 * hi; it++) {
    const mid = 0.5 * (lo + hi);
    if (probabilityInsideSphere(a, b, c, mid) < probability) lo = mid;
    else hi = mid;
  }
  return 0.5 * (lo + hi);
}
