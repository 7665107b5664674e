/**
 * The upper tail of the χ² distribution, P(χ²_k > x) = Q(k/2, x/2), with Q
 * the regularised upper incomplete gamma function. Computed as in W. H.
 * Press et al., "Numerical Recipes in C", 2nd ed., Cambridge 1992, §6.2
 * (gser, gcf): the series for P(a, x) when x < a + 1, otherwise the continued
 * fraction for Q(a, x) by the modified Lentz method; ln Γ by the Lanczos
 * approximation of §6.1 (gammln: γ = 5, six coefficients, |error| < 2e-10).
 */
import { InputError } from '../errors';

const LANCZOS = [76.18009172947146, -86.50532032941677, 24.01409824083091, -1.231739572450155, 0.1208650973866179e-2, -0.5395239384953e-5];
const EPS = 1e-15;
const TINY = 1e-300;
const MAX_ITERATIONS = 1000;

/** ln Γ(a) for a > 0 (Lanczos, Numerical Recipes §6.1). Throws nothing. */
export function logGamma(a: number): number {
  let x = a, y = a;
  let tmp = x + 5.5;
  tmp -= (x + 0.5) * Math.log(tmp);
  let ser = 1.000000000190015;
  for (const c of LANCZOS) ser += c / ++y;
  return -tmp + Math.log((2.5066282746310005 * ser) / x);
}

/** P(a, x) by its series; use for x < a + 1. */
function lowerSeries(a: number, x: number): number {
  let ap = a, sum = 1 / a, del = sum;
  for (let n = 0; n < MAX_ITERATIONS; n++) {
    del *= x / ++ap;
    sum += del;
    if (Math.abs(del) < Math.abs(sum) * EPS) break;
  }
  return sum * Math.exp(-x + a * Math.log(x) - logGamma(a));
}

/** Q(a, x) by its continued fraction (modified Lentz); use for x ≥ a + 1. */
function upperFraction(a: number, x: number): number {
  let b = x + 1 - a, c = 1 / TINY, d = 1 / b, h = d;
  for (let i = 1; i < MAX_ITERATIONS; i++) {
    const an = -i * (i - a);
    b += 2;
    d = an * d + b;
    if (Math.abs(d) < TINY) d = TINY;
    c = b + an / c;
    if (Math.abs(c) < TINY) c = TINY;
    d = 1 / d;
    const del = d * c;
    h *= del;
    if (Math.abs(del - 1) < EPS) break;
  }
  return Math.exp(-x + a * Math.log(x) - logGamma(a)) * h;
}

/**
 * P(χ²_k > x): the p-value of a χ² statistic x with k degrees of freedom.
 * @param x the statistic, ≥ 0.
 * @param degreesOfFreedom k, > 0.
 * @returns a probability in [0, 1].
 * @throws InputError when x < 0 or k ≤ 0 (or either is not finite).
 */
export function chiSquareUpperTail(x: number, degreesOfFreedom: number): number {
  if (!(x >= 0) || !Number.isFinite(x)) throw new InputError('x', `a χ² statistic must be a finite number ≥ 0, got ${x}`);
  if (!(degreesOfFreedom > 0) || !Number.isFinite(degreesOfFreedom)) throw new InputError('degreesOfFreedom', `must be > 0, got ${degreesOfFreedom}`);
  if (x === 0) return 1;
  const a = degreesOfFreedom / 2, half = x / 2;
  return half < a + 1 ? Math.min(1, Math.max(0, 1 - lowerSeries(a, half))) : Math.min(1, Math.max(0, upperFraction(a, half)));
}
