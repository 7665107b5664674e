/**
 * Radius of the circle, centred on the true position, that holds a given
 * fraction of a zero-mean bivariate normal horizontal error (docs/planar-model.md §8:
 * CEP at 50 %, R95 at 95 %), computed exactly from the 2 x 2 covariance
 * rather than from the circular approximations (docs/checks.md §6).
 */

import { InputError } from '../errors';
import { normalQuantile } from './confidence';

/** Principal variances of a 2 x 2 horizontal covariance, in m². */
export interface PrincipalVariances {
  /** Larger eigenvalue, m². */
  major: number;
  /** Smaller eigenvalue, m², ≥ 0. */
  minor: number;
}

/** Trapezoid step in the sinh variable; the error bound e^{−π²/(2h)} ≈ 4e-22 (see probabilityInsideCircle). */
const STEP = 0.1;
/** Axis ratios √(minor/major) below this are treated as this: the probability moves by O(ratio²) = 1e-40. */
const MIN_AXIS_RATIO = 1e-20;

/**
 * Eigenvalues of [[pNN, pNE], [pNE, pEE]].
 *
 * @param pNN north variance, m², ≥ 0.
 * @param pEE east variance, m², ≥ 0.
 * @param pNE north-east covariance, m².
 * @returns major ≥ minor ≥ 0, m². A determinant negative by round-off only
 *   (up to 1e-12 of pNN·pEE) gives minor = 0.
 * @throws InputError when an entry is not finite, a variance is negative, or
 *   the matrix is not positive semi-definite beyond round-off.
 */
export function principalVariances(pNN: number, pEE: number, pNE: number): PrincipalVariances {
  if (![pNN, pEE, pNE].every(Number.isFinite)) {
    throw new InputError('covariance', `entries must be finite, got [${pNN}, ${pNE}; ${pNE}, ${pEE}] m²`);
  }
  if (pNN < 0 || pEE < 0) throw new InputError('covariance', `variances must be ≥ 0, got ${pNN} and ${pEE} m²`);
  const determinant = pNN * pEE - pNE * pNE;
  if (determinant < -1e-12 * pNN * pEE || (determinant < 0 && pNN * pEE === 0)) {
    throw new InputError('covariance', `[${pNN}, ${pNE}; ${pNE}, ${pEE}] m² is not positive semi-definite`);
  }
  const half = 0.5 * (pNN + pEE);
  const major = half + Math.hypot(0.5 * (pNN - pEE), pNE);
  // minor from the determinant: half − hypot would cancel when minor ≪ major.
  const minor = major > 0 ? Math.max(0, determinant) / major : 0;
  return { major, minor };
}

/**
 * Probability that a zero-mean bivariate normal error with principal
 * variances l1 and l2 lies within `radiusM` of the origin (closed disc).
 *
 * Method (derived here): write the error as (√a ρ cos φ, √b ρ sin φ) with
 * a ≥ b the principal variances, ρ Rayleigh with unit scale and φ uniform,
 * independent. Then
 *   P = (2/π) ∫₀^{π/2} [1 − exp(−r² / (2(a cos²φ + b sin²φ)))] dφ,
 * and with cot φ = δ sinh u, δ = √(b/a):
 *   P = (2/π) ∫₀^∞ (1 − e^{−E(u)}) δ cosh u / (1 + δ² sinh²u) du,
 *   E(u) = (r²/2a)(1 + (1/δ² − 1) sech²u).
 * The integrand is even and analytic for |Im u| < π/2, with Re sech² ≥ 0 for
 * |Im u| ≤ π/4, so the trapezoidal rule converges like e^{−π²/(2h)} whatever
 * δ is (L. N. Trefethen and J. A. C. Weideman, "The exponentially convergent
 * trapezoidal rule", SIAM Review 56(3):385–458, 2014, Thm 5.1). The tail beyond
 * u is below 2e^{−u}/δ, which sets where the sum stops.
 *
 * @param l1 one principal variance, m², ≥ 0 (either order).
 * @param l2 the other principal variance, m², ≥ 0.
 * @param radiusM circle radius, m, ≥ 0.
 * @returns probability in [0, 1], absolute error about 1e-15; 1 when both
 *   variances are zero (all mass at the centre).
 * @throws InputError when an argument is negative or not finite.
 */
export function probabilityInsideCircle(l1: number, l2: number, radiusM: number): number {
  for (const [name, v] of [['l1', l1], ['l2', l2], ['radiusM', radiusM]] as const) {
    if (!Number.isFinite(v) || v < 0) throw new InputError(name, `must be a finite number ≥ 0, got ${v}`);
  }
  if (Math.max(l1, l2) === 0) return 1;
  return discProbability(Math.max(l1, l2), Math.min(l1, l2))(radiusM);
}

/**
 * The trapezoid sum of probabilityInsideCircle as a function of the radius
 * (m), for major > 0. The nodes depend only on the variances, so the root
 * finder reuses them and each evaluation costs one expm1 per node.
 */
