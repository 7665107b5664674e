import { describe, expect, it } from 'vitest';
import { computeBudget } from '../../src/pipeline';
import type { SensorInput } from '../../src/inputs/budget-input';
import { budget, gyro, q, straightMission } from '../fixtures/small-budgets';

const DEG = Math.PI / 180;

function compass(sigmaDeg: number, extra: Partial<SensorInput> = {}): SensorInput {
  return { id: 'compass', kind: 'compass', rate: q(1, 'Hz'), sources: [{ id: 'noise', kind: 'white-noise', value: q(sigmaDeg, 'deg') }], ...extra };
}

/** Heading variance in deg² at step `at` (default the last) of a parked 300 s mission, 1 s step, gyro ARW only. */
function parkedHeadingVarianceDeg2(arwDegPerRootH: number, sensor: SensorInput, at?: number): number {
  const rows = [{ id: 'arw', kind: 'white-noise' as const, value: q(arwDegPerRootH, 'deg/√h') }];
  const r = computeBudget(budget(straightMission(300, 0, { positionM: 0, headingDeg: 5 }), [gyro(rows), sensor], 1));
  const total = r.series.quantities.heading!.total;
  return total[at ?? total.length - 1] / (DEG * DEG);
}

describe('a compass observing the heading of a parked vehicle', () => {
  // The heading is a random walk (gyro ARW N, per 1 s step Q = N² · 1 s) observed in white noise R = σ_c²
  // once per step: the steady-state posterior is P⁺ = P⁻ − Q with P⁻ = (Q + √(Q² + 4QR))/2
  // (docs/checks.md §5.1, the standard discrete Riccati solution; computed).
  it('settles at the golden-ratio posterior when Q = R (Q = R = 1 deg², P⁺ = 0.6180339887 deg²)', () => {
    // N = 1 deg/√s = 60 deg/√h.
    expect(parkedHeadingVarianceDeg2(60, compass(1))).toBeCloseTo(0.6180339887, 9);
  });

  it('settles at the tabulated posterior for Q = 0.01, R = 1 (P⁺ = 0.0951249220 deg²)', () => {
    // N = 0.1 deg/√s = 6 deg/√h.
    expect(parkedHeadingVarianceDeg2(6, compass(1))).toBeCloseTo(0.095124922, 9);
  });

  it('gives nothing during an outage: the heading variance grows by Q per step', () => {
    const outage = { outages: [{ start: q(200, 's'), end: q(300, 's') }] } as Partial<SensorInput>;
    // From the steady posterior at t = 199 s, 100 steps of Q = 0.01 deg² without a fix (exact for a random walk);
    // the outage is half-open, so the fix at t = 300 s is taken again.
    expect(parkedHeadingVarianceDeg2(6, compass(1, outage), 299)).toBeCloseTo(0.095124922 + 100 * 0.01, 9);
    // One update after it: P⁺ = P⁻R/(P⁻ + R) with P⁻ = P(299 s) + Q (docs/checks.md §5.1).
    const prior = 0.095124922 + 101 * 0.01;
    expect(parkedHeadingVarianceDeg2(6, compass(1, outage), 300)).toBeCloseTo(prior / (prior + 1), 9);
  });
});
