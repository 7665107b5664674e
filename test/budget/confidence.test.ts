import { createRequire } from 'node:module';
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { erf } from 'mathjs';
import { confidenceFactor1D, normalQuantile } from '../../src/budget/confidence';
import type { ConfidenceLevel } from '../../src/inputs/budget-input';
import { InputError } from '../../src/errors';

// Reference library jstat (npm `jstat` 1.9.6) ships no types; only the functions used are declared.
const require = createRequire(import.meta.url);
const { jStat } = require('jstat') as {
  jStat: { chisquare: { inv(p: number, dof: number): number }; normal: { inv(p: number, mean: number, sd: number): number } };
};

describe('confidenceFactor1D', () => {
  it('gives 1, 2 and 1.959963984540054 for 1 sigma, 2 sigma and 95 %', () => {
    // docs/planar-model.md §8 levels; z(0.975) = 1.959963984540054 computed with scipy.stats.norm.ppf (docs/checks.md §6 χ² table, √3.8414588207).
    expect(confidenceFactor1D('1sigma')).toBe(1);
    expect(confidenceFactor1D('2sigma')).toBe(2);
    expect(Math.abs(confidenceFactor1D('95%') - 1.959963984540054)).toBeLessThan(1e-15);
    // Reference library jstat: √(jStat.chisquare.inv(0.95, 1)) = 1.959964 (its inverse is good to ~1e-11).
    expect(Math.abs(confidenceFactor1D('95%') - Math.sqrt(jStat.chisquare.inv(0.95, 1)))).toBeLessThan(1e-10);
  });

  it('rejects an unknown level with InputError', () => {
    expect(() => confidenceFactor1D('3sigma' as ConfidenceLevel)).toThrow(InputError);
  });
});

describe('normalQuantile', () => {
  it('reproduces the tabulated normal quantiles', () => {
    // docs/checks.md §6 χ² table, df = 1 square roots (computed with scipy.stats.chi2.ppf); 10 decimals.
    expect(Math.abs(normalQuantile(0.75) - 0.6744897502)).toBeLessThan(1e-10);
    expect(Math.abs(normalQuantile(0.975) - 1.9599639845)).toBeLessThan(1e-10);
    expect(Math.abs(normalQuantile(0.995) - 2.5758293035)).toBeLessThan(1e-10);
    expect(normalQuantile(0.5)).toBe(0);
  });

  it('agrees with the jstat normal inverse away from the far tails', () => {
    // Reference library jstat, jStat.normal.inv(p, 0, 1); it drifts beyond about 1e-6 (1e-6 off at p = 1e-12), so it is not used there.
    for (const p of [1e-4, 0.001, 0.02, 0.0243, 0.1, 0.3, 0.5, 0.7, 0.9, 0.975, 0.999]) {
      const expected = jStat.normal.inv(p, 0, 1);
      expect(Math.abs(normalQuantile(p) - expected)).toBeLessThan(1e-13);
    }
  });

  it('stays accurate in the far lower tail', () => {
    // Computed with mpmath 1.3.0 at 40 digits (root of ln Φ(z) = ln p) while writing this test; rel 1e-15.
    const tail: Array<[number, number]> = [
      [1e-12, -7.0344838253011319298],
      [1e-20, -9.2623400897984075737],
      [1e-300, -37.047096299361199237],
    ];
    for (const [p, z] of tail) expect(Math.abs(normalQuantile(p) / z - 1)).toBeLessThan(1e-15);
    // Where Φ underflows it falls back to the unrefined approximation (mpmath 1.3.0: z(1e-310) = −37.66306033194952).
    expect(Math.abs(normalQuantile(1e-310) / -37.66306033194952 - 1)).toBeLessThan(1.2e-9);
    expect(Number.isFinite(normalQuantile(Number.MIN_VALUE))).toBe(true);
  });

  it('inverts the normal distribution function to round-off', () => {
    // Φ(z) = (1 + erf(z/√2))/2 with erf from the reference library mathjs (`erf`).
    fc.assert(
      fc.property(fc.double({ min: 1e-6, max: 1 - 1e-6, noNaN: true }), (p) => {
        const z = normalQuantile(p);
        const back = 0.5 * (1 + (erf(z / Math.SQRT2) as number));
        return Math.abs(back - p) < 5e-16;
      }),
    );
  });

  it('rejects probabilities outside (0, 1) with InputError', () => {
    for (const p of [0, 1, -0.1, 1.5, Number.NaN]) expect(() => normalQuantile(p)).toThrow(InputError);
  });
});