function discProbability(major: number, minor: number): (radiusM: number) => number {
  const delta = Math.max(Math.sqrt(minor / major), MIN_AXIS_RATIO);
  const excess = 1 / (delta * delta) - 1;
  const nodeCount = Math.floor((Math.log(2 / delta) + 40) / STEP) + 1;
  const growth = new Float64Array(nodeCount);
  const weight = new Float64Array(nodeCount);
  for (let k = 0; k < nodeCount; k++) {
    const u = k * STEP;
    const sech = 1 / Math.cosh(u);
    const t = delta * Math.sinh(u);
    growth[k] = 1 + excess * sech * sech;
    // δ cosh u written as √(δ² + t²) so nothing overflows when δ is tiny; u = 0 has trapezoid weight ½.
    weight[k] = ((k === 0 ? 0.5 : 1) * Math.sqrt(delta * delta + t * t)) / (1 + t * t);
  }
  return (radiusM) => {
    const c = (radiusM * radiusM) / (2 * major);
    let sum = 0;
    for (let k = 0; k < nodeCount; k++) sum -= Math.expm1(-c * growth[k]) * weight[k];
    return Math.min(1, (2 / Math.PI) * STEP * sum);
  };
}

/**
 * Radius of the circle holding `probability` of a zero-mean horizontal error
 * with covariance [[pNN, pNE], [pNE, pEE]]: CEP for 0.5, R95 for 0.95.
 *
 * Zero covariance gives 0; rank one gives the 1-D two-sided quantile
 * √major · z((1 + p)/2). Otherwise Brent's method on probabilityInsideCircle,
 * bracketed by those two limits: the root lies between the rank-one radius
 * and the circular (Rayleigh) radius √major · √(−2 ln(1 − p)).
 *
 * @param pNN north variance, m², ≥ 0.
 * @param pEE east variance, m², ≥ 0.
 * @param pNE north-east covariance, m².
 * @param probability p in (0, 1), dimensionless.
 * @returns radius in m. For 1 − p below about 1e-14 it is limited by the
 *   1e-15 absolute accuracy of the probability.
 * @throws InputError for an invalid covariance (see principalVariances) or a
 *   probability not strictly between 0 and 1.
 */
export function radiusForProbability(pNN: number, pEE: number, pNE: number, probability: number): number {
  if (!(probability > 0 && probability < 1)) {
    throw new InputError('probability', `must be strictly between 0 and 1, got ${probability}`);
  }
  const { major, minor } = principalVariances(pNN, pEE, pNE);
  if (major === 0) return 0;
  const sigmaM = Math.sqrt(major);
  // z((1 + p)/2) as −z((1 − p)/2): 1 − p is exact for p ≥ ½, and (1 + p)/2 would round to 1 near p = 1.
  const lineRadiusM = -sigmaM * normalQuantile(0.5 * (1 - probability));
  if (minor === 0) return lineRadiusM;
  const circleRadiusM = sigmaM * Math.sqrt(-2 * Math.log1p(-probability));
  const inside = discProbability(major, minor);
  const excess = (r: number) => inside(r) - probability;
  const fLine = excess(lineRadiusM);
  if (fLine >= 0) return lineRadiusM;
  const fCircle = excess(circleRadiusM);
  if (fCircle <= 0) return circleRadiusM;
  return brentZero(excess, lineRadiusM, circleRadiusM, fLine, fCircle, 1e-15 * circleRadiusM);
}

/**
 * Zero of f in [a, b] with f(a), f(b) of opposite signs, to within
 * 4 ε |x| + toleranceX. R. P. Brent, Algorithms for Minimization without
 * Derivatives, Prentice-Hall 1973, ch. 4 (procedure zero): inverse quadratic
 * interpolation or secant, falling back to bisection.
 */
function brentZero(f: (x: number) => number, a: number, b: number, fa: number, fb: number, toleranceX: number): number {
  let c = a;
  let fc = fa;
  let d = b - a;
  let e = d;
  for (let iteration = 0; iteration < 200; iteration++) {
    if (Math.abs(fc) < Math.abs(fb)) {
      [a, b, c] = [b, c, b];
      [fa, fb, fc] = [fb, fc, fb];
    }
    const tol = 2 * Number.EPSILON * Math.abs(b) + 0.5 * toleranceX;
    const half = 0.5 * (c - b);
    if (Math.abs(half) <= tol || fb === 0) return b;
    if (Math.abs(e) >= tol && Math.abs(fa) > Math.abs(fb)) {
      const s = fb / fa;
      let p: number;
      let q: number;
      if (a === c) {
        p = 2 * half * s;
        q = 1 - s;
      } else {
        const qa = fa / fc;
        const r = fb / fc;
        p = s * (2 * half * qa * (qa - r) - (b - a) * (r - 1));
        q = (qa - 1) * (r - 1) * (s - 1);
      }
      if (p > 0) q = -q;
      else p = -p;
      if (2 * p < Math.min(3 * half * q - Math.abs(tol * q), Math.abs(e * q))) {
        e = d;
        d = p / q;
      } else {
        d = half;
        e = d;
      }
    } else {
      d = half;
      e = d;
    }
    a = b;
    fa = fb;
    b += Math.abs(d) > tol ? d : half > 0 ? tol : -tol;
    fb = f(b);
    if ((fb > 0 && fc > 0) || (fb < 0 && fc < 0)) {
      c = a;
      fc = fa;
      d = b - a;
      e = d;
    }
  }
  return b;
}
