import { createRequire } from 'node:module';
import { describe, expect, it } from 'vitest';
import { chiSquareQuantile } from '../../src/simulation/chi-square';

// Second reference library: @stdlib/stats-base-dists-chisquare-cdf 0.3.1 (accurate to ~1e-12 up to a few
// hundred degrees of freedom; at 5,000 and more its upper tail is off by 2e-4, so it is not used there).
const require = createRequire(import.meta.url);
const stdlibCdf = require('@stdlib/stats-base-dists-chisquare-cdf') as (x: number, k: number) => number;

describe('chi-square quantiles', () => {
  it('match the NIST/SEMATECH e-Handbook table of chi-square critical values (§1.3.6.7.4)', () => {
    // Table values to 3 decimals: upper 0.025 and lower 0.025 critical values.
    expect(chiSquareQuantile(0.975, 1)).toBeCloseTo(5.024, 3);
    expect(chiSquareQuantile(0.975, 10)).toBeCloseTo(20.483, 3);
    expect(chiSquareQuantile(0.025, 10)).toBeCloseTo(3.247, 3);
    expect(chiSquareQuantile(0.975, 100)).toBeCloseTo(129.561, 3);
    expect(chiSquareQuantile(0.025, 100)).toBeCloseTo(74.222, 3);
  });

  it('invert the @stdlib chi-square CDF to 1e-9 in probability', () => {
    for (const k of [1, 2, 3, 9, 50, 500]) {
      for (const p of [1e-6, 0.025, 0.5, 0.975, 1 - 1e-6]) expect(Math.abs(stdlibCdf(chiSquareQuantile(p, k), k) - p)).toBeLessThan(1e-9);
    }
  });

  it('agree with the Wilson-Hilferty approximation at the many degrees of freedom of NEES sums', () => {
    // Wilson & Hilferty, PNAS 17, 1931: χ²_k(p) ≈ k (1 - 2/(9k) + z_p √(2/(9k)))³, relative error < 1e-5 for k ≥ 5,000 at these p.
    const z975 = 1.959963984540054; // standard normal quantile (Abramowitz & Stegun 26.2.23 table value 1.959964)
    for (const k of [5_000, 45_000, 500_000]) {
      const c = 2 / (9 * k);
      for (const [p, z] of [[0.975, z975], [0.025, -z975]] as const) {
        const wh = k * (1 - c + z * Math.sqrt(c)) ** 3;
        expect(Math.abs(chiSquareQuantile(p, k) / wh - 1)).toBeLessThan(1e-5);
      }
    }
  });
});
