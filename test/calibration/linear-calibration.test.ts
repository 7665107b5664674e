import { describe, expect, it } from 'vitest';
import { fitOffsetAndScaleFactor } from '../../src/calibration/linear-calibration';
import { InputError } from '../../src/errors';
import { expectRelative } from '../allan/expect-close';
import { SeededRandom } from '../allan/seeded-random';

describe('offset and scale factor by least squares', () => {
  it('matches a four-point example worked by hand', () => {
    // Worked by hand (ordinary least squares, Draper & Smith ch. 1, from memory): truth x = 0, 1, 2, 3; output y = 0.1, 1.2, 2.1, 3.4.
    // d = y − x = 0.1, 0.2, 0.1, 0.4; x̄ = 1.5, d̄ = 0.2, Sxx = 5, Sxd = 0.4 -> s = 0.08, b = 0.2 − 0.08·1.5 = 0.08.
    // Residuals 0.02, 0.04, −0.14, 0.08; RSS = 0.028, σ̂² = 0.014; Var s = 0.014/5 = 0.0028; Var b = 0.014(1/4 + 2.25/5) = 0.0098;
    // Cov = −1.5·0.014/5 = −0.0042, correlation −0.0042/√(0.0028·0.0098) = −0.8017837.
    const c = fitOffsetAndScaleFactor(Float64Array.from([0.1, 1.2, 2.1, 3.4]), Float64Array.from([0, 1, 2, 3]));
    expectRelative(c.scaleFactor, 0.08, 1e-12);
    expectRelative(c.offset, 0.08, 1e-12);
    expectRelative(c.scaleFactorStd, Math.sqrt(0.0028), 1e-12);
    expectRelative(c.offsetStd, Math.sqrt(0.0098), 1e-12);
    expectRelative(c.residualStd, Math.sqrt(0.014), 1e-12);
    expectRelative(c.correlation, -0.0042 / Math.sqrt(0.0028 * 0.0098), 1e-12);
    [0.02, 0.04, -0.14, 0.08].forEach((r, i) => expect(c.residuals[i]).toBeCloseTo(r, 12));
  });

  it('recovers a known offset and scale factor within 3σ of its own standard deviations', () => {
    // Synthetic turntable log (seeded): set rates −100…100 deg/s, s = 1500 ppm, b = 0.2 deg/s, white noise 0.05 deg/s.
    // Least squares is unbiased with these standard deviations for white noise (Draper & Smith ch. 1, from memory).
    const rng = new SeededRandom(21);
    const sets = [-100, -50, -20, -5, 0, 5, 20, 50, 100];
    const truth = Float64Array.from({ length: 1800 }, (_, i) => sets[i % sets.length]);
    const measured = truth.map((x) => (1 + 1.5e-3) * x + 0.2 + 0.05 * rng.normal());
    const c = fitOffsetAndScaleFactor(measured, truth);
    expect(Math.abs(c.scaleFactor - 1.5e-3)).toBeLessThanOrEqual(3 * c.scaleFactorStd);
    expect(Math.abs(c.offset - 0.2)).toBeLessThanOrEqual(3 * c.offsetStd);
    expectRelative(c.residualStd, 0.05, 0.1);
    // With truth symmetric about zero the estimates are uncorrelated (Cov = −x̄σ̂²/Sxx = 0).
    expect(Math.abs(c.correlation)).toBeLessThan(1e-12);
  });

  it('keeps a scale factor of a few ppm exact on large values', () => {
    // Fitting y − x rather than y avoids (1 + s) − 1 cancellation: s = 2e-6 on values near 1e4 comes back to 1e-9 relative.
    const truth = Float64Array.from({ length: 50 }, (_, i) => 1e4 + 10 * i);
    const measured = truth.map((x) => (1 + 2e-6) * x + 1e-3);
    expectRelative(fitOffsetAndScaleFactor(measured, truth).scaleFactor, 2e-6, 1e-6);
  });

  it('refuses a truth that never changes, mismatched lengths and too few samples', () => {
    const three = Float64Array.from([1, 2, 3]);
    expect(() => fitOffsetAndScaleFactor(three, Float64Array.from([5, 5, 5]))).toThrow(/never changes, so offset and scale factor cannot be told apart/);
    expect(() => fitOffsetAndScaleFactor(three, Float64Array.from([1, 2]))).toThrow(InputError);
    expect(() => fitOffsetAndScaleFactor(Float64Array.from([1, 2]), Float64Array.from([1, 2]))).toThrow(/at least 3 samples/);
  });
});
