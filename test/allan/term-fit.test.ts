import { describe, expect, it } from 'vitest';
import { nonNegativeLeastSquares } from '../../src/allan/nnls-subsets';
import { fitNoiseTerms } from '../../src/allan/term-fit';
import { InputError } from '../../src/errors';
import { curveFromVariance, logTaus, termsVariance } from './closed-form-curve';
import { expectRelative } from './expect-close';

describe('non-negative least squares by support enumeration', () => {
  it('solves a two-unknown problem worked by hand', () => {
    // Worked here: A = [[1,0],[0,1],[1,1]], b = [1,−1,0]. Unconstrained x = (AᵀA)⁻¹Aᵀb = [1, −1] is infeasible; with x₂ = 0,
    // min (x₁−1)² + 1 + x₁² gives x₁ = ½ and ‖r‖² = ¼ + 1 + ¼ = 1.5.
    const s = nonNegativeLeastSquares([[1, 0], [0, 1], [1, 1]], [1, -1, 0]);
    expectRelative(s.x[0], 0.5, 1e-14);
    expect(s.x[1]).toBe(0);
    expect(s.support).toEqual([true, false]);
    expectRelative(s.residualSumSquares, 1.5, 1e-14);
  });

  it('returns the unconstrained solution when it is already non-negative', () => {
    // Exact data b = A·[2, 3] (worked here).
    const s = nonNegativeLeastSquares([[1, 0], [0, 1], [1, 1]], [2, 3, 5]);
    expectRelative(s.x[0], 2, 1e-14);
    expectRelative(s.x[1], 3, 1e-14);
  });

  it('refuses mismatched shapes', () => {
    expect(() => nonNegativeLeastSquares([[1, 0]], [1, 2])).toThrow(InputError);
  });
});

describe('the whole-curve fit', () => {
  it('recovers all five coefficients from a noise-free sum of the terms', () => {
    // The model is linear in the squared coefficients, so exact data give them back (IEEE Std 952 term shapes, docs/checks.md §1.1).
    const truth = { 'quantisation': 1e-5, 'random-walk': 1e-3, 'bias-instability': 2e-4, 'rate-random-walk': 1e-6, 'rate-ramp': 1e-9 };
    const fit = fitNoiseTerms(curveFromVariance(logTaus(-2, 6), termsVariance(truth)));
    for (const term of fit.terms) {
      expect(term.atZero).toBe(false);
      expectRelative(term.coefficient, truth[term.id], 1e-6);
    }
    expect(fit.chiSquare).toBeLessThan(1e-12);
  });

  it('holds absent terms at zero and says how large they would have to be to show', () => {
    const fit = fitNoiseTerms(curveFromVariance(logTaus(-2, 5), termsVariance({ 'random-walk': 1e-3, 'rate-random-walk': 1e-5 })));
    const byId = new Map(fit.terms.map((t) => [t.id, t]));
    expectRelative(byId.get('random-walk')!.coefficient, 1e-3, 1e-6);
    expectRelative(byId.get('rate-random-walk')!.coefficient, 1e-5, 1e-6);
    for (const id of ['quantisation', 'bias-instability', 'rate-ramp'] as const) {
      expect(byId.get(id)!.atZero).toBe(true);
      expect(byId.get(id)!.coefficient).toBe(0);
      expect(byId.get(id)!.standardError).toBeGreaterThan(0);
    }
  });

  it('refuses a curve without two points above zero', () => {
    const flat = curveFromVariance(logTaus(-2, 0), () => 0);
    expect(() => fitNoiseTerms(flat)).toThrow(/fewer than two points/);
  });
});
