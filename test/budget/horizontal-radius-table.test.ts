/**
 * The Chebyshev interpolant of the horizontal radius (src/budget/horizontal-radius-table.ts)
 * against the exact radius, and its precomputed tables against a fresh computation.
 */
import { describe, expect, it } from 'vitest';
import { radiusForProbability } from '../../src/budget/horizontal-accuracy';
import { chebyshevCoefficients, fastRadiusForProbability, NODES } from '../../src/budget/horizontal-radius-table';
import { PRECOMPUTED_COEFFICIENTS } from '../../src/budget/horizontal-radius-coefficients';

describe('the precomputed radius tables', () => {
  for (const p of [0.5, 0.95]) {
    it(`for p = ${p} are what chebyshevCoefficients computes now (else run test/tools/write-radius-coefficients.ts)`, () => {
      const fresh = chebyshevCoefficients(p);
      const stored = PRECOMPUTED_COEFFICIENTS[String(p)];
      expect(stored).toHaveLength(NODES);
      // The coefficients are O(1); they are printed as the shortest text that reads back as the same double.
      stored.forEach((c, k) => expect(Math.abs(c - fresh[k]), `c[${k}]`).toBeLessThanOrEqual(4e-16));
    });
  }
});

describe('fastRadiusForProbability', () => {
  it('gives the closed forms at the ends: a circle (Rayleigh) and a line (the normal quantile)', () => {
    // Circular: P(r < R) = 1 − exp(−R²/2σ²), so R = σ √(−2 ln(1 − p)) (Rayleigh distribution, textbook closed form).
    expect(fastRadiusForProbability(4, 4, 0, 0.5)).toBeCloseTo(2 * Math.sqrt(2 * Math.LN2), 11);
    expect(fastRadiusForProbability(4, 4, 0, 0.95)).toBeCloseTo(2 * Math.sqrt(-2 * Math.log(0.05)), 11);
    // Rank one: the two-sided normal quantile, 0.6744897501960817 and 1.959963984540054 (standard normal table).
    expect(fastRadiusForProbability(9, 0, 0, 0.5)).toBeCloseTo(3 * 0.6744897501960817, 11);
    expect(fastRadiusForProbability(9, 0, 0, 0.95)).toBeCloseTo(3 * 1.959963984540054, 11);
  });

  it('agrees with the exact radius to 1e-12 relative across axis ratios and orientations', () => {
    for (const p of [0.5, 0.95]) {
      for (let i = 0; i <= 200; i++) {
        const ratio = (i / 200) ** 2;
        const angle = i * 0.37;
        const c = Math.cos(angle), s = Math.sin(angle);
        // Covariance with variances 2.5 and 2.5·ratio along axes rotated by `angle`.
        const major = 2.5, minor = 2.5 * ratio;
        const pNN = major * c * c + minor * s * s, pEE = major * s * s + minor * c * c, pNE = (major - minor) * c * s;
        const exact = radiusForProbability(pNN, pEE, pNE, p);
        expect(Math.abs(fastRadiusForProbability(pNN, pEE, pNE, p) / exact - 1), `p ${p}, ratio ${ratio}`).toBeLessThan(1e-12);
      }
    }
  });

  it('builds a table on first use for another probability', () => {
    expect(PRECOMPUTED_COEFFICIENTS['0.9']).toBeUndefined();
    expect(fastRadiusForProbability(1, 0.3, 0.1, 0.9) / radiusForProbability(1, 0.3, 0.1, 0.9)).toBeCloseTo(1, 11);
  });
});
