import { describe, expect, it } from 'vitest';
import { computeBudget } from '../../src/pipeline';
import { timeToExceed } from '../../src/budget/requirements';
import type { RequirementInput, SensorInput } from '../../src/inputs/budget-input';
import { budget, gyro, q, straightMission, wheel } from '../fixtures/small-budgets';

const DEG = Math.PI / 180;

/** A compass that is out for the whole mission: heading then grows as N √t from ARW alone (docs/checks.md §4.1). */
function arwOnlyWithCompassOut(durationS: number, requirement: RequirementInput) {
  const compass: SensorInput = {
    id: 'compass', kind: 'compass', rate: q(1, 'Hz'),
    outages: [{ id: 'all', start: q(0, 's'), end: q(durationS, 's') }],
    sources: [{ id: 'white', kind: 'white-noise', value: q(1, 'deg') }],
  };
  const sensors = [gyro([{ id: 'arw', kind: 'white-noise', value: q(0.5, 'deg/√h') }]), wheel(), compass];
  return computeBudget(budget(straightMission(durationS, 1), sensors, 0.1, { requirements: [requirement] }));
}

describe('time to exceed during an outage', () => {
  it('equals (L / N)² for heading that grows as N √t (closed form, docs/checks.md §4.1)', () => {
    // N = 0.5 deg/√h = 0.5/60 deg/√s; L = 0.1 deg -> t = (0.1 / (0.5/60))² = 144 s.
    const r = arwOnlyWithCompassOut(300, { id: 'heading', quantity: 'heading', level: '1sigma', limit: q(0.1, 'deg') });
    const hold = r.requirements[0].outages[0];
    expect(hold.sensorId).toBe('compass');
    // Linear interpolation of √t between 0.1 s steps errs by under 1e-4 s here.
    expect(Math.abs(hold.timeToExceedS! - 144)).toBeLessThan(1e-3);
    expect(r.requirements[0].verdict).toBe('fail');
  });

  it('scales the limit by the level: at 95 % the heading breaks when 1.959964 N √t = L', () => {
    const r = arwOnlyWithCompassOut(300, { id: 'heading', quantity: 'heading', level: '95%', limit: q(0.2, 'deg') });
    const expected = (0.2 / 1.959963984540054 / (0.5 / 60)) ** 2;
    expect(Math.abs(r.requirements[0].outages[0].timeToExceedS! - expected)).toBeLessThan(1e-3);
  });

  it('is null when the requirement holds throughout, with a positive margin in the limit unit', () => {
    const r = arwOnlyWithCompassOut(100, { id: 'heading', quantity: 'heading', level: '1sigma', limit: q(1, 'deg') });
    const req = r.requirements[0];
    expect(req.outages[0].timeToExceedS).toBeNull();
    expect(req.verdict).toBe('pass');
    // The fix at t = 100 s (the outage's end) is taken, so the worst value is at 99.9 s: N √99.9.
    expect(req.margin).toBeCloseTo(1 - (0.5 / 60) * Math.sqrt(99.9), 9);
    expect(req.worstTimeS).toBeCloseTo(99.9, 9);
  });

  it('reports the margin in the unit the limit was written in', () => {
    const r = arwOnlyWithCompassOut(100, { id: 'heading', quantity: 'heading', level: '1sigma', limit: q(60, 'arcmin') });
    expect(r.requirements[0].margin).toBeCloseTo(60 - (0.5 / 60) * Math.sqrt(99.9) * 60, 7);
  });

  it('only looks inside the requirement window', () => {
    const r = arwOnlyWithCompassOut(300, {
      id: 'early', quantity: 'heading', level: '1sigma', limit: q(0.1, 'deg'), window: { start: q(0, 's'), end: q(100, 's') },
    });
    expect(r.requirements[0].verdict).toBe('pass');
    expect(r.requirements[0].outages[0].timeToExceedS).toBeNull();
  });
});

describe('timeToExceed', () => {
  const t = Float64Array.from([0, 1, 2, 3, 4]);
  it('interpolates linearly between the steps that straddle the limit', () => {
    expect(timeToExceed(t, Float64Array.from([0, 1, 2, 3, 4]), 2.5, 0, 5, 0)).toBeCloseTo(2.5, 12);
  });
  it('gives zero when the value is already above the limit when the outage begins', () => {
    expect(timeToExceed(t, Float64Array.from([3, 3, 3, 3, 3]), 2, 1, 5, 1)).toBe(0);
  });
  it('gives null when the value stays at or below the limit', () => {
    expect(timeToExceed(t, Float64Array.from([1, 1, 2, 2, 2]), 2, 0, 5, 0)).toBeNull();
  });
});

describe('horizontal levels', () => {
  it('uses DRMS for 1 sigma and the exact R95 for 95 % (circular case: 2.4477468307 sigma, docs/checks.md §6)', () => {
    const mission = straightMission(1, 0, { positionM: 2, headingDeg: 0 });
    const reqs: RequirementInput[] = [
      { id: 'drms', quantity: 'horizontal', level: '1sigma', limit: q(100, 'm') },
      { id: 'r95', quantity: 'horizontal', level: '95%', limit: q(100, 'm') },
      { id: 'cep', quantity: 'horizontal', level: '50%', limit: q(100, 'm') },
    ];
    const r = computeBudget(budget(mission, [gyro([]), wheel()], 0.5, { requirements: reqs }));
    const [drms, r95, cep] = r.requirements;
    expect(drms.worstValue).toBeCloseTo(2 * Math.SQRT2, 12);
    expect(r95.worstValue).toBeCloseTo(2 * 2.4477468307, 8);
    expect(cep.worstValue).toBeCloseTo(2 * 1.1774100225, 8);
  });
});

describe('heading-only suites', () => {
  it('report heading and refuse a position requirement with a message naming it', () => {
    const b = budget(straightMission(10, 1), [gyro([{ id: 'arw', kind: 'white-noise', value: q(0.5, 'deg/√h') }])], 0.1, {
      requirements: [{ id: 'pos', quantity: 'cross-track', level: '1sigma', limit: q(1, 'm') }],
    });
    expect(() => computeBudget(b)).toThrow(/requirements\[0\].*no speed input/);
    b.requirements = [{ id: 'h', quantity: 'heading', level: '1sigma', limit: q(1, 'deg') }];
    const r = computeBudget(b);
    expect(r.series.quantities.speed).toBeUndefined();
    expect(Math.sqrt(r.series.quantities.heading!.total[100]) / DEG).toBeCloseTo((0.5 / 60) * Math.sqrt(10), 9);
  });
});
