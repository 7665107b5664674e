/**
 * Noise density, per-sample sigma and random-walk coefficient of a white noise.
 *
 * Convention (the engine's, stated once here): IEEE Std 952 two-sided. A white
 * rate noise of two-sided power spectral density N² has angle random walk N,
 * and its Allan deviation at τ = 1 s is N. A datasheet noise density (deg/s/√Hz,
 * µg/√Hz) is taken to be numerically N, i.e. two-sided, unless the row marks it
 * one-sided. A one-sided PSD folds the negative frequencies onto the positive
 * ones, so it is twice the two-sided PSD, and N = density/√2. The same holds
 * for accelerometers (velocity random walk) and any other white noise.
 *
 * Sampled noise: independent samples of standard deviation σ_d at rate f_s
 * have a two-sided PSD σ_d²/f_s, so N = σ_d/√f_s.
 *
 * All values are SI and the functions are unit-agnostic as long as the caller
 * is consistent: a density in rad/s/√Hz gives N in rad/√s (the same unit), a
 * per-sample σ in rad/s gives N in rad/√s.
 */
import { InputError } from '../errors';

/** Which spectrum a datasheet density refers to. */
export type DensitySides = 'one' | 'two';

function requireNonNegative(x: number, what: string, path: string): void {
  if (typeof x !== 'number' || !Number.isFinite(x) || x < 0) {
    throw new InputError(path, `${what} must be a finite number of zero or more, got ${String(x)}`);
  }
}

function requireRate(rateHz: number, path: string): void {
  if (typeof rateHz !== 'number' || !Number.isFinite(rateHz) || rateHz <= 0) {
    throw new InputError(path, `the sample rate must be a finite number of Hz greater than zero, got ${String(rateHz)}`);
  }
}

/** √2 for a one-sided density, 1 for two-sided; checks `sides` at run time too. */
function sideFactor(sides: DensitySides, path: string): number {
  if (sides === 'two') return 1;
  if (sides === 'one') return Math.SQRT2;
  throw new InputError(path, `the density must be marked 'one'- or 'two'-sided, got ${JSON.stringify(sides)}`);
}

/**
 * The random-walk coefficient N (rad/√s, or m/s/√s) of a white noise whose
 * datasheet density is `densitySI` (rad/s/√Hz, or m/s²/√Hz): N = density for
 * a two-sided density, density/√2 for a one-sided one.
 * @param path where the density sits in the input, for error messages.
 * @throws InputError naming `path` when the density is negative or not
 *   finite, or `sides` is neither 'one' nor 'two'.
 */
export function randomWalkFromDensity(densitySI: number, sides: DensitySides, path = ''): number {
  requireNonNegative(densitySI, 'the noise density', path);
  return densitySI / sideFactor(sides, path);
}

/**
 * Inverse of {@link randomWalkFromDensity}: the density (rad/s/√Hz, or
 * m/s²/√Hz) to print for a random-walk coefficient `randomWalkSI`.
 * @throws InputError naming `path` as {@link randomWalkFromDensity} does.
 */
export function densityFromRandomWalk(randomWalkSI: number, sides: DensitySides, path = ''): number {
  requireNonNegative(randomWalkSI, 'the random-walk coefficient', path);
  return randomWalkSI * sideFactor(sides, path);
}

/**
 * The random-walk coefficient N = σ_d/√f_s of independent samples with
 * standard deviation `sigmaSI` (rad/s, or m/s) at `rateHz` (Hz); N in rad/√s
 * (or m/s/√s).
 * @throws InputError naming `path` when `sigmaSI` is negative or not finite,
 *   or `rateHz` is not a finite number greater than zero.
 */
export function randomWalkFromSampleSigma(sigmaSI: number, rateHz: number, path = ''): number {
  requireNonNegative(sigmaSI, 'the per-sample sigma', path);
  requireRate(rateHz, path);
  return sigmaSI / Math.sqrt(rateHz);
}

/**
 * Inverse of {@link randomWalkFromSampleSigma}: the per-sample standard
 * deviation σ_d = N·√f_s (rad/s, or m/s) of a random walk `randomWalkSI`
 * (rad/√s, or m/s/√s) sampled at `rateHz` (Hz).
 * @throws InputError naming `path` when `randomWalkSI` is negative or not
 *   finite, or `rateHz` is not a finite number greater than zero.
 */
export function sampleSigmaFromRandomWalk(randomWalkSI: number, rateHz: number, path = ''): number {
  requireNonNegative(randomWalkSI, 'the random-walk coefficient', path);
  requireRate(rateHz, path);
  return randomWalkSI * Math.sqrt(rateHz);
}
