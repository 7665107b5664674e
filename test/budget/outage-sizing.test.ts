import { describe, expect, it } from 'vitest';
import { longestOutage, requirementsWithOutage } from '../../src/budget/outage-sizing';
import type { SensorInput } from '../../src/inputs/budget-input';
import { budget, gyro, q, straightMission, wheel } from '../fixtures/small-budgets';

// A gyro with angle random walk N aided by a precise compass: during an outage heading σ grows as
// √(σ0² + N² L) (random walk of heading, docs/checks.md §4.1), so a 1σ limit h holds for
// L = (h² − σ0²)/N²; with σ0 ≈ 0.007 deg against h = 0.5 deg, L ≈ (h/N)² = 900 s for N = 1 deg/√h.
function compassBudget() {
  const compass: SensorInput = {
    id: 'compass', kind: 'compass', rate: q(10, 'Hz'),
    outages: [{ id: 'shed', start: q(100, 's'), end: q(110, 's') }],
    sources: [{ id: 'white', kind: 'white-noise', value: q(0.01, 'deg') }],
  };
  return budget(straightMission(1500, 1), [gyro([{ id: 'arw', kind: 'white-noise', value: q(1, 'deg/√h') }]), wheel(), compass], 1, {
    requirements: [
      { id: 'heading', quantity: 'heading', level: '1sigma', limit: q(0.5, 'deg') },
      { id: 'generous', quantity: 'heading', level: '1sigma', limit: q(5, 'deg') },
    ],
  });
}

describe('the longest outage of an aiding sensor', () => {
  const input = compassBudget();
  const ref = { sensorId: 'compass', outageIndex: 0 };
  const [heading, generous] = longestOutage(input, ref, ['heading', 'generous'], 0.5);

  it('matches the random-walk closed form (h/N)² within 0.5 %', () => {
    expect(heading.holdsToEnd).toBe(false);
    expect(Math.abs(heading.longestS / 900 - 1)).toBeLessThan(0.005);
  });

  it('holds at the longest length and fails just above it (within the tolerance)', () => {
    const at = (l: number) => requirementsWithOutage(input, ref, l).find((r) => r.id === 'heading')!.verdict;
    expect(at(heading.longestS)).toBe('pass');
    expect(at(heading.longestS + 2 * heading.toleranceS + 1e-9)).toBe('fail');
    expect(heading.toleranceS).toBeLessThanOrEqual(0.5);
  });

  it('says when a requirement holds with the outage lasting to the mission\'s end', () => {
    expect(generous).toMatchObject({ holdsToEnd: true, longestS: 1400 });
  });

  it('names the outages that exist when asked for one that does not', () => {
    expect(() => longestOutage(input, { sensorId: 'compass', outageIndex: 3 }, ['heading'])).toThrow(/compass\[0\]/);
  });
});
