import { createRequire } from 'node:module';
import { describe, expect, it } from 'vitest';
import { chiSquareUpperTail, logGamma } from '../../src/calibration/chi-square-tail';
import { checkResidualWhiteness, sampleAutocorrelations } from '../../src/calibration/residual-whiteness';
import { InputError } from '../../src/errors';
import { expectRelative } from '../allan/expect-close';
import { SeededRandom } from '../allan/seeded-random';

// Reference library jstat (npm `jstat` 1.9.6, test-only) ships no types; only the function used is declared.
const require = createRequire(import.meta.url);
const { jStat } = require('jstat') as { jStat: { chisquare: { cdf(x: number, dof: number): number } } };

describe('the χ² upper tail', () => {
  it('puts 50 %, 5 % and 1 % above the quantiles recorded in docs/checks.md §6', () => {
    // docs/checks.md §6, scipy.stats.chi2.ppf (computed): df 1, 2, 3 at 50 %, 95 %, 99 %.
    const quantiles: [number, number, number, number][] = [
      [1, 0.4549364231, 3.8414588207, 6.634896601],
      [2, 1.3862943611, 5.9914645471, 9.210340372],
      [3, 2.3659738844, 7.8147279033, 11.3448667301],
    ];
    for (const [k, q50, q95, q99] of quantiles) {
      expectRelative(chiSquareUpperTail(q50, k), 0.5, 1e-8);
      expectRelative(chiSquareUpperTail(q95, k), 0.05, 1e-8);
      expectRelative(chiSquareUpperTail(q99, k), 0.01, 1e-8);
    }
  });

  it('agrees with jstat on both branches (series and continued fraction)', () => {
    // jstat 1.9.6 jStat.chisquare.cdf (test-only reference library).
    for (const k of [1, 2, 5, 10, 30]) {
      for (const x of [0.01, 0.5, 2, 7.5, 18, 40, 80]) {
        const expected = 1 - jStat.chisquare.cdf(x, k);
        if (expected > 1e-12) expectRelative(chiSquareUpperTail(x, k), expected, 1e-7);
      }
    }
  });

  it('has ln Γ(½) = ln √π and ln Γ(10) = ln 9!', () => {
    // Γ(½) = √π and Γ(n) = (n − 1)! (standard identities).
    expect(Math.abs(logGamma(0.5) - 0.5 * Math.log(Math.PI))).toBeLessThan(2e-10);
    expect(Math.abs(logGamma(10) - Math.log(362880))).toBeLessThan(2e-10);
  });

  it('refuses a negative statistic or non-positive degrees of freedom', () => {
    expect(() => chiSquareUpperTail(-1, 2)).toThrow(InputError);
    expect(() => chiSquareUpperTail(1, 0)).toThrow(InputError);
  });
});

describe('the residual whiteness check', () => {
  it('computes the lag-1 autocorrelation of a short series worked by hand', () => {
    // Worked here: e = 1, −1, 1, −1 has mean 0, Σe² = 4 and Σ e_t e_{t+1} = −3, so r₁ = −0.75 (Box, Jenkins & Reinsel §2.1 estimator).
    expectRelative(sampleAutocorrelations(Float64Array.from([1, -1, 1, -1]), 1)[0], -0.75, 1e-15);
  });

  it('passes white residuals', () => {
    // Seeded normal residuals; at the 5 % level a white series fails by chance 1 time in 20 per test (seed chosen, not tuned).
    const rng = new SeededRandom(5);
    const check = checkResidualWhiteness(Float64Array.from({ length: 2000 }, () => rng.normal()));
    expect(Math.abs(check.lag1Autocorrelation)).toBeLessThanOrEqual(check.lag1Bound95);
    expectRelative(check.lag1Bound95, 1.96 / Math.sqrt(2000), 1e-15);
    expect(check.ljungBoxLags).toBe(10);
    expect(check.white).toBe(true);
  });

  it('flags correlated residuals: an AR(1) series with φ = 0.5 has r₁ near 0.5', () => {
    // AR(1) x_t = φ x_{t−1} + w_t has lag-1 autocorrelation φ (Box, Jenkins & Reinsel §3.2, from memory).
    const rng = new SeededRandom(6);
    const e = new Float64Array(2000);
    for (let t = 1; t < e.length; t++) e[t] = 0.5 * e[t - 1] + rng.normal();
    const check = checkResidualWhiteness(e);
    expect(check.white).toBe(false);
    expect(check.lag1Autocorrelation).toBeGreaterThan(check.lag1Bound95);
    expect(Math.abs(check.lag1Autocorrelation - 0.5)).toBeLessThan(3 / Math.sqrt(2000));
    expect(check.ljungBoxPValue).toBeLessThan(1e-6);
  });

  it('refuses fewer than 10 residuals', () => {
    expect(() => checkResidualWhiteness(new Float64Array(9))).toThrow(/at least 10 residuals/);
  });
});
