/**
 * The Chebyshev interpolant of the horizontal radius (src/budget/horizontal-radius-table.ts)
 * against the exact radius, and its precomputed tables against a fresh computation.
 */
import { describe, expect, it } from 'vitest';
import { radiusForProbability } from '../../src/budget/horizontal-accuracy';
import { chebyshevCoefficients, fastRadiusForProbability, normalisedRadiusGlobal, NODES } from '../../src/budget/horizontal-radius-table';
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

describe('the fast CEP / R95 table', () => {
  // Closed forms: a circular normal of variance σ² per axis has P(R ≤ r) = 1 − exp(−r²/2σ²), so
  // CEP = σ√(2 ln 2) and R95 = σ√(2 ln 20) (Rayleigh distribution; any probability text, from memory).
  it('gives the Rayleigh radii of a circular error', () => {
    expect(Math.abs(fastRadiusForProbability(4, 4, 0, 0.5) / (2 * Math.sqrt(2 * Math.LN2)) - 1)).toBeLessThan(1e-12);
    expect(Math.abs(fastRadiusForProbability(4, 4, 0, 0.95) / (2 * Math.sqrt(2 * Math.log(20))) - 1)).toBeLessThan(1e-12);
  });

  // A one-dimensional error (minor axis 0): the radius is the two-sided normal quantile, 0.6745σ for
  // 50 % and 1.9600σ for 95 % (standard normal table, e.g. Abramowitz & Stegun 1964, table 26.1).
  it('gives the normal quantiles of a degenerate ellipse', () => {
    expect(fastRadiusForProbability(1, 0, 0, 0.5)).toBeCloseTo(0.6744897502, 9);
    expect(fastRadiusForProbability(1, 0, 0, 0.95)).toBeCloseTo(1.9599639845, 9);
  });

  // Common practice, no source: the piecewise re-expansion must not move the answer beyond round-off.
  it.each([0.5, 0.95])('matches the 128-node interpolant to 1e-13 and the exact radius to 1e-11 (p = %s)', (p) => {
    let worst = 0;
    for (let t = 0; t <= 20000; t++) {
      const s = t < 10000 ? (t / 10000) ** 6 : (t - 10000) / 10000;
      const fast = fastRadiusForProbability(1, s, 0, p);
      worst = Math.max(worst, Math.abs(fast - normalisedRadiusGlobal(s, p)) / normalisedRadiusGlobal(s, p));
    }
    expect(worst).toBeLessThan(1e-13);
    for (const [nn, ee, ne] of [[9, 1, 0], [2, 3, 1.5], [1, 1e-7, 0], [5e-3, 2e-3, -1e-3]]) {
      expect(Math.abs(fastRadiusForProbability(nn, ee, ne, p) / radiusForProbability(nn, ee, ne, p) - 1)).toBeLessThan(1e-11);
    }
  });
});
