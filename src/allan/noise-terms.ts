/**
 * The five IEEE Std 952 noise terms as Allan variance curves, with the slope
 * and read-off point of each (IEEE Std 952-1997 Annex C, as tabulated in
 * docs/checks.md §1.1; read-off points also in the MEMS Industry Group's
 * "Standard Sensor Performance Parameters"):
 *
 * | term              | σ²(τ)           | slope of log σ | read-off            |
 * | quantisation Q    | 3Q²/τ²          | −1             | σ(√3) = Q           |
 * | random walk N     | N²/τ            | −½             | σ(1 s) = N          |
 * | bias instability B| (2 ln2/π) B²    | 0              | B = floor / 0.664   |
 * | rate random walk K| K²τ/3           | +½             | σ(3 s) = K          |
 * | rate ramp R       | R²τ²/2          | +1             | σ(√2 s) = R         |
 *
 * Independent terms add in variance. Coefficients are in SI-consistent units
 * when τ is in seconds and σ in the rate unit (gyro: Q rad, N rad/√s,
 * B rad/s, K rad/s/√s, R rad/s²).
 */
import { FLICKER_FLOOR_FACTOR } from '../sources/gauss-markov-allan';

/** Identifier of an IEEE Std 952 noise term, in order of slope. */
export type NoiseTermId = 'quantisation' | 'random-walk' | 'bias-instability' | 'rate-random-walk' | 'rate-ramp';

/** One noise term's Allan signature. */
export interface NoiseTermShape {
  readonly id: NoiseTermId;
  /** Slope of log σ against log τ. */
  readonly slope: number;
  /**
   * τ in s where σ of the term equals its coefficient, or undefined for bias
   * instability (read from the floor: B = floor / 0.664282).
   */
  readonly readOffTauS: number | undefined;
  /** σ²(τ) of the term with coefficient 1 (τ in s): the basis of the least-squares fit. */
  readonly unitVariance: (tauS: number) => number;
  /** The coefficient from σ at the read-off τ (or from the floor, for bias instability). */
  readonly coefficientFromDeviation: (sigma: number) => number;
}

const identity = (sigma: number): number => sigma;

/** The five terms, ordered by slope from −1 to +1. */
export const NOISE_TERMS: readonly NoiseTermShape[] = [
  { id: 'quantisation', slope: -1, readOffTauS: Math.sqrt(3), unitVariance: (t) => 3 / (t * t), coefficientFromDeviation: identity },
  { id: 'random-walk', slope: -0.5, readOffTauS: 1, unitVariance: (t) => 1 / t, coefficientFromDeviation: identity },
  {
    id: 'bias-instability',
    slope: 0,
    readOffTauS: undefined,
    unitVariance: () => FLICKER_FLOOR_FACTOR * FLICKER_FLOOR_FACTOR,
    coefficientFromDeviation: (floor) => floor / FLICKER_FLOOR_FACTOR,
  },
  { id: 'rate-random-walk', slope: 0.5, readOffTauS: 3, unitVariance: (t) => t / 3, coefficientFromDeviation: identity },
  { id: 'rate-ramp', slope: 1, readOffTauS: Math.SQRT2, unitVariance: (t) => (t * t) / 2, coefficientFromDeviation: identity },
];

/**
 * The shape of one term by id. Throws nothing (the id type admits only known terms).
 */
export function noiseTerm(id: NoiseTermId): NoiseTermShape {
  return NOISE_TERMS.find((t) => t.id === id)!;
}

/**
 * σ(τ) of one term with the given coefficient: √(coefficient² · unitVariance(τ)).
 * @param coefficient Q, N, B, K or R in units consistent with τ in s.
 * @param tauS cluster time in s, > 0.
 * @returns σ in the rate unit. Throws nothing; a non-positive τ gives NaN or Infinity.
 */
export function termDeviation(id: NoiseTermId, coefficient: number, tauS: number): number {
  return Math.abs(coefficient) * Math.sqrt(noiseTerm(id).unitVariance(tauS));
}
