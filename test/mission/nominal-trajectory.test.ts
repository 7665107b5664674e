import { describe, expect, it } from 'vitest';
import { resolveMission } from '../../src/mission/resolve-mission';
import { buildNominalTrajectory, stepTimes } from '../../src/mission/nominal-trajectory';
import { q } from '../fixtures/small-budgets';

describe('the nominal path', () => {
  it('comes back to its start after a full circle (closed-form arcs)', () => {
    const m = resolveMission({
      start: { north: q(10, 'm'), east: q(-5, 'm'), heading: q(30, 'deg') },
      initialSigma: { position: q(1, 'm'), heading: q(1, 'deg') },
      segments: [{ duration: q(36, 's'), speed: q(4, 'm/s'), turnRate: q(10, 'deg/s') }],
    });
    const t = buildNominalTrajectory(m, 0.1);
    const last = t.tS.length - 1;
    expect(t.northM[last]).toBeCloseTo(10, 9);
    expect(t.eastM[last]).toBeCloseTo(-5, 9);
    // Radius v/w = 4 / (10 deg/s): the farthest point is a diameter away.
    const far = Math.max(...Array.from(t.northM, (n, k) => Math.hypot(n - 10, t.eastM[k] + 5)));
    expect(far).toBeCloseTo((2 * 4) / ((10 * Math.PI) / 180), 3);
  });

  it('covers v0 t + a t²/2 on a straight speed ramp', () => {
    const m = resolveMission({
      start: { north: q(0, 'm'), east: q(0, 'm'), heading: q(90, 'deg') },
      initialSigma: { position: q(0, 'm'), heading: q(0, 'deg') },
      segments: [{ duration: q(10, 's'), speed: q(2, 'm/s'), speedEnd: q(6, 'm/s'), turnRate: q(0, 'deg/s') }],
    });
    const t = buildNominalTrajectory(m, 0.5);
    expect(t.eastM[t.tS.length - 1]).toBeCloseTo(2 * 10 + 0.5 * 0.4 * 100, 10);
    expect(t.speedMps[t.tS.length - 1]).toBeCloseTo(6, 12);
  });

  it('computes step times as products and ends exactly at the mission end', () => {
    const t = stepTimes(1.05, 0.1);
    expect(t[3]).toBe(3 * 0.1);
    expect(t[t.length - 1]).toBe(1.05);
    expect(t.length).toBe(12);
  });
});
