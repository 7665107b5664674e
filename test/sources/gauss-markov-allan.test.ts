import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  FLICKER_FLOOR_FACTOR,
  GM_ALLAN_PEAK_RATIO,
  GM_ALLAN_PEAK_U,
  flickerCoefficientToFloor,
  gaussMarkovAllanVariance,
  gaussMarkovCorrelationTimeFromFloorTau,
  gaussMarkovSigmaFromAllanFloor,
} from '../../src/sources/gauss-markov-allan';
import { InputError } from '../../src/errors';

function relativeError(actual: number, expected: number): number {
  return Math.abs(actual / expected - 1);
}

/**
 * Allan variance straight from an autocorrelation R(t): half the mean square
 * difference of adjacent τ-averages (IEEE Std 952-1997, Annex C definition).
 * Var(mean) − Cov(adjacent means) reduces to
 *   σ_A² = (1/τ²)[∫₀^τ (2τ − 3t) R(t) dt + ∫_τ^{2τ} (t − 2τ) R(t) dt]
 * (derived here), integrated with composite Simpson on each piece.
 */
function allanVarianceByQuadrature(autocorrelation: (lagS: number) => number, tauS: number): number {
  const intervals = 4000;
  const simpson = (f: (t: number) => number, a: number, b: number): number => {
    const h = (b - a) / intervals;
    let sum = f(a) + f(b);
    for (let k = 1; k < intervals; k++) sum += (k % 2 === 1 ? 4 : 2) * f(a + k * h);
    return (sum * h) / 3;
  };
  const first = simpson((t) => (2 * tauS - 3 * t) * autocorrelation(t), 0, tauS);
  const second = simpson((t) => (t - 2 * tauS) * autocorrelation(t), tauS, 2 * tauS);
  return (first + second) / (tauS * tauS);
}

describe('Gauss-Markov Allan variance', () => {
  it('peaks at u = 1.8926178329 with deviation 0.6173642831 σ', () => {
    // docs/checks.md §1.4 (computed with sympy); rel 1e-9.
    expect(relativeError(GM_ALLAN_PEAK_U, 1.8926178329)).toBeLessThan(1e-9);
    expect(relativeError(GM_ALLAN_PEAK_RATIO, 0.6173642831)).toBeLessThan(1e-9);
    // Full-precision values recorded in docs/checks.md §1.4.
    expect(relativeError(GM_ALLAN_PEAK_U, 1.892617832925019)).toBeLessThan(1e-14);
    expect(relativeError(GM_ALLAN_PEAK_RATIO, 0.6173642831444414)).toBeLessThan(1e-15);
  });

  it('is lower on both sides of the computed peak', () => {
    // The constant is the maximiser of the closed form (docs/checks.md §1.4).
    const peak = gaussMarkovAllanVariance(1, 1, GM_ALLAN_PEAK_U);
    expect(relativeError(peak, GM_ALLAN_PEAK_RATIO ** 2)).toBeLessThan(1e-15);
    for (const du of [1e-3, 1e-2, 0.1]) {
      expect(gaussMarkovAllanVariance(1, 1, GM_ALLAN_PEAK_U - du)).toBeLessThan(peak);
      expect(gaussMarkovAllanVariance(1, 1, GM_ALLAN_PEAK_U + du)).toBeLessThan(peak);
    }
  });

  it('reproduces the tabulated σ_A/σ at u = 0.1, 1, 10 and 100', () => {
    // docs/checks.md §1.4 table (computed with sympy), 10 significant digits.
    const table: Array<[number, number]> = [
      [0.1, 0.2487808405],
      [1, 0.5798124537],
      [10, 0.4123127648],
      [100, 0.1403566885],
    ];
    for (const [u, ratio] of table) {
      expect(relativeError(Math.sqrt(gaussMarkovAllanVariance(1, 1, u)), ratio)).toBeLessThan(1e-9);
    }
  });

  it('scales with σ² and depends on τ only through τ/T', () => {
    // Closed form of docs/checks.md §1.4.
    const base = gaussMarkovAllanVariance(1, 1, 2.5);
    expect(relativeError(gaussMarkovAllanVariance(3e-5, 400, 1000), 9e-10 * base)).toBeLessThan(1e-14);
  });

  it('does not cancel catastrophically at small cluster times', () => {
    // Exact values from 40-digit mpmath, docs/checks.md §1.4 "numerical pitfall"; rel 1e-9.
    expect(relativeError(gaussMarkovAllanVariance(1, 1, 1e-6), 6.666661666669e-7)).toBeLessThan(1e-9);
    expect(relativeError(gaussMarkovAllanVariance(1, 1, 1e-3), 6.661668999166913e-4)).toBeLessThan(1e-13);
    expect(relativeError(gaussMarkovAllanVariance(1, 1, 1e-2), 6.616899169120748e-3)).toBeLessThan(1e-13);
  });

  it('is continuous where the series hands over to the closed form', () => {
    // Both branches evaluate the same function (docs/checks.md §1.4); the switch is at u = 1.
    // 1 − ε/2 is the largest double below 1, so the function itself barely moves.
    const below = gaussMarkovAllanVariance(1, 1, 1 - Number.EPSILON / 2);
    const above = gaussMarkovAllanVariance(1, 1, 1);
    expect(relativeError(below, above)).toBeLessThan(1e-14);
  });

  it('approaches rate random walk at small u and white rate noise at large u', () => {
    // Asymptotes (2/3)σ²u and 2σ²/u, docs/checks.md §1.4; within rel 2e-4 at u = 1e-4 and 1e4.
    const sigma = 2;
    expect(relativeError(gaussMarkovAllanVariance(sigma, 10, 1e-3), ((2 / 3) * sigma ** 2 * 1e-3) / 10)).toBeLessThan(2e-4);
    expect(relativeError(gaussMarkovAllanVariance(sigma, 10, 1e5), (2 * sigma ** 2 * 10) / 1e5)).toBeLessThan(2e-4);
  });

  it('agrees with the Allan variance integrated from the autocorrelation σ² e^{−|t|/T}', () => {
    // Independent route: the definition via the autocorrelation (IEEE Std 952-1997 Annex C), kernel derived above.
    const sigma = 0.3;
    const correlationTimeS = 50;
    const autocorrelation = (lagS: number) => sigma * sigma * Math.exp(-lagS / correlationTimeS);
    for (const u of [0.1, 0.5, 1, GM_ALLAN_PEAK_U, 3, 10]) {
      const tauS = u * correlationTimeS;
      const numeric = allanVarianceByQuadrature(autocorrelation, tauS);
      expect(relativeError(gaussMarkovAllanVariance(sigma, correlationTimeS, tauS), numeric)).toBeLessThan(1e-10);
    }
  });

  it('never exceeds the peak and stays positive for any cluster time', () => {
    // Property of the closed form (docs/checks.md §1.4): a single interior maximum.
    const peak = GM_ALLAN_PEAK_RATIO ** 2;
    fc.assert(
      fc.property(fc.double({ min: -8, max: 8, noNaN: true }), (log10U) => {
        const value = gaussMarkovAllanVariance(1, 1, 10 ** log10U);
        return value > 0 && value <= peak * (1 + 1e-15);
      }),
    );
  });
});

