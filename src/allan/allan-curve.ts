/**
 * An Allan deviation curve: σ(τ) at log-spaced cluster times, with the
 * IEEE Std 952 percentage-error band, from rate samples or from increments
 * (angle, velocity or distance per sample).
 */
import { InputError } from '../errors';
import { centredCumulativeSum, nonOverlappingFromCumulative, sumSquaredSecondDifferences } from './allan-estimators';
import { DEFAULT_POINTS_PER_DECADE, logSpacedClusterSizes } from './cluster-sizes';
import { allanPercentageError } from './percentage-error';

/** Which estimator a curve uses (docs/checks.md §1.2). */
export type AllanEstimator = 'overlapping' | 'non-overlapping';

/**
 * σ(τ) at each cluster size, in the unit of the rate samples (SI when the
 * caller converted first). Arrays are parallel and ordered by τ.
 */
export interface AllanCurve {
  /** Cluster times τ = mτ₀ in s. */
  readonly tauS: Float64Array;
  /** Cluster sizes m (samples per cluster). */
  readonly clusterSizes: Float64Array;
  /** Allan deviation σ(τ), rate unit. */
  readonly adev: Float64Array;
  /** Percentage error δ(τ) (dimensionless, 0.07 = 7 %); see {@link allanPercentageError}. */
  readonly percentageError: Float64Array;
  /** σ(1 − δ), rate unit: a rough lower bound that understates the real scatter. */
  readonly lower: Float64Array;
  /** σ(1 + δ), rate unit: a rough upper bound that understates the real scatter. */
  readonly upper: Float64Array;
  /** Number of rate samples N. */
  readonly sampleCount: number;
  /** Sample interval τ₀ in s. */
  readonly tau0S: number;
  readonly estimator: AllanEstimator;
}

/** Options of {@link allanDeviationCurve}. */
export interface AllanCurveOptions {
  /** Default 'overlapping'. */
  readonly estimator?: AllanEstimator;
  /** Points per decade of τ; default {@link DEFAULT_POINTS_PER_DECADE}. */
  readonly pointsPerDecade?: number;
  /** Explicit cluster sizes (whole, increasing, each ≤ N/2); replaces the log spacing. */
  readonly clusterSizes?: readonly number[];
}

/** Fewest samples an Allan curve accepts: m = 1 and m = 2 then both exist. */
export const MIN_ALLAN_SAMPLES = 4;

function checkInputs(sampleCount: number, rateHz: number): void {
  if (!(rateHz > 0) || !Number.isFinite(rateHz)) {
    throw new InputError('rateHz', `the sample rate must be a finite number of Hz > 0, got ${rateHz}`);
  }
  if (sampleCount < MIN_ALLAN_SAMPLES) {
    throw new InputError('samples', `an Allan curve needs at least ${MIN_ALLAN_SAMPLES} samples, got ${sampleCount}; record a longer log`);
  }
}

function chosenSizes(n: number, options: AllanCurveOptions): number[] {
  const sizes = options.clusterSizes ? [...options.clusterSizes] : logSpacedClusterSizes(n, options.pointsPerDecade ?? DEFAULT_POINTS_PER_DECADE);
  sizes.forEach((m, i) => {
    if (!Number.isInteger(m) || m < 1 || 2 * m > n || (i > 0 && m <= sizes[i - 1])) {
      throw new InputError(`clusterSizes[${i}]`, `cluster sizes must be whole, increasing and from 1 to ${Math.floor(n / 2)}, got ${m}`);
    }
  });
  return sizes;
}

/**
 * The Allan deviation curve of rate samples. Overlapping: one centred
 * cumulative sum, then O(N) per cluster size (see allan-estimators.ts).
 * @param rate rate samples y₁…y_N at uniform spacing, any rate unit (N ≥ 4).
 * @param rateHz sample rate 1/τ₀ in Hz.
 * @returns the curve, σ in the unit of `rate`.
 * @throws InputError for too few samples, a bad rate, bad cluster sizes, an
 *   unknown estimator or non-finite samples.
 */
export function allanDeviationCurve(rate: Float64Array, rateHz: number, options: AllanCurveOptions = {}): AllanCurve {
  checkInputs(rate.length, rateHz);
  const n = rate.length;
  const sizes = chosenSizes(n, options);
  const estimator = options.estimator ?? 'overlapping';
  if (estimator !== 'overlapping' && estimator !== 'non-overlapping') {
    throw new InputError('estimator', `must be 'overlapping' or 'non-overlapping', got ${JSON.stringify(estimator)}`);
  }
  const c = centredCumulativeSum(rate);
  const variance = sizes.map((m) =>
    estimator === 'overlapping'
      ? sumSquaredSecondDifferences(c, c.length, m) / (2 * m * m * (n - 2 * m + 1))
      : nonOverlappingFromCumulative(c, n, m),
  );
  return assembleCurve(variance, sizes, n, 1 / rateHz, estimator);
}

/**
 * The Allan deviation curve of increments (angle, velocity or distance per
 * sample): the rates Δθ_k/τ₀, so that θ starts at θ₀ = 0 and L = N + 1
 * (the convention under which the θ form equals the rate form).
 * @param increments Δθ₁…Δθ_N in any unit (N ≥ 4).
 * @param rateHz sample rate in Hz.
 * @returns the curve, σ in increment unit per second.
 * @throws as {@link allanDeviationCurve}.
 */
export function allanDeviationCurveFromIncrements(increments: Float64Array, rateHz: number, options: AllanCurveOptions = {}): AllanCurve {
  checkInputs(increments.length, rateHz);
  const rate = new Float64Array(increments.length);
  for (let i = 0; i < rate.length; i++) rate[i] = increments[i] * rateHz;
  return allanDeviationCurve(rate, rateHz, options);
}

function assembleCurve(variance: number[], sizes: number[], n: number, tau0S: number, estimator: AllanEstimator): AllanCurve {
  const k = sizes.length;
  const tauS = new Float64Array(k), adev = new Float64Array(k), percentageError = new Float64Array(k);
  const lower = new Float64Array(k), upper = new Float64Array(k);
  for (let i = 0; i < k; i++) {
    tauS[i] = sizes[i] * tau0S;
    adev[i] = Math.sqrt(variance[i]);
    percentageError[i] = allanPercentageError(n, sizes[i]);
    lower[i] = adev[i] * (1 - percentageError[i]);
    upper[i] = adev[i] * (1 + percentageError[i]);
  }
  return { tauS, clusterSizes: Float64Array.from(sizes), adev, percentageError, lower, upper, sampleCount: n, tau0S, estimator };
}
