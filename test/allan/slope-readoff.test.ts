import { describe, expect, it } from 'vitest';
import { readBiasInstabilityFloor } from '../../src/allan/floor-reading';
import { localLogLogSlopes } from '../../src/allan/log-log-lines';
import { NOISE_TERMS } from '../../src/allan/noise-terms';
import { readTermBySlope } from '../../src/allan/slope-readoff';
import { FLICKER_FLOOR_FACTOR, GM_ALLAN_PEAK_RATIO, GM_ALLAN_PEAK_U, gaussMarkovAllanVariance } from '../../src/sources/gauss-markov-allan';
import { curveFromVariance, logTaus, termsVariance } from './closed-form-curve';
import { expectAbsolute, expectRelative } from './expect-close';

describe('slope read-offs on noise-free curves', () => {
  it('return exactly the coefficient of a single-term curve, read inside the data', () => {
    // A pure power law is its own line: the read-off is exact (IEEE Std 952-1997 Annex C read-off points, docs/checks.md §1.1).
    const tau = logTaus(-2, 2);
    for (const term of NOISE_TERMS.filter((t) => t.readOffTauS !== undefined)) {
      const reading = readTermBySlope(curveFromVariance(tau, termsVariance({ [term.id]: 2.5e-3 })), term.id);
      expectRelative(reading.coefficient, 2.5e-3, 1e-12);
      expect(reading.extrapolated).toBe(false);
      expect(reading.upperBound).toBe(false);
      expect(reading.readAtTauS).toBe(term.readOffTauS);
    }
  });

  it('extrapolate the line, and say so, when the reference τ lies outside the points used', () => {
    // Rate random walk seen only from 100 s on, read at τ = 3 s on the extended line (IEEE Std 952 read-off at τ = 3).
    const reading = readTermBySlope(curveFromVariance(logTaus(2, 4), termsVariance({ 'rate-random-walk': 1e-5 })), 'rate-random-walk');
    expectRelative(reading.coefficient, 1e-5, 1e-12);
    expect(reading.extrapolated).toBe(true);
  });

  it('separate angle random walk and rate random walk three decades apart', () => {
    // N = 1e-3, K = 1e-6 cross at τ = √3 N/K ≈ 1732 s (docs/checks.md §1.1 closed forms); each read-off must stay within its own
    // reported uncertainty, which bounds the neighbour's share by the local slope's distance from the term's slope.
    const curve = curveFromVariance(logTaus(-2, 7), termsVariance({ 'random-walk': 1e-3, 'rate-random-walk': 1e-6 }));
    for (const [id, truth] of [['random-walk', 1e-3], ['rate-random-walk', 1e-6]] as const) {
      const reading = readTermBySlope(curve, id);
      expect(Math.abs(reading.coefficient / truth - 1)).toBeLessThanOrEqual(reading.relativeUncertainty);
      expect(reading.relativeUncertainty).toBeLessThan(0.02);
    }
  });

  it('give an upper bound, not a value, for a term whose slope is absent', () => {
    // Bound rule of slope-readoff.ts: the largest coefficient whose curve stays under σ(1 + δ); for pure white noise N/√τ the
    // quantisation bound √3·Q/τ ≤ 1.01 N/√τ binds at the shortest τ: Q ≤ 1.01 N √τ_min / √3.
    const tau = logTaus(-2, 2);
    const reading = readTermBySlope(curveFromVariance(tau, termsVariance({ 'random-walk': 1e-3 })), 'quantisation');
    expect(reading.upperBound).toBe(true);
    expectRelative(reading.coefficient, (1.01 * 1e-3 * Math.sqrt(0.01)) / Math.sqrt(3), 1e-12);
    expect(reading.readAtTauS).toBeCloseTo(0.01, 14);
  });

  it('leave out points with fewer than 51 independent clusters when choosing a region', () => {
    // Rule of slope-readoff.ts (δ ≤ 0.1): a rising tail seen only at δ = 0.3 is not a rate random walk.
    const tau = logTaus(-2, 2);
    const curve = curveFromVariance(tau, termsVariance({ 'random-walk': 1e-3, 'rate-random-walk': 1e-3 }));
    const noisyTail = { ...curve, percentageError: tau.map((t) => (t > 1 ? 0.3 : 0.01)) };
    expect(readTermBySlope(noisyTail, 'rate-random-walk').upperBound).toBe(true);
    expect(readTermBySlope(curve, 'rate-random-walk').upperBound).toBe(false);
  });
});

