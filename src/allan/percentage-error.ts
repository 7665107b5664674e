/**
 * The IEEE Std 952 "percentage error" of an Allan deviation estimate:
 *   δ(τ) = 1 / √(2(N/n − 1)),
 * N samples, n samples per cluster, N/n independent clusters
 * (IEEE Std 952-1997 Annex C; El-Sheimy, Hou & Niu 2008; as recorded in
 * docs/checks.md §1.3, formula from memory there, not confirmed).
 *
 * It is an approximation that UNDERSTATES the real scatter: Monte-Carlo runs
 * on white noise (docs/checks.md §1.3) show the actual spread of the
 * non-overlapping estimate about 20 % larger (8.77 % against 7.1 % at K = 100,
 * 27.2 % against 23.6 % at K = 10), because adjacent differences share a
 * cluster and are correlated. The overlapping estimator scatters less than the
 * formula says for white noise, but the same δ is used for both here, and the
 * bounds built from it are a rough 68 % band, not a confidence interval.
 */
import { InputError } from '../errors';

/**
 * δ = 1/√(2(N/n − 1)), dimensionless (0.071 is 7.1 %).
 * @param sampleCount N, the number of samples, > n.
 * @param clusterSize n, samples per cluster, ≥ 1.
 * @throws InputError unless N > n ≥ 1 (with N/n ≤ 1 there is no difference to average).
 */
export function allanPercentageError(sampleCount: number, clusterSize: number): number {
  if (!(clusterSize >= 1) || !(sampleCount > clusterSize) || !Number.isFinite(sampleCount)) {
    throw new InputError('clusterSize', `the percentage error needs N > n ≥ 1, got N = ${sampleCount}, n = ${clusterSize}`);
  }
  return 1 / Math.sqrt(2 * (sampleCount / clusterSize - 1));
}
