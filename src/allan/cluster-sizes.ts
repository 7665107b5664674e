/**
 * The cluster sizes an Allan curve is evaluated at.
 *
 * Spacing (a choice of this project): m = round(10^(k/d)) for k = 0, 1, 2, …,
 * duplicates dropped, up to ⌊N/2⌋ (the largest m that still leaves one
 * overlapping difference and two non-overlapping clusters). The default
 * d = 10 points per decade keeps neighbouring τ 26 % apart, close enough for
 * a local slope over half a decade (5 points) and to place a floor within
 * ±13 % in τ before interpolation; 10 million samples give 64 sizes.
 * Small m are dense (1, 2, 3, 4, 5, 6, 8, 10, 13, 16, 20, 25, 32, …).
 */
import { InputError } from '../errors';

/** Default points per decade of τ. */
export const DEFAULT_POINTS_PER_DECADE = 10;

/**
 * Log-spaced cluster sizes for `sampleCount` samples.
 * @param sampleCount N, the number of rate samples (≥ 2).
 * @param pointsPerDecade d, from 1 to 100.
 * @returns increasing whole cluster sizes from 1 to at most ⌊N/2⌋.
 * @throws InputError when N < 2 or d is out of range.
 */
export function logSpacedClusterSizes(sampleCount: number, pointsPerDecade = DEFAULT_POINTS_PER_DECADE): number[] {
  if (!Number.isInteger(sampleCount) || sampleCount < 2) {
    throw new InputError('sampleCount', `an Allan curve needs at least 2 samples, got ${sampleCount}`);
  }
  if (!Number.isFinite(pointsPerDecade) || pointsPerDecade < 1 || pointsPerDecade > 100) {
    throw new InputError('pointsPerDecade', `must be from 1 to 100, got ${pointsPerDecade}`);
  }
  const largest = Math.floor(sampleCount / 2);
  const sizes: number[] = [];
  for (let k = 0; ; k++) {
    const m = Math.round(10 ** (k / pointsPerDecade));
    if (m > largest) break;
    if (m !== sizes[sizes.length - 1]) sizes.push(m);
  }
  return sizes;
}
