/**
 * Allan variance of a first-order Gauss-Markov rate process, and the
 * conversions from a datasheet "bias instability" to the Gauss-Markov sigma
 * the engine uses (docs/planar-model.md §3).
 *
 * Process: x' = −x/T + w, stationary variance σ², autocorrelation σ² e^{−|t|/T}.
 * With u = τ/T (docs/checks.md §1.4, derived there and checked with sympy):
 *   σ_A²(τ) = σ² (2u − 3 + 4e^{−u} − e^{−2u}) / u².
 */

import { InputError } from '../errors';

/** Below this u the closed form loses more than ~1e-15 relative to cancellation (≈ 4.5 ε / u³), so the series is used. */
const SERIES_LIMIT_U = 1;

/**
 * σ_A²/σ² as a function of u = τ/T.
 *
 * Series: expanding both exponentials, the numerator's terms of order 0, 1
 * and 2 cancel and σ_A²/σ² = Σ_{k≥3} (−1)^{k+1} (2^k − 4) u^{k−2} / k!
 * = 2u/3 − u²/2 + 7u³/30 − u⁴/12 + 31u⁵/1260 − … (docs/checks.md §1.4
 * lists the first five terms; the general term is derived here).
 */
function allanRatio(u: number): number {
  if (u < SERIES_LIMIT_U) {
    let sum = 0;
    let sign = 1;
    let twoToK = 8;
    let factorial = 6;
    let uPower = u;
    for (let k = 3; k < 60; k++) {
      const term = (sign * (twoToK - 4) * uPower) / factorial;
      sum += term;
      if (Math.abs(term) <= 1e-17 * Math.abs(sum)) break;
      sign = -sign;
      twoToK *= 2;
      factorial *= k + 1;
      uPower *= u;
    }
    return sum;
  }
  // Divided by u twice rather than by u² so that huge u does not overflow.
  return (2 - 3 / u + (4 * Math.exp(-u) - Math.exp(-2 * u)) / u) / u;
}

/**
 * u N'(u) − 2 N(u), with N the closed form's numerator: u³ times
 * d(σ_A²/σ²)/du, so it has the slope's sign. Expanded, it is
 * −2u + 6 − (4u + 8)e^{−u} + (2u + 2)e^{−2u} (docs/checks.md §1.4).
 */
function slopeNumerator(u: number): number {
  return -2 * u + 6 - (4 * u + 8) * Math.exp(-u) + (2 * u + 2) * Math.exp(-2 * u);
}

/** Bisection on [lo, hi] until the interval cannot shrink in doubles; f(lo) > 0 > f(hi). */
function bisectToMachinePrecision(f: (x: number) => number, lo: number, hi: number): number {
  for (;;) {
    const mid = 0.5 * (lo + hi);
    if (mid <= lo || mid >= hi) return Math.abs(f(lo)) <= Math.abs(f(hi)) ? lo : hi;
    if (f(mid) > 0) lo = mid;
    else hi = mid;
  }
}

/**
 * u* = τ_peak / T where the Gauss-Markov Allan variance peaks, ≈ 1.892617832925019.
 * Computed at load by bisection of the slope on [1, 3], which brackets the only sign change.
 */
export const GM_ALLAN_PEAK_U: number = bisectToMachinePrecision(slopeNumerator, 1, 3);

/** Peak Allan deviation over σ, σ_A(τ_peak)/σ ≈ 0.6173642831444414 (dimensionless), computed at load. */
export const GM_ALLAN_PEAK_RATIO: number = Math.sqrt(allanRatio(GM_ALLAN_PEAK_U));

/**
 * √(2 ln 2 / π) ≈ 0.6642824702679601: the flat Allan deviation of flicker
 * (1/f) rate noise with coefficient B is B·√(2 ln 2 / π) (IEEE Std 952-1997,
 * Annex C, bias instability).
 */
export const FLICKER_FLOOR_FACTOR: number = Math.sqrt((2 * Math.LN2) / Math.PI);

/**
 * Allan variance of a Gauss-Markov rate process at cluster time tauS.
 *
 * @param sigma stationary standard deviation of the process, in any rate
 *   unit (SI: rad/s for a gyro, m/s² for an accelerometer).
 * @param correlationTimeS correlation time T in seconds, > 0.
 * @param tauS averaging (cluster) time τ in seconds, > 0.
 * @returns σ_A²(τ) in the unit of sigma, squared.
 * @throws InputError when sigma is negative or not finite, or either time
 *   is not a finite positive number.
 */
export function gaussMarkovAllanVariance(sigma: number, correlationTimeS: number, tauS: number): number {
  if (!Number.isFinite(sigma) || sigma < 0) {
    throw new InputError('sigma', `Gauss-Markov sigma must be a finite number ≥ 0, got ${sigma}`);
  }
  checkPositiveTime('correlationTimeS', correlationTimeS);
  checkPositiveTime('tauS', tauS);
  return sigma * sigma * allanRatio(tauS / correlationTimeS);
}

/**
 * The Gauss-Markov sigma whose Allan deviation peak equals a datasheet
 * bias-instability floor (docs/planar-model.md §3 convention): floor / GM_ALLAN_PEAK_RATIO.
 *
 * @param floorSI Allan deviation floor in SI rate units (rad/s or m/s²), ≥ 0.
 * @returns Gauss-Markov sigma in the same unit.
 * @throws InputError when floorSI is negative or not finite.
 */
export function gaussMarkovSigmaFromAllanFloor(floorSI: number): number {
  if (!Number.isFinite(floorSI) || floorSI < 0) {
    throw new InputError('floorSI', `Allan deviation floor must be a finite number ≥ 0, got ${floorSI}`);
  }
  return floorSI / GM_ALLAN_PEAK_RATIO;
}

/**
 * The correlation time that puts the Gauss-Markov Allan peak at the cluster
 * time where a measured floor was read: τ_floor / GM_ALLAN_PEAK_U (docs/planar-model.md §3).
 *
 * @param tauFloorS cluster time of the floor in seconds, > 0.
 * @returns correlation time T in seconds.
 * @throws InputError when tauFloorS is not a finite positive number.
 */
export function gaussMarkovCorrelationTimeFromFloorTau(tauFloorS: number): number {
  checkPositiveTime('tauFloorS', tauFloorS);
  return tauFloorS / GM_ALLAN_PEAK_U;
}

/**
 * Allan deviation floor of flicker rate noise with coefficient B:
 * B·√(2 ln 2 / π) (IEEE Std 952-1997, Annex C).
 *
 * @param flickerCoefficientSI B in SI rate units (rad/s or m/s²), ≥ 0.
 * @returns the floor in the same unit.
 * @throws InputError when B is negative or not finite.
 */
export function flickerCoefficientToFloor(flickerCoefficientSI: number): number {
  if (!Number.isFinite(flickerCoefficientSI) || flickerCoefficientSI < 0) {
    throw new InputError('flickerCoefficientSI', `flicker coefficient B must be a finite number ≥ 0, got ${flickerCoefficientSI}`);
  }
  return flickerCoefficientSI * FLICKER_FLOOR_FACTOR;
}

function checkPositiveTime(path: string, valueS: number): void {
  if (!Number.isFinite(valueS) || valueS <= 0) {
    throw new InputError(path, `must be a finite time in seconds > 0, got ${valueS}`);
  }
}
