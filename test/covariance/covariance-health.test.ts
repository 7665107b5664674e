import { describe, expect, it } from 'vitest';
import { checkCovariance } from '../../src/covariance/covariance-health';
import { computeBudget } from '../../src/pipeline';
import { resolveMission } from '../../src/mission/resolve-mission';
import { buildNominalTrajectory } from '../../src/mission/nominal-trajectory';
import { buildErrorModel } from '../../src/sensors/build-error-model';
import { runCovariance } from '../../src/covariance/run-covariance';
import { buildBudgetSeries } from '../../src/budget/budget-series';
import { budget, gyro, q, straightMission, wheel } from '../fixtures/small-budgets';

const check = (p: number[], n: number) => checkCovariance(Float64Array.from(p), 0, n, 12.5, new Float64Array(n * n));

describe('covariance health checks', () => {
  it('accept a positive definite and a rank-one matrix', () => {
    expect(check([4, 1.5, 1.5, 2], 2)).toBeUndefined();
    expect(check([1, 2, 2, 4], 2)).toBeUndefined();
  });

  it('report a matrix that is not positive semi-definite, with the time', () => {
    const issue = check([1, 2, 2, 1], 2);
    expect(issue?.kind).toBe('not-positive-semidefinite');
    expect(issue?.tS).toBe(12.5);
  });

  it('report a negative variance, an asymmetry and a non-finite entry', () => {
    expect(check([-1, 0, 0, 1], 2)?.kind).toBe('not-positive-semidefinite');
    expect(check([1, 0.5, 0.4, 1], 2)?.kind).toBe('asymmetric');
    expect(check([1, NaN, NaN, 1], 2)?.kind).toBe('not-finite');
  });
});

describe('a run with a measurement of something already known exactly', () => {
  it('reports a singular innovation as a status instead of producing NaN', () => {
    // Parked, no initial uncertainty, and a GNSS fix with zero noise: H P Hᵀ + R = 0.
    const gnss = { id: 'gnss', kind: 'gnss-position' as const, rate: q(1, 'Hz'), sources: [{ id: 'white', kind: 'white-noise' as const, value: q(0, 'm') }] };
    const input = budget(straightMission(3, 0), [gyro([]), wheel(), gnss], 1);
    // The pipeline refuses R = 0 up front (measurement-noise-check.ts); the run itself must still survive it.
    expect(() => computeBudget(input)).toThrow(/sensors\[2\]\.sources\[0\]\.value: is 0/);
    const mission = resolveMission(input.mission);
    const model = buildErrorModel(input.sensors, mission);
    const traj = buildNominalTrajectory(mission, 1);
    const history = runCovariance(model, traj);
    expect(history.issues.map((i) => i.kind)).toContain('singular-innovation');
    expect(buildBudgetSeries(model, traj, history).quantities.north!.total.every(Number.isFinite)).toBe(true);
  });
});

describe('a speed ramp', () => {
  it('grows along-track error from a speed scale factor as s times the distance covered (exact for a linear ramp)', () => {
    const mission = straightMission(10, 2);
    mission.segments[0].speedEnd = q(6, 'm/s');
    const r = computeBudget(budget(mission, [gyro([]), wheel([{ id: 'sf', kind: 'scale-factor', value: q(1, '%') }])], 0.3));
    const along = r.series.quantities['along-track']!.total;
    expect(Math.sqrt(along[along.length - 1])).toBeCloseTo(0.01 * (2 * 10 + 0.5 * 0.4 * 100), 12);
  });
});
