/**
 * The upper tail of the χ² distribution, P(χ²_k > x) = 1 − P(k/2, x/2), from
 * the jstat library (npm `jstat`, which runs in the browser as well), in
 * place of a hand port. jstat gives the lower tail only, so p-values below
 * about 1e-15 read as 0: the whiteness check compares p with 5 %, where
 * 1 − P keeps about 15 significant digits. (@stdlib's gammainc has an exact
 * upper tail but brings about 200 packages, 22 MB, into every install.)
 */
/// <reference path="./jstat.d.ts" />
import jstat from 'jstat';
import { InputError } from '../errors';

const { jStat } = jstat;

/** ln Γ(a) for a > 0 (jstat's gammaln, Lanczos approximation). Throws nothing. */
export function logGamma(a: number): number {
  return jStat.gammaln(a);
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
  return Math.min(1, Math.max(0, 1 - jStat.chisquare.cdf(x, degreesOfFreedom)));
}
