import { describe, expect, it } from 'vitest';
import { InputError } from '../../src/errors';
import {
  densityFromRandomWalk,
  randomWalkFromDensity,
  randomWalkFromSampleSigma,
  sampleSigmaFromRandomWalk,
} from '../../src/units/noise-density';
import { convert, fromSI, toSI } from '../../src/units/to-si';
import { expectRelative } from './expect-relative';

describe('noise density and random walk', () => {
  it('takes a two-sided density as numerically the random walk', () => {
    // from memory: IEEE Std 952-1997 Annex C, white rate noise of two-sided PSD N^2 has ARW N
    expect(randomWalkFromDensity(1.7e-4, 'two')).toBe(1.7e-4);
  });

  it('divides a one-sided density by √2', () => {
    // computed: a one-sided PSD is twice the two-sided one (docs/checks.md §2 checks this with a one-sided Welch estimate)
    expectRelative(randomWalkFromDensity(Math.SQRT2 * 3e-5, 'one'), 3e-5, 1e-15);
    expectRelative(densityFromRandomWalk(3e-5, 'one'), Math.SQRT2 * 3e-5, 1e-15);
  });

  it('turns a datasheet density of 0.01 deg/s/√Hz into an angle random walk of 0.6 deg/√h', () => {
    // computed: pure arithmetic, ARW [deg/√h] = 60 × density [deg/s/√Hz] for a two-sided density
    const densitySI = toSI(0.01, 'deg/s/√Hz', 'angle-random-walk', 'x');
    const arw = fromSI(randomWalkFromDensity(densitySI, 'two'), 'deg/√h', 'angle-random-walk', 'x');
    expectRelative(arw, 0.6, 1e-15);
  });

  it('turns 100 µg/√Hz into a velocity random walk of 0.0588399 m/s/√h', () => {
    // computed: pure arithmetic, with g0 from the 3rd CGPM 1901
    const vrw = randomWalkFromDensity(toSI(100, 'µg/√Hz', 'velocity-random-walk', 'x'), 'two');
    expectRelative(fromSI(vrw, 'm/s/√h', 'velocity-random-walk', 'x'), 0.0588399, 1e-12);
  });

  it('gives a per-sample sigma of 2.9088820866572e-4 rad/s for 0.1 deg/√h sampled at 100 Hz', () => {
    // computed: pure arithmetic, σ_d = N·√f_s
    const arwSI = toSI(0.1, 'deg/√h', 'angle-random-walk', 'x');
    const sigma = sampleSigmaFromRandomWalk(arwSI, 100);
    expectRelative(sigma, 2.9088820866572e-4, 1e-12);
    expectRelative(convert(sigma, 'rad/s', 'deg/s', 'x'), 1 / 60, 1e-12);
  });

  it('inverts the per-sample form: N = σ_d/√f_s', () => {
    // computed: pure arithmetic
    expect(randomWalkFromSampleSigma(0.05, 400)).toBe(0.0025);
    for (const rateHz of [1, 50, 200, 1000]) {
      expectRelative(randomWalkFromSampleSigma(sampleSigmaFromRandomWalk(2e-5, rateHz), rateHz), 2e-5, 1e-15);
    }
  });

  it('refuses a negative or non-finite magnitude, naming the path', () => {
    expect(() => randomWalkFromDensity(-1, 'two', 'gyro.arw')).toThrow(InputError);
    expect(() => randomWalkFromDensity(-1, 'two', 'gyro.arw')).toThrow('gyro.arw: the noise density must be a finite number of zero or more, got -1');
    expect(() => randomWalkFromSampleSigma(NaN, 100, 'gyro.arw')).toThrow('gyro.arw: the per-sample sigma must be');
    expect(() => sampleSigmaFromRandomWalk(Infinity, 100, 'p')).toThrow('p: the random-walk coefficient must be');
  });

  it('refuses a sample rate that is not a positive finite number', () => {
    for (const rateHz of [0, -10, NaN, Infinity]) {
      expect(() => randomWalkFromSampleSigma(1, rateHz, 'gyro.rate')).toThrow('gyro.rate: the sample rate must be a finite number of Hz greater than zero');
    }
  });

  it('refuses a density that is marked neither one- nor two-sided', () => {
    expect(() => randomWalkFromDensity(1, 'both' as 'one', 'row.sides')).toThrow(`row.sides: the density must be marked 'one'- or 'two'-sided, got "both"`);
  });
});
