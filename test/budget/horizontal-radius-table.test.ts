import { describe, expect, it } from 'vitest';
import { radiusForProbability } from '../../src/budget/horizontal-accuracy';
import { fastRadiusForProbability, normalisedRadiusGlobal } from '../../src/budget/horizontal-radius-table';

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
