import { describe, expect, it } from 'vitest';
import { computeBudget } from '../../src/pipeline';
import { budget, gyro, q, straightMission, wheel } from '../fixtures/small-budgets';

// Closed forms of dead-reckoning error growth: docs/checks.md §4 (Itô isometry; computed with sympy there).
// They are exact solutions of the linear error model, so the covariance run must reproduce them to round-off.
const DEG = Math.PI / 180;
const REL = 1e-9;

function finalSigma(b: ReturnType<typeof budget>, quantity: 'heading' | 'cross-track' | 'along-track' | 'north') {
  const r = computeBudget(b);
  const total = r.series.quantities[quantity]!.total;
  return Math.sqrt(total[total.length - 1]);
}

describe('heading error growth from single gyro sources', () => {
  it('grows as N √t from angle random walk alone (docs/checks.md §4.1: 0.5 deg/√h, 600 s -> 0.2041241452 deg)', () => {
    const b = budget(straightMission(600, 20), [gyro([{ id: 'arw', kind: 'white-noise', value: q(0.5, 'deg/√h') }]), wheel()], 1);
    expect(finalSigma(b, 'heading') / DEG).toBeCloseTo(0.2041241452, 9);
  });

  it('grows as b t from a constant bias (docs/checks.md §4.2: 10 deg/h over 600 s -> 1.666666667 deg)', () => {
    const b = budget(straightMission(600, 20), [gyro([{ id: 'bias', kind: 'turn-on-bias', value: q(10, 'deg/h') }]), wheel()], 1);
    expect(Math.abs(finalSigma(b, 'heading') / DEG / (10 / 6) - 1)).toBeLessThan(REL);
  });

  it('grows as K t^1.5 / √3 from rate random walk (docs/checks.md §4.3: 10 deg/h/√h, 600 s -> 0.39284 deg)', () => {
    const b = budget(straightMission(600, 20), [gyro([{ id: 'rrw', kind: 'rate-random-walk', value: q(10, 'deg/h/√h') }]), wheel()], 1);
    const kSI = (10 * DEG) / 3600 / 60;
    expect(Math.abs(finalSigma(b, 'heading') / ((kSI * 600 ** 1.5) / Math.sqrt(3)) - 1)).toBeLessThan(REL);
    expect(finalSigma(b, 'heading') / DEG).toBeCloseTo(0.39284, 5);
  });

  it('gives 0.36 deg from a 1000 ppm scale factor over a full turn (docs/checks.md §2, computed: pure arithmetic)', () => {
    const mission = straightMission(36, 0);
    mission.segments[0].turnRate = q(10, 'deg/s');
    const b = budget(mission, [gyro([{ id: 'sf', kind: 'scale-factor', value: q(1000, 'ppm') }]), wheel()], 0.1);
    expect(Math.abs(finalSigma(b, 'heading') / DEG / 0.36 - 1)).toBeLessThan(REL);
  });
});

describe('position error growth at speed', () => {
  it('grows cross-track as v N t^1.5 / √3 from angle random walk (docs/checks.md §4.6: 24.68268299 m)', () => {
    const b = budget(straightMission(600, 20), [gyro([{ id: 'arw', kind: 'white-noise', value: q(0.5, 'deg/√h') }]), wheel()], 1);
    expect(Math.abs(finalSigma(b, 'cross-track') / 24.68268299 - 1)).toBeLessThan(1e-8);
  });

  it('grows cross-track as v b t^2 / 2 from a constant gyro bias (docs/checks.md §4.7: 174.5329252 m)', () => {
    const b = budget(straightMission(600, 20), [gyro([{ id: 'bias', kind: 'turn-on-bias', value: q(10, 'deg/h') }]), wheel()], 1);
    expect(Math.abs(finalSigma(b, 'cross-track') / 174.5329252 - 1)).toBeLessThan(1e-8);
  });

  it('grows cross-track as v t δψ from an initial heading error (docs/checks.md §4.4, linearised: 209.4395102 m)', () => {
    const b = budget(straightMission(600, 20, { positionM: 0, headingDeg: 1 }), [gyro([]), wheel()], 1);
    expect(Math.abs(finalSigma(b, 'cross-track') / 209.4395102 - 1)).toBeLessThan(1e-8);
  });

  it('grows along-track as s v t from a speed scale factor (docs/checks.md §4.5: 0.5 %, 20 m/s, 600 s -> 60 m)', () => {
    const b = budget(straightMission(600, 20), [gyro([]), wheel([{ id: 'sf', kind: 'scale-factor', value: q(0.5, '%') }])], 1);
    expect(Math.abs(finalSigma(b, 'along-track') / 60 - 1)).toBeLessThan(REL);
  });

  it('grows along-track as a random walk from per-sample speed noise (common practice, no source: PSD = σ²/f_s)', () => {
    const b = budget(straightMission(100, 2), [gyro([]), wheel([{ id: 'white', kind: 'white-noise', value: q(0.05, 'm/s') }], 20)], 0.5);
    expect(Math.abs(finalSigma(b, 'along-track') / Math.sqrt((0.05 ** 2 / 20) * 100) - 1)).toBeLessThan(REL);
  });

  it('reads a speed noise density in m/s/√Hz as the two-sided √PSD: along-track σ = d √t (common practice, no source)', () => {
    const b = budget(straightMission(100, 2), [gyro([]), wheel([{ id: 'white', kind: 'white-noise', value: q(0.01, 'm/s/√Hz') }], 20)], 0.5);
    expect(Math.abs(finalSigma(b, 'along-track') / (0.01 * Math.sqrt(100)) - 1)).toBeLessThan(REL);
  });

  it('adds no speed noise while parked (docs/planar-model.md §3: a parked wheel reads zero)', () => {
    const b = budget(straightMission(100, 0), [gyro([]), wheel([{ id: 'white', kind: 'white-noise', value: q(0.05, 'm/s') }])], 0.5);
    expect(finalSigma(b, 'along-track')).toBe(0);
  });

  it('rotates the path-frame covariance into north and east (heading 90 deg puts along-track on east)', () => {
    const mission = straightMission(100, 20);
    mission.start.heading = q(90, 'deg');
    const b = budget(mission, [gyro([]), wheel([{ id: 'sf', kind: 'scale-factor', value: q(1, '%') }])], 1);
    const r = computeBudget(b);
    const last = r.trajectory.tS.length - 1;
    expect(Math.sqrt(r.series.quantities.east!.total[last])).toBeCloseTo(20, 9);
    expect(r.series.quantities.north!.total[last]).toBeLessThan(1e-20);
  });
});
