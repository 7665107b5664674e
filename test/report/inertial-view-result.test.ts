import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseAnyBudgetDocument, ViewSession, type InertialBudgetDocument } from '../../src';

/**
 * The page's view of a 3-D budget (src/report/inertial-view-result.ts) on
 * budgets/survey-drone.json (an invented scenario). Its path is checked
 * against the mission's kinematics, its shares against the fixed-gain
 * identity Σ P_s = P (docs/planar-model.md §7), its verdicts against its own
 * lines, and bad input against the field it names.
 */
const text = readFileSync('budgets/survey-drone.json', 'utf8');
const drone = () => parseAnyBudgetDocument(text, 'survey-drone.json').document as InertialBudgetDocument;
const session = new ViewSession();
const full = session.view(drone());
const v = full.inertial!;

describe('the 3-D view of the survey drone', () => {
  it('has every 3-D line, CEP and R95 in display units, thinned to at most 1500 points', () => {
    expect(full.blocked).toBeUndefined();
    for (const id of [
      'north',
      'east',
      'down',
      'height',
      'drms',
      'velocityNorth',
      'velocityEast',
      'velocityDown',
      'roll',
      'pitch',
      'yaw',
      'cep',
      'r95',
    ]) {
      expect(v.lines[id]?.values.length, id).toBe(v.t.length);
    }
    expect(v.t.length).toBeLessThanOrEqual(1500);
    expect([v.lines.yaw.unit, v.lines.height.unit, v.lines.velocityDown.unit]).toEqual(['deg', 'm', 'm/s']);
    // The start tilt is 0.5 deg per axis (the document); with level attitude roll and pitch read it directly at t = 0.
    expect(v.lines.roll.values[0]).toBeCloseTo(0.5, 6);
    // R95 of a circular normal is 2.4477 σ per axis (Rayleigh, sqrt(-2 ln 0.05)); DRMS is σ√2: R95 / DRMS ≤
    // 2.4477/√2 for any ellipse.
    const k = v.t.length - 1;
    expect(v.lines.r95.values[k] / v.lines.drms.values[k]).toBeLessThanOrEqual(
      Math.sqrt(-2 * Math.log(0.05)) / Math.SQRT2 + 1e-9,
    );
  });

  it('draws the path of the mission: 1290 m flown, 40 m climbed from 210 m', () => {
    // Kinematics of the legs: 2 ramps of 4 s from 0 to 6 m/s (12 m each), 96 s + 15 s + 100 s at 6 m/s; climb 20 s
    // at 2 m/s.
    const flown = 12 + 96 * 6 + 15 * 6 + 100 * 6 + 12;
    expect(v.path.distanceM[v.path.distanceM.length - 1]).toBeCloseTo(flown, 0);
    expect(Math.max(...v.path.height)).toBeCloseTo(250, 6);
    expect(v.path.height[0]).toBe(210);
  });

  it('traces every source to its row, and the shares sum to the total variance (Σ P_s = P)', () => {
    const doc = drone();
    for (const e of v.shares.height) {
      if (e.sourceId.startsWith('mission.')) expect(e.path).toBe(e.sourceId);
      else
        expect(
          doc.sensors.flatMap((s, i) => s.sources.map((r, j) => [`${s.id}.${r.id}`, `sensors[${i}].sources[${j}]`])),
        ).toContainEqual([e.sourceId, e.path]);
    }
    for (const q of ['height', 'yaw', 'drms']) {
      const k = v.t.length - 1;
      const sum = v.shares[q].reduce((s, e) => s + e.variance[k], 0);
      expect(Math.sqrt(sum) / v.lines[q].values[k], q).toBeCloseTo(1, 9);
    }
  });

  it('gives each requirement a verdict whose first exceedance agrees with the lines', () => {
    for (const r of v.verdicts) {
      const curve = full.curves.find((c) => c.id === r.id)!;
      const inside = v.t
        .map((t, k) => [t, curve.values[k]] as const)
        .filter(([t]) => t >= r.windowS[0] && t <= r.windowS[1]);
      expect(Math.max(...inside.map(([, x]) => x)), r.id).toBeLessThanOrEqual(r.worst * (1 + 1e-12));
      expect(r.pass, r.id).toBe(r.firstExceedS === undefined);
      expect(r.pass, r.id).toBe(r.worst <= r.limit);
    }
  });
});

describe('bad 3-D input in the view', () => {
  const bad = (change: (d: InertialBudgetDocument) => void) => {
    const d = drone();
    change(d);
    return session.view(d, { contributions: false });
  };

  it('names the lever arm of absurd length and computes nothing', () => {
    const r = bad((d) => (d.sensors[1].leverArm!.x.value = 5000));
    expect(r.blocked?.path).toBe('sensors[1].leverArm');
    expect(r.blocked?.message).toContain('lever arm');
  });

  it('names a negative height σ at its cell', () => {
    const r = bad((d) => (d.mission.initialPosition.vertical.value = -1));
    expect(r.cellErrors.map((e) => e.location.path)).toContain('mission.initialPosition.vertical.value');
  });

  it('leaves a zero-velocity window while moving out, in place, and computes the rest', () => {
    const r = bad((d) =>
      d.sensors.push({
        id: 'zupt',
        kind: 'zero-velocity',
        rate: { value: 10, unit: 'Hz' },
        windows: [{ start: { value: 50, unit: 's' }, end: { value: 60, unit: 's' } }],
        sources: [{ id: 'w', kind: 'white-noise', value: 0.01, unit: 'm/s', provenance: 'test', assumed: true }],
      }),
    );
    expect(r.omitted).toContainEqual({ path: 'sensors[4].windows[0]', what: 'window 1 of zupt' });
    expect(r.cellErrors.find((e) => e.location.path === 'sensors[4].windows[0]')?.message).toContain('moves');
    expect(r.inertial).toBeDefined();
  });
});
