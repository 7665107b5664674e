import { describe, expect, it } from 'vitest';
import { sizeSource } from '../../src/budget/sizing';
import { SigmaLedgerError } from '../../src/errors';
import { budget, gyro, q, straightMission, wheel } from '../fixtures/small-budgets';

// Heading from ARW alone is N √t (docs/checks.md §4.1), so the largest ARW holding heading <= L over T is L / √T.
function arwBudget(arwDegRtH: number) {
  return budget(straightMission(400, 1), [gyro([{ id: 'arw', kind: 'white-noise', value: q(arwDegRtH, 'deg/√h') }]), wheel()], 1, {
    requirements: [{ id: 'heading', quantity: 'heading', level: '1sigma', limit: q(0.1, 'deg') }],
  });
}

describe('sizing by bisection', () => {
  it('finds the largest angle random walk for a heading limit within its tolerance (closed form L/√T)', () => {
    const expected = (0.1 / Math.sqrt(400)) * 60; // deg/√h
    const r = sizeSource(arwBudget(0.07), 'heading', 'gyro.arw', { relativeTolerance: 1e-6 });
    expect(r.outcome).toBe('bounded');
    expect(r.largestPassing).toBeLessThanOrEqual(expected * (1 + 1e-12));
    expect(r.smallestFailing!).toBeGreaterThan(expected);
    expect(r.smallestFailing! - r.largestPassing).toBeLessThanOrEqual(1e-6 * r.smallestFailing!);
    expect(r.atLargestPassing!.verdict).toBe('pass');
    expect(r.atSmallestFailing!.verdict).toBe('fail');
    expect(r.unit).toBe('deg/√h');
  });

  it('says when a requirement fails even with the row at zero', () => {
    const b = arwBudget(0.05);
    b.mission.initialSigma.heading = q(1, 'deg');
    expect(sizeSource(b, 'heading', 'gyro.arw').outcome).toBe('never-passes');
  });

  it('says when no value of the row breaks the requirement (a speed scale factor cannot move heading)', () => {
    const b = arwBudget(0.05);
    b.sensors[1].sources.push({ id: 'sf', kind: 'scale-factor', value: q(0.1, '%') });
    const r = sizeSource(b, 'heading', 'wheel.sf');
    expect(r.outcome).toBe('always-passes');
  });

  it('sizes a constant bias against the closed form b t (docs/checks.md §4.2)', () => {
    const b = budget(straightMission(400, 1), [gyro([{ id: 'bias', kind: 'turn-on-bias', value: q(1, 'deg/h') }]), wheel()], 1, {
      requirements: [{ id: 'heading', quantity: 'heading', level: '1sigma', limit: q(1, 'deg') }],
    });
    const r = sizeSource(b, 'heading', 'gyro.bias', { relativeTolerance: 1e-7 });
    expect(r.largestPassing).toBeCloseTo(3600 / 400, 5); // 1 deg over 400 s = 9 deg/h
  });

  it('names the row when it does not exist', () => {
    expect(() => sizeSource(arwBudget(0.05), 'heading', 'gyro.nothing')).toThrow(SigmaLedgerError);
    expect(() => sizeSource(arwBudget(0.05), 'heading', 'gyro.nothing')).toThrow(/gyro\.nothing/);
  });
});
