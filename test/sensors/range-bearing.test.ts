import { describe, expect, it } from 'vitest';
import { inverse, Matrix } from 'ml-matrix';
import { computeBudget } from '../../src/pipeline';
import type { SensorInput } from '../../src/inputs/budget-input';
import { budget, gyro, q, straightMission, wheel } from '../fixtures/small-budgets';
import { wrapAngle } from '../../src/sensors/range-bearing';

const DEG = Math.PI / 180;

function radar(extra: Partial<SensorInput> = {}): SensorInput {
  const b = 30 * DEG; // bearing of the landmark from north, 1000 m away
  return {
    id: 'radar', kind: 'range-bearing', rate: q(1, 'Hz'),
    landmarks: [{ id: 'mast', north: q(1000 * Math.cos(b), 'm'), east: q(1000 * Math.sin(b), 'm') }],
    sources: [{ id: 'range', kind: 'white-noise', value: q(10, 'm') }, { id: 'bearing', kind: 'white-noise', value: q(1, 'deg') }],
    ...extra,
  };
}

function fixCovariance(priorSigmaM: number, sensor: SensorInput) {
  const r = computeBudget(budget(straightMission(1, 0, { positionM: priorSigmaM, headingDeg: 0 }), [gyro([]), wheel(), sensor], 1));
  const e = r.history.entries; // heading 0: along = north, cross = east
  return { nn: e.alongAlong[0], ee: e.crossCross[0], ne: e.alongCross[0] };
}

describe('range and bearing to a landmark', () => {
  it('fixes position with the first-order polar-to-Cartesian covariance (docs/checks.md §7: r 1000 m, 30 deg, 10 m, 1 deg)', () => {
    // Bar-Shalom, Li & Kirubarajan 2001 (from memory); values computed with numpy in docs/checks.md §7.
    // A 10 km prior leaves the fix within 3e-6 relative of J R Jᵀ.
    const p = fixCovariance(1e4, radar());
    expect(Math.abs(p.nn / 151.15435494670 - 1)).toBeLessThan(1e-5);
    expect(Math.abs(p.ee / 253.46306484 - 1)).toBeLessThan(1e-5);
    expect(Math.abs(p.ne / -88.6019417961 - 1)).toBeLessThan(1e-5);
  });

  it('matches the information-form posterior (P0⁻¹ + Hᵀ R⁻¹ H)⁻¹ exactly for a finite prior (ml-matrix inverse)', () => {
    const b = 30 * DEG, r = 1000;
    const dN = r * Math.cos(b), dE = r * Math.sin(b);
    // docs/planar-model.md §5 rows on (dN, dE): range -dN/r, -dE/r; bearing dE/r², -dN/r².
    const h = new Matrix([[-dN / r, -dE / r], [dE / r ** 2, -dN / r ** 2]]);
    const rInv = Matrix.diag([1 / 100, 1 / DEG ** 2]);
    const info = Matrix.eye(2).mul(1 / 50 ** 2).add(h.transpose().mmul(rInv).mmul(h));
    const expected = inverse(info);
    const p = fixCovariance(50, radar());
    expect(p.nn).toBeCloseTo(expected.get(0, 0), 9);
    expect(p.ee).toBeCloseTo(expected.get(1, 1), 9);
    expect(p.ne).toBeCloseTo(expected.get(0, 1), 9);
  });

  it('ignores landmarks beyond the maximum range or outside the field of view', () => {
    const far = fixCovariance(50, radar({ maxRange: q(900, 'm') }));
    expect(far.nn).toBeCloseTo(2500, 9);
    const behind = fixCovariance(50, radar({ fieldOfView: q(40, 'deg') })); // landmark 30 deg off the heading, half-width 20 deg
    expect(behind.nn).toBeCloseTo(2500, 9);
    const seen = fixCovariance(50, radar({ fieldOfView: q(70, 'deg') }));
    expect(seen.nn).toBeLessThan(2500);
  });

  it('wraps angles into (-180, 180] deg', () => {
    expect(wrapAngle(3 * Math.PI)).toBeCloseTo(Math.PI, 15);
    expect(wrapAngle(-Math.PI)).toBeCloseTo(Math.PI, 15);
    expect(wrapAngle(-0.5)).toBeCloseTo(-0.5, 15);
  });
});
