import { createRequire } from 'node:module';
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { erf } from 'mathjs';
import {
  principalVariances,
  probabilityInsideCircle,
  radiusForProbability,
} from '../../src/budget/horizontal-accuracy';
import { InputError } from '../../src/errors';

// Reference library jstat (npm `jstat` 1.9.6) ships no types; only chisquare.inv is used.
const require = createRequire(import.meta.url);
const { jStat } = require('jstat') as { jStat: { chisquare: { inv(p: number, dof: number): number } } };

const cep = (pNN: number, pEE: number, pNE = 0) => radiusForProbability(pNN, pEE, pNE, 0.5);
const r95 = (pNN: number, pEE: number, pNE = 0) => radiusForProbability(pNN, pEE, pNE, 0.95);

/**
 * P(inside r) by conditioning on the major-axis coordinate x = r sin t:
 * P = ∫_{−π/2}^{π/2} (r cos t / √(2π a)) e^{−r² sin²t / 2a} erf(r cos t / √(2b)) dt,
 * composite Simpson; erf from the reference library mathjs (`erf`). Derived here.
 */
function probabilityByConditioning(a: number, b: number, r: number): number {
  const intervals = 2000;
  const h = Math.PI / intervals;
  const f = (t: number) =>
    ((r * Math.cos(t)) / Math.sqrt(2 * Math.PI * a)) *
    Math.exp(-((r * Math.sin(t)) ** 2) / (2 * a)) *
    (erf((r * Math.cos(t)) / Math.sqrt(2 * b)) as number);
  let sum = f(-Math.PI / 2) + f(Math.PI / 2);
  for (let k = 1; k < intervals; k++) sum += (k % 2 === 1 ? 4 : 2) * f(-Math.PI / 2 + k * h);
  return (sum * h) / 3;
}

