/**
 * Confidence levels for one-dimensional (normally distributed) quantities
 * (docs/planar-model.md §8: 1 sigma, 2 sigma, 95 %), and the standard normal quantile
 * they need.
 */

import { InputError } from '../errors';
import type { ConfidenceLevel } from '../inputs/budget-input';

/**
 * Standard normal quantile z with Φ(z) = probability.
 *
 * P. J. Acklam's rational approximation ("An algorithm for computing the
 * inverse normal cumulative distribution function", 2003; relative error
 * below 1.15e-9), followed by one Halley step on Φ(z) − p as Acklam
 * proposes, which brings it to double precision. Φ is evaluated in the
 * lower tail only, through erfc of a non-negative argument, so upper
 * probabilities keep their accuracy (1 − p is exact for p ≥ 0.5 by
 * Sterbenz's lemma). Checked against 40-digit mpmath: relative error
 * ≤ 5e-16 for p from 1e-300 to 1 − 1e-15, absolute error ≤ 1e-16 near p = 1/2;
 * below about 1e-307 only Acklam's 1.15e-9 holds.
 *
 * @param probability p in (0, 1), dimensionless.
 * @returns z in standard deviations.
 * @throws InputError when probability is not strictly between 0 and 1.
 */
export function normalQuantile(probability: number): number {
  if (!(probability > 0 && probability < 1)) {
    throw new InputError('probability', `must be strictly between 0 and 1, got ${probability}`);
  }
  if (probability > 0.5) return -lowerQuantile(1 - probability);
  return lowerQuantile(probability);
}

/**
 * Multiple of the standard deviation that bounds a 1-D normal error at the
 * given level: 1, 2, the two-sided 95 % factor z(0.975) ≈ 1.959963984540054,
 * or the two-sided 50 % factor z(0.75) ≈ 0.6744897501960817.
 *
 * @param level '1sigma', '2sigma', '95%' or '50%'.
 * @returns the factor, dimensionless.
 * @throws InputError for any other level.
 */
export function confidenceFactor1D(level: ConfidenceLevel): number {
  switch (level) {
    case '1sigma':
      return 1;
    case '2sigma':
      return 2;
    case '95%':
      return normalQuantile(0.975);
    case '50%':
      return normalQuantile(0.75);
    default:
      throw new InputError('level', `confidence level must be '1sigma', '2sigma', '95%' or '50%', got '${String(level)}'`);
  }
}

// Acklam (2003) coefficients: central region numerator a, denominator b; tail numerator c, denominator d.
const A = [-3.969683028665376e1, 2.209460984245205e2, -2.759285104469687e2, 1.38357751867269e2, -3.066479806614716e1, 2.506628277459239];
const B = [-5.447609879822406e1, 1.615858368580409e2, -1.556989798598866e2, 6.680131188771972e1, -1.328068155288572e1];
const C = [-7.784894002430293e-3, -3.223964580411365e-1, -2.400758277161838, -2.549732539343734, 4.374664141464968, 2.938163982698783];
const D = [7.784695709041462e-3, 3.224671290700398e-1, 2.445134137142996, 3.754408661907416];
const TAIL_BREAK = 0.02425;

/** z ≤ 0 for p ∈ (0, 0.5]. */
function lowerQuantile(p: number): number {
  let z: number;
  if (p < TAIL_BREAK) {
    const q = Math.sqrt(-2 * Math.log(p));
    z = (((((C[0] * q + C[1]) * q + C[2]) * q + C[3]) * q + C[4]) * q + C[5]) / ((((D[0] * q + D[1]) * q + D[2]) * q + D[3]) * q + 1);
  } else {
    const q = p - 0.5;
    const r = q * q;
    z = ((((((A[0] * r + A[1]) * r + A[2]) * r + A[3]) * r + A[4]) * r + A[5]) * q) /
      (((((B[0] * r + B[1]) * r + B[2]) * r + B[3]) * r + B[4]) * r + 1);
  }
  // Halley step (Acklam 2003): e = Φ(z) − p, u = e / φ(z), z ← z − u / (1 + z u / 2).
  const e = 0.5 * erfc(-z / Math.SQRT2) - p;
  const u = e * Math.sqrt(2 * Math.PI) * Math.exp((z * z) / 2);
  // Below p ≈ 1e-307 Φ(z) underflows and u overflows: keep Acklam's value (relative error < 1.15e-9).
  if (!Number.isFinite(u)) return z;
  return z - u / (1 + (z * u) / 2);
}

/**
 * Complementary error function for x ≥ 0, to about 1e-15 relative.
 * Below 1: erfc = 1 − erf with the all-positive Maclaurin series
 * erf x = (2/√π) e^{−x²} Σ 2ⁿ x^{2n+1} / (1·3·…·(2n+1)) (Abramowitz & Stegun
 * 7.1.6), where 1 − erf loses at most a factor 6 in relative accuracy. From 1
 * on: the continued fraction of A&S 7.1.14 / 7.1.4,
 * erfc x = (e^{−x²}/√π) · 1/(x + (1/2)/(x + 1/(x + (3/2)/(x + …)))),
 * evaluated by the modified Lentz method (Press et al., Numerical Recipes,
 * 3rd ed., §5.2).
 */
function erfc(x: number): number {
  if (x < 1) {
    let term = x;
    let sum = x;
    for (let n = 1; term > 1e-17 * sum; n++) {
      term *= (2 * x * x) / (2 * n + 1);
      sum += term;
    }
    return 1 - ((2 / Math.sqrt(Math.PI)) * Math.exp(-x * x) * sum);
  }
  const tiny = 1e-300;
  let f = x;
  let c = x;
  let d = 0;
  for (let k = 1; k < 500; k++) {
    const a = k / 2;
    d = x + a * d;
    d = d === 0 ? tiny : d;
    c = x + a / c;
    c = c === 0 ? tiny : c;
    d = 1 / d;
    const delta = c * d;
    f *= delta;
    if (Math.abs(delta - 1) < 1e-16) break;
  }
  return Math.exp(-x * x) / (Math.sqrt(Math.PI) * f);
}
