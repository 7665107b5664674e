import { describe, expect, it } from 'vitest';
import {
  angleAllanVariance, anglesFromIncrements, nonOverlappingAllanVariance, overlappingAllanVariance,
} from '../../src/allan/allan-estimators';
import { InputError } from '../../src/errors';
import { expectRelative } from './expect-close';

/** NBS Monograph 140 nine-point set, as listed in docs/checks.md §1.2. */
const NBS = Float64Array.from([892, 809, 823, 798, 671, 644, 883, 903, 677]);
/** The toy set of docs/checks.md §1.2. */
const TOY = Float64Array.from([1, 3, 2, 5, 4, 6]);

describe('Allan variance estimators', () => {
  it('reproduce the NBS nine-point overlapping and non-overlapping deviations at m = 1..4', () => {
    // docs/checks.md §1.2: computed with numpy (avar_overlap, avar_nonoverlap); Riley's Table I lists the same from memory. rel 1e-10.
    const table: [number, number, number][] = [
      [1, 91.2294497407, 91.2294497407],
      [2, 115.8082107049, 85.9528698377],
      [3, 89.9723723027, 71.1306505274],
      [4, 39.0676496606, 27.6351791201],
    ];
    for (const [m, nonOverlapping, overlapping] of table) {
      expectRelative(Math.sqrt(nonOverlappingAllanVariance(NBS, m)), nonOverlapping, 1e-10);
      expectRelative(Math.sqrt(overlappingAllanVariance(NBS, m)), overlapping, 1e-10);
    }
  });

  it('give 1.9 at m = 1 and 17/12 or 1.125 at m = 2 on the toy set', () => {
    // docs/checks.md §1.2, computed with numpy; 19/10 and 17/12 are exact fractions (squared differences 4, 1, 9, 1, 4).
    expectRelative(overlappingAllanVariance(TOY, 1), 1.9, 1e-14);
    expectRelative(nonOverlappingAllanVariance(TOY, 1), 1.9, 1e-14);
    expectRelative(overlappingAllanVariance(TOY, 2), 17 / 12, 1e-14);
    expectRelative(nonOverlappingAllanVariance(TOY, 2), 1.125, 1e-14);
  });

  it('match the rate form in the angle form only when θ₀ = 0 is included', () => {
    // docs/checks.md §1.2: with L = N + 1 the θ form gives 1.9; the bare cumulative sum (L = N) gives the pitfall value 1.875.
    const withTheta0 = anglesFromIncrements(TOY);
    expect(withTheta0.length).toBe(TOY.length + 1);
    expect(withTheta0[0]).toBe(0);
    expectRelative(angleAllanVariance(withTheta0, 1, 1), 1.9, 1e-14);
    expectRelative(angleAllanVariance(withTheta0, 1, 2), 17 / 12, 1e-14);
    const bareCumulativeSum = withTheta0.subarray(1);
    expectRelative(angleAllanVariance(bareCumulativeSum, 1, 1), 1.875, 1e-14);
  });

  it('divide the angle form by τ², so increments at τ₀ = 0.5 s give four times the variance of their rates', () => {
    // The angle form's 1/(2τ²) factor (docs/checks.md §1.2): θ in the same units with τ₀ halved doubles each rate.
    expectRelative(angleAllanVariance(anglesFromIncrements(TOY), 0.5, 1), 4 * 1.9, 1e-14);
  });

  it('give Rτ/√2 for a deterministic ramp, whatever the estimator', () => {
    // docs/checks.md §1.1: y = R·t gives σ(τ) = Rτ/√2 exactly; R = 0.3, τ₀ = 0.1 s, m = 1 -> 0.021213203436.
    const ramp = Float64Array.from({ length: 50 }, (_, k) => 0.3 * 0.1 * k);
    const tau0 = 0.1;
    for (const m of [1, 3, 7]) {
      const expected = (0.3 * m * tau0) / Math.SQRT2;
      expectRelative(Math.sqrt(overlappingAllanVariance(ramp, m)), expected, 1e-9);
      expectRelative(Math.sqrt(nonOverlappingAllanVariance(ramp, m)), expected, 1e-9);
    }
    expectRelative(Math.sqrt(overlappingAllanVariance(ramp, 1)), 0.021213203436, 1e-10);
  });

  it('ignore a constant offset, even a large one', () => {
    // The Allan variance differences cluster means, so an offset cancels (definition, docs/checks.md §1.2).
    const shifted = NBS.map((y) => y + 1e9);
    for (const m of [1, 2, 3, 4]) expectRelative(overlappingAllanVariance(shifted, m), overlappingAllanVariance(NBS, m), 1e-9);
  });

  it('refuse a cluster size above half the sample count, with the range in the message', () => {
    expect(() => overlappingAllanVariance(NBS, 5)).toThrow(InputError);
    expect(() => overlappingAllanVariance(NBS, 5)).toThrow(/from 1 to 4/);
    expect(() => nonOverlappingAllanVariance(NBS, 0)).toThrow(InputError);
    expect(() => angleAllanVariance(TOY, 0, 1)).toThrow(/tau0S/);
  });
});