describe('bias-instability conversions', () => {
  it('uses √(2 ln 2 / π) = 0.6642824702679601 for flicker noise', () => {
    // IEEE Std 952-1997 Annex C (from memory); value computed with numpy, docs/checks.md §1.1 / docs/planar-model.md §3.
    expect(FLICKER_FLOOR_FACTOR).toBeCloseTo(0.6642824702679601, 15);
    expect(flickerCoefficientToFloor(2e-5)).toBeCloseTo(2e-5 * 0.6642824702679601, 18);
  });

  it('chooses the Gauss-Markov sigma whose Allan deviation peak equals the floor', () => {
    // docs/planar-model.md §3 convention: σ_A,max = 0.6173643 s_bi at τ = 1.8926 T_bi.
    const floorSI = 4.8e-6;
    const sigma = gaussMarkovSigmaFromAllanFloor(floorSI);
    const correlationTimeS = gaussMarkovCorrelationTimeFromFloorTau(300);
    expect(relativeError(correlationTimeS, 300 / 1.892617832925019)).toBeLessThan(1e-14);
    const peakDeviation = Math.sqrt(gaussMarkovAllanVariance(sigma, correlationTimeS, 300));
    expect(relativeError(peakDeviation, floorSI)).toBeLessThan(1e-14);
  });

  it('rejects negative, zero or non-finite inputs with InputError', () => {
    expect(() => gaussMarkovAllanVariance(-1, 1, 1)).toThrow(InputError);
    expect(() => gaussMarkovAllanVariance(1, 0, 1)).toThrow(InputError);
    expect(() => gaussMarkovAllanVariance(1, 1, -1)).toThrow(InputError);
    expect(() => gaussMarkovAllanVariance(Number.NaN, 1, 1)).toThrow(InputError);
    expect(() => gaussMarkovSigmaFromAllanFloor(-1e-6)).toThrow(InputError);
    expect(() => gaussMarkovCorrelationTimeFromFloorTau(0)).toThrow(InputError);
    expect(() => flickerCoefficientToFloor(Infinity)).toThrow(InputError);
  });
});