describe('radiusForProbability', () => {
  it('gives the Rayleigh factors CEP 1.1774100225, R95 2.4477468307 and R99 3.0348542588 for a circular error', () => {
    // docs/checks.md §6, circular case r_p = σ√(−2 ln(1 − p)) (computed with scipy); tolerance 1e-10.
    expect(Math.abs(cep(1, 1) - Math.sqrt(2 * Math.LN2))).toBeLessThan(1e-10);
    expect(Math.abs(cep(1, 1) - 1.1774100225)).toBeLessThan(1e-10);
    expect(Math.abs(r95(1, 1) - 2.4477468307)).toBeLessThan(1e-10);
    expect(Math.abs(radiusForProbability(1, 1, 0, 0.99) - 3.0348542588)).toBeLessThan(1e-10);
    // Scales with σ.
    expect(Math.abs(cep(25, 25) / 5 - 1.1774100225)).toBeLessThan(1e-10);
  });

  it('reproduces the exact elliptical CEP and R95 table for axis ratios 1 to 0', () => {
    // docs/checks.md §6 elliptical table, σ_x = 1 (computed with scipy quadrature + brentq); tolerance 1e-8.
    const table: Array<[ratio: number, cep: number, r95: number]> = [
      [1, 1.17741002, 2.44774683],
      [0.5, 0.87041743, 2.03585872],
      [0.3, 0.74993512, 1.98419623],
      [0.2, 0.70585387, 1.9704075],
      [0.1, 0.68198509, 1.9625296],
      [0, 0.67448975, 1.95996398],
    ];
    for (const [ratio, cepM, r95M] of table) {
      expect(Math.abs(cep(1, ratio * ratio) - cepM)).toBeLessThan(1e-8);
      expect(Math.abs(r95(1, ratio * ratio) - r95M)).toBeLessThan(1e-8);
      // Either axis may be the major one.
      expect(Math.abs(cep(ratio * ratio, 1) - cepM)).toBeLessThan(1e-8);
    }
  });

  it('gives CEP 2.9263950342 and R95 6.3665197992 for σx = 3 m, σy = 2 m', () => {
    // docs/checks.md §6 worked example (computed with scipy); tolerance 1e-9 m.
    expect(Math.abs(cep(9, 4) - 2.9263950342)).toBeLessThan(1e-9);
    expect(Math.abs(r95(9, 4) - 6.3665197992)).toBeLessThan(1e-9);
  });

  it('uses the eigenvalues of a correlated covariance', () => {
    // docs/checks.md §6: P = [[4, 1.5],[1.5, 2]] → λ = 4.80277564, 1.19722436, CEP 1.9065381253 (computed with scipy).
    const { major, minor } = principalVariances(4, 2, 1.5);
    expect(Math.abs(major - 4.80277564)).toBeLessThan(1e-8);
    expect(Math.abs(minor - 1.19722436)).toBeLessThan(1e-8);
    expect(Math.abs(cep(4, 2, 1.5) - 1.9065381253)).toBeLessThan(1e-9);
    expect(Math.abs(cep(2, 4, -1.5) - 1.9065381253)).toBeLessThan(1e-9);
  });

  it('matches the circular radius from the jstat chi-square quantile', () => {
    // Reference library jstat (npm `jstat`), jStat.chisquare.inv(p, 2): R_p = σ√χ²₂(p). jstat's inverse is good to ~1e-11.
    for (const p of [0.1, 0.5, 0.9, 0.95, 0.99]) {
      const sigmaM = 3;
      expect(Math.abs(radiusForProbability(9, 9, 0, p) - sigmaM * Math.sqrt(jStat.chisquare.inv(p, 2)))).toBeLessThan(1e-9);
    }
  });

  it('returns the 1-D two-sided quantile for a rank-one covariance', () => {
    // docs/checks.md §6 (→0 row) and the jstat reference: √(jStat.chisquare.inv(0.95, 1)) = 1.959964.
    expect(Math.abs(r95(4, 0) / 2 - Math.sqrt(jStat.chisquare.inv(0.95, 1)))).toBeLessThan(1e-10);
    // z(0.975) = 1.959963984540054 computed with scipy 1.17, scipy.stats.norm.ppf(0.975).
    expect(Math.abs(r95(4, 0) / 2 - 1.959963984540054)).toBeLessThan(1e-15);
    // Rank one along a diagonal direction: [[1, 1],[1, 1]] has major variance 2; z(0.75) = 0.6744897502 (docs/checks.md §6 χ² table).
    expect(Math.abs(cep(1, 1, 1) - cep(2, 0))).toBeLessThan(1e-14);
    expect(Math.abs(cep(1, 1, 1) - Math.SQRT2 * 0.6744897502)).toBeLessThan(1e-10);
  });

  it('tends continuously to the rank-one radius as the minor axis shrinks', () => {
    // Limit of the bivariate probability (common practice, no source).
    const line = r95(1, 0);
    expect(Math.abs(r95(1, 1e-30) - line)).toBeLessThan(1e-14);
    expect(Math.abs(r95(1, 1e-12) - line)).toBeLessThan(1e-10);
    expect(r95(1, 1e-6)).toBeGreaterThan(line);
  });

  it('still returns a radius for probabilities within one unit in the last place of 1', () => {
    // Near p = 1 the radius is limited by the 1e-15 absolute accuracy of the probability; it must not throw.
    const p = 1 - 2 ** -53;
    expect(radiusForProbability(1, 0, 0, p)).toBeGreaterThan(8);
    expect(Number.isFinite(radiusForProbability(1, 0.5, 0, p))).toBe(true);
  });

  it('returns √(2 p √(ab)) for a tiny probability', () => {
    // Small-circle limit P ≈ r²/(2√(ab)) (density at the centre times the area; common practice, no source).
    expect(Math.abs(radiusForProbability(1, 0.25, 0, 1e-10) / Math.sqrt(2 * 1e-10 * 0.5) - 1)).toBeLessThan(1e-9);
  });

  it('returns 0 for a zero covariance', () => {
    expect(cep(0, 0)).toBe(0);
    expect(r95(0, 0)).toBe(0);
  });

  it('is invariant under rotation of the covariance and lies between the line and circle limits', () => {
    // Rotation invariance of the disc and the ordering of the limits (common practice, no source).
    fc.assert(
      fc.property(
        fc.double({ min: 0.01, max: 100, noNaN: true }),
        fc.double({ min: 0, max: 1, noNaN: true }),
        // Angles below 1e-100 read as 0: at 4e-161 rad a rank-one covariance has a sub-normal east variance, and its
        // determinant rounds below zero (refused as not PSD), a property of doubles rather than of the radius.
        fc.double({ min: 0, max: Math.PI, noNaN: true }).map((a) => (a < 1e-100 ? 0 : a)),
        fc.double({ min: 0.01, max: 0.999, noNaN: true }),
        (major, ratio, angle, p) => {
          const minor = major * ratio;
          const c = Math.cos(angle);
          const s = Math.sin(angle);
          const pNN = major * c * c + minor * s * s;
          const pEE = major * s * s + minor * c * c;
          const pNE = (major - minor) * c * s;
          const rotated = radiusForProbability(pNN, pEE, pNE, p);
          const aligned = radiusForProbability(major, minor, 0, p);
          const line = radiusForProbability(major, 0, 0, p);
          const circle = Math.sqrt(major) * Math.sqrt(-2 * Math.log1p(-p));
          expect(Math.abs(rotated - aligned)).toBeLessThan(1e-9 * Math.sqrt(major));
          expect(aligned).toBeGreaterThanOrEqual(line * (1 - 1e-14));
          expect(aligned).toBeLessThanOrEqual(circle * (1 + 1e-14));
          expect(Math.abs(probabilityInsideCircle(major, minor, aligned) - p)).toBeLessThan(1e-13);
        },
      ),
      { numRuns: 200, seed: 20261202 },
    );
  });

  it('rejects a probability outside (0, 1) and an indefinite covariance with InputError', () => {
    expect(() => radiusForProbability(1, 1, 0, 0)).toThrow(InputError);
    expect(() => radiusForProbability(1, 1, 0, 1)).toThrow(InputError);
    expect(() => radiusForProbability(1, 1, 0, Number.NaN)).toThrow(InputError);
    expect(() => radiusForProbability(1, 1, 2, 0.5)).toThrow(InputError);
    expect(() => radiusForProbability(-1, 1, 0, 0.5)).toThrow(InputError);
    expect(() => radiusForProbability(0, 1, 0.1, 0.5)).toThrow(InputError);
    expect(() => radiusForProbability(1, Infinity, 0, 0.5)).toThrow(InputError);
  });
});

