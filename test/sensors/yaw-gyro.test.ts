import { describe, expect, it } from 'vitest';
import { computeBudget } from '../../src/pipeline';
import { GM_ALLAN_PEAK_RATIO } from '../../src/sources/gauss-markov-allan';
import { budget, gyro, q, straightMission, wheel } from '../fixtures/small-budgets';

const DEG = Math.PI / 180;

function finalHeadingVariance(rows: Parameters<typeof gyro>[0], durationS: number, stepS = 1) {
  const r = computeBudget(budget(straightMission(durationS, 1), [gyro(rows), wheel()], stepS));
  const h = r.series.quantities.heading!.total;
  return h[h.length - 1];
}

describe('yaw gyro rows', () => {
  it('integrate a bias-instability row as a stationary Gauss-Markov bias: Var = 2σ²T(t − T(1 − e^{−t/T}))', () => {
    // Integrated first-order Markov process (Brown & Hwang, Introduction to Random Signals, from memory);
    // σ = floor / 0.6173643 so the Allan deviation peaks at the floor (docs/planar-model.md §3).
    const floorSI = (5 * DEG) / 3600, T = 150, t = 300;
    const sigma = floorSI / GM_ALLAN_PEAK_RATIO;
    const expected = 2 * sigma ** 2 * T * (t - T * (1 - Math.exp(-t / T)));
    const got = finalHeadingVariance([{ id: 'bi', kind: 'bias-instability', value: q(5, 'deg/h'), correlationTime: q(T, 's') }], t);
    expect(Math.abs(got / expected - 1)).toBeLessThan(1e-10);
  });

  it('reads a flicker coefficient B as the floor 0.6642825 B (IEEE Std 952-1997 Annex C)', () => {
    const asFloor = finalHeadingVariance([{ id: 'bi', kind: 'bias-instability', value: q(0.6642824702679601 * 4, 'deg/h'), correlationTime: q(100, 's') }], 200);
    const asB = finalHeadingVariance([{ id: 'bi', kind: 'bias-instability', value: q(4, 'deg/h'), correlationTime: q(100, 's'), biasForm: 'flicker-coefficient' }], 200);
    expect(Math.abs(asB / asFloor - 1)).toBeLessThan(1e-12);
  });

  it('treats a noise density in deg/s/√Hz as the two-sided ARW N (0.01 deg/s/√Hz = 0.6 deg/√h, docs/checks.md §2)', () => {
    const density = finalHeadingVariance([{ id: 'n', kind: 'white-noise', value: q(0.01, 'deg/s/√Hz') }], 100);
    const arw = finalHeadingVariance([{ id: 'n', kind: 'white-noise', value: q(0.6, 'deg/√h') }], 100);
    expect(Math.abs(density / arw - 1)).toBeLessThan(1e-12);
  });

  it('halves the PSD of a density marked one-sided (docs/checks.md §2, convention trap)', () => {
    const two = finalHeadingVariance([{ id: 'n', kind: 'white-noise', value: q(0.01, 'deg/s/√Hz') }], 100);
    const one = finalHeadingVariance([{ id: 'n', kind: 'white-noise', value: q(0.01, 'deg/s/√Hz'), densitySides: 'one' }], 100);
    expect(Math.abs(one / two - 0.5)).toBeLessThan(1e-12);
  });

  it('turns a per-sample sigma at the output rate into N = σ/√f_s (0.1 deg/√h at 100 Hz = 0.0166667 deg/s per sample)', () => {
    const perSample = finalHeadingVariance([{ id: 'n', kind: 'white-noise', value: q(2.9088820866572e-4, 'rad/s') }], 100);
    const arw = finalHeadingVariance([{ id: 'n', kind: 'white-noise', value: q(0.1, 'deg/√h') }], 100);
    expect(Math.abs(perSample / arw - 1)).toBeLessThan(1e-12);
  });

  it('adds a rate LSB as white noise of variance q²/12 per sample (Widrow, Kollár & Liu 1996)', () => {
    // q = 0.005 deg/s at 100 Hz: PSD q²/(12 f_s), heading variance PSD · t.
    const qSI = 0.005 * DEG;
    const got = finalHeadingVariance([{ id: 'lsb', kind: 'quantisation', value: q(0.005, 'deg/s') }], 100);
    expect(Math.abs(got / ((qSI ** 2 / 12 / 100) * 100) - 1)).toBeLessThan(1e-12);
  });

  it('adds an angle quantum as a bounded heading error s²/12 that does not grow', () => {
    const sSI = 0.01 * DEG;
    const short = finalHeadingVariance([{ id: 'q', kind: 'quantisation', value: q(0.01, 'deg') }], 10);
    const long = finalHeadingVariance([{ id: 'q', kind: 'quantisation', value: q(0.01, 'deg') }], 1000);
    expect(short).toBeCloseTo(sSI ** 2 / 12, 20);
    expect(long).toBeCloseTo(sSI ** 2 / 12, 20);
  });
});
