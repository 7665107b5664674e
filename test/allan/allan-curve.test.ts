import { describe, expect, it } from 'vitest';
import { allanDeviationCurve, allanDeviationCurveFromIncrements } from '../../src/allan/allan-curve';
import { angleAllanVariance, anglesFromIncrements, nonOverlappingAllanVariance, overlappingAllanVariance } from '../../src/allan/allan-estimators';
import { logSpacedClusterSizes } from '../../src/allan/cluster-sizes';
import { allanPercentageError } from '../../src/allan/percentage-error';
import { InputError } from '../../src/errors';
import { expectRelative } from './expect-close';
import { syntheticRateLog } from './synthetic-log';

describe('log-spaced cluster sizes', () => {
  it('start at 1, increase, stay at or below N/2 and number about ten per decade', () => {
    const sizes = logSpacedClusterSizes(10_000_000);
    expect(sizes[0]).toBe(1);
    expect(sizes.every((m, i) => i === 0 || m > sizes[i - 1])).toBe(true);
    expect(sizes[sizes.length - 1]).toBeLessThanOrEqual(5_000_000);
    expect(sizes.length).toBe(64);
    expect(logSpacedClusterSizes(100)).toEqual([1, 2, 3, 4, 5, 6, 8, 10, 13, 16, 20, 25, 32, 40, 50]);
  });

  it('refuse fewer than two samples', () => {
    expect(() => logSpacedClusterSizes(1)).toThrow(InputError);
  });
});

describe('the IEEE Std 952 percentage error', () => {
  it('matches the values recorded in docs/checks.md §1.3', () => {
    // docs/checks.md §1.3, computed: 7.106691 %, 23.570226 %, 0.707142 %.
    expectRelative(allanPercentageError(100000, 1000), 0.0710669054518702, 1e-12);
    expectRelative(allanPercentageError(100000, 10000), 0.23570226, 1e-7);
    expectRelative(allanPercentageError(10000, 1), 0.00707142, 1e-5);
  });

  it('refuses a cluster as long as the log', () => {
    expect(() => allanPercentageError(10, 10)).toThrow(InputError);
  });
});

describe('the Allan deviation curve', () => {
  const rate = syntheticRateLog({ rateHz: 50, sampleCount: 5000, seed: 7, randomWalk: 0.01, rateRandomWalk: 1e-3 });

  it('equals the single-cluster-size estimators at every point', () => {
    const curve = allanDeviationCurve(rate, 50);
    curve.clusterSizes.forEach((m, i) => {
      expectRelative(curve.adev[i], Math.sqrt(overlappingAllanVariance(rate, m)), 1e-12);
      expect(curve.tauS[i]).toBeCloseTo(m / 50, 12);
    });
    const nonOverlapping = allanDeviationCurve(rate, 50, { estimator: 'non-overlapping' });
    nonOverlapping.clusterSizes.forEach((m, i) => expectRelative(nonOverlapping.adev[i], Math.sqrt(nonOverlappingAllanVariance(rate, m)), 1e-12));
  });

  it('carries σ(1 ∓ δ) bounds with δ from the percentage-error formula', () => {
    const curve = allanDeviationCurve(rate, 50);
    curve.clusterSizes.forEach((m, i) => {
      const delta = allanPercentageError(5000, m);
      expectRelative(curve.percentageError[i], delta, 1e-15);
      expectRelative(curve.lower[i], curve.adev[i] * (1 - delta), 1e-15);
      expectRelative(curve.upper[i], curve.adev[i] * (1 + delta), 1e-15);
    });
  });

  it('from increments equals the θ form with θ₀ = 0 (L = N + 1)', () => {
    // docs/checks.md §1.2: the θ form equals the rate form only with θ₀ included.
    const increments = rate.map((y) => y / 50);
    const curve = allanDeviationCurveFromIncrements(increments, 50, { clusterSizes: [1, 2, 5, 40] });
    const theta = anglesFromIncrements(increments);
    [1, 2, 5, 40].forEach((m, i) => expectRelative(curve.adev[i], Math.sqrt(angleAllanVariance(theta, 1 / 50, m)), 1e-9));
  });

  it('refuses too few samples, a bad rate and bad cluster sizes with the field named', () => {
    expect(() => allanDeviationCurve(Float64Array.from([1, 2, 3]), 10)).toThrow(/at least 4 samples/);
    expect(() => allanDeviationCurve(rate, 0)).toThrow(/rateHz/);
    expect(() => allanDeviationCurve(rate, 50, { clusterSizes: [1, 1] })).toThrow(/clusterSizes\[1\]/);
    expect(() => allanDeviationCurve(rate, 50, { clusterSizes: [3000] })).toThrow(/clusterSizes\[0\]/);
  });
});