describe('the bias-instability floor', () => {
  it('reads B from a flat floor between white noise and rate random walk', () => {
    // B = floor / 0.664282 (IEEE Std 952-1997 Annex C via docs/checks.md §1.1); N = 1e-4, B = 1e-3, K = 1e-7 leave the
    // floor within 1e-4 of 0.664 B for two decades around τ = √3 N/K ≈ 1732 s (closed forms, computed here).
    const curve = curveFromVariance(logTaus(-2, 7), termsVariance({ 'random-walk': 1e-4, 'bias-instability': 1e-3, 'rate-random-walk': 1e-7 }));
    const reading = readBiasInstabilityFloor(curve);
    expect(reading.upperBound).toBe(false);
    expectRelative(reading.coefficient, 1e-3, 1e-4);
    expectRelative(reading.deviation, 1e-3 * FLICKER_FLOOR_FACTOR, 1e-4);
  });

  it('finds the peak of a Gauss-Markov bias at 1.8926 T with the peak deviation 0.6174 σ', () => {
    // docs/checks.md §1.4: peak at u* = 1.892617832925019, σ_A,max = 0.6173642831444414 σ. The floor reader interpolates the
    // zero crossing of a ±¼-decade slope on a skewed peak and averages ±¼ decade; its own bias, computed here, is below 1 %.
    const sigma = 2e-3, correlationTimeS = 40;
    const curve = curveFromVariance(logTaus(-1, 4), (t) => gaussMarkovAllanVariance(sigma, correlationTimeS, t) + 1e-12 / t);
    const reading = readBiasInstabilityFloor(curve);
    expectRelative(reading.readAtTauS, GM_ALLAN_PEAK_U * correlationTimeS, 0.01);
    expectRelative(reading.deviation, GM_ALLAN_PEAK_RATIO * sigma, 0.01);
  });

  it('reports an upper bound when the curve never levels off', () => {
    const reading = readBiasInstabilityFloor(curveFromVariance(logTaus(-2, 2), termsVariance({ 'random-walk': 1e-3 })));
    expect(reading.upperBound).toBe(true);
  });
});

describe('the Gauss-Markov small-τ and large-τ cases', () => {
  const sigma = 1, correlationTimeS = 1;

  it('look like rate random walk K² = 2σ²/T for τ ≪ T, read through gaussMarkovAllanVariance without cancellation', () => {
    // docs/checks.md §1.4: σ_A² → (2/3)σ² τ/T for small τ, the closed form cancels catastrophically in doubles at u = 1e-6
    // (wrong sign), and the ratio to the asymptote is 1 − 7.5e-4 at u = 1e-3, so below 1e-4 in σ for u ≤ 1e-4.
    const curve = curveFromVariance(logTaus(-7, -4), (t) => gaussMarkovAllanVariance(sigma, correlationTimeS, t));
    for (const s of localLogLogSlopes(curve)) expectAbsolute(s, 0.5, 1e-4);
    const reading = readTermBySlope(curve, 'rate-random-walk');
    expectRelative(reading.coefficient, Math.sqrt((2 * sigma * sigma) / correlationTimeS), 2e-4);
    expect(reading.extrapolated).toBe(true);
  });

  it('look like white rate noise N² = 2σ²T for τ ≫ T', () => {
    // docs/checks.md §1.4: σ_A² → 2σ²T/τ; the ratio to it is 1 − 1.5e-3 at u = 1e3, so below 1e-4 in σ from u = 1e4.
    const curve = curveFromVariance(logTaus(4, 7), (t) => gaussMarkovAllanVariance(sigma, correlationTimeS, t));
    const reading = readTermBySlope(curve, 'random-walk');
    expectRelative(reading.coefficient, Math.sqrt(2 * sigma * sigma * correlationTimeS), 1e-4);
  });
});