describe('probabilityInsideCircle', () => {
  it('gives P(inside DRMS) and P(inside 2DRMS) as tabulated for axis ratios 1 to 0', () => {
    // docs/checks.md §6 elliptical table, P(<DRMS) and P(<2DRMS) columns (computed with scipy), 6 decimals.
    const table: Array<[ratio: number, drms: number, twoDrms: number]> = [
      [1, 0.632121, 0.981684],
      [0.5, 0.662975, 0.969843],
      [0.3, 0.680099, 0.961085],
      [0.2, 0.682264, 0.957595],
      [0.1, 0.682665, 0.9553],
      [0, 0.682689, 0.9545],
    ];
    for (const [ratio, pDrms, pTwoDrms] of table) {
      const drmsM = Math.sqrt(1 + ratio * ratio);
      expect(Math.abs(probabilityInsideCircle(1, ratio * ratio, drmsM) - pDrms)).toBeLessThan(5e-7);
      expect(Math.abs(probabilityInsideCircle(1, ratio * ratio, 2 * drmsM) - pTwoDrms)).toBeLessThan(5e-7);
    }
  });

  it('is 1 − e⁻¹ inside DRMS and 1 − e⁻⁴ inside 2DRMS for a circular error', () => {
    // docs/checks.md §6 circular table (Rayleigh distribution); to 1e-14.
    expect(Math.abs(probabilityInsideCircle(2, 2, 2) - (1 - Math.exp(-1)))).toBeLessThan(1e-14);
    expect(Math.abs(probabilityInsideCircle(2, 2, 4) - (1 - Math.exp(-4)))).toBeLessThan(1e-14);
  });

  it('is erf(r/√(2a)) when the minor variance is zero', () => {
    // 1-D limit; erf from the reference library mathjs (`erf`).
    for (const r of [0.1, 0.6744897501960817, 1, 2.5, 6]) {
      const expected = erf(r / Math.sqrt(2 * 4)) as number;
      expect(Math.abs(probabilityInsideCircle(4, 0, r) - expected)).toBeLessThan(1e-14);
      expect(Math.abs(probabilityInsideCircle(0, 4, r) - expected)).toBeLessThan(1e-14);
    }
  });

  it('agrees with integration over the major-axis coordinate', () => {
    // Independent quadrature written in this test with mathjs `erf`; tolerance 1e-12.
    for (const [a, b, r] of [
      [1, 0.25, 0.8],
      [9, 4, 2.9],
      [1, 0.01, 1.5],
      [5, 4.9, 7],
      [2, 0.5, 0.05],
    ]) {
      expect(Math.abs(probabilityInsideCircle(a, b, r) - probabilityByConditioning(a, b, r))).toBeLessThan(1e-12);
    }
  });

  it('behaves like r²/(2√(ab)) for a small circle', () => {
    // Density at the centre times the disc area, 1/(2π√(ab)) · πr² (common practice, no source).
    const a = 4;
    const b = 1;
    const r = 1e-4;
    expect(Math.abs(probabilityInsideCircle(a, b, r) / ((r * r) / (2 * Math.sqrt(a * b))) - 1)).toBeLessThan(1e-8);
    expect(probabilityInsideCircle(a, b, 0)).toBe(0);
  });

  it('puts all the mass inside any circle when both variances are zero', () => {
    expect(probabilityInsideCircle(0, 0, 0)).toBe(1);
    expect(probabilityInsideCircle(0, 0, 3)).toBe(1);
  });

  it('rejects negative or non-finite arguments with InputError', () => {
    expect(() => probabilityInsideCircle(-1, 1, 1)).toThrow(InputError);
    expect(() => probabilityInsideCircle(1, -1e-9, 1)).toThrow(InputError);
    expect(() => probabilityInsideCircle(1, 1, -1)).toThrow(InputError);
    expect(() => probabilityInsideCircle(1, 1, Number.NaN)).toThrow(InputError);
  });
});
