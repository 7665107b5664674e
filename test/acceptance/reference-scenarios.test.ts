import { describe, expect, it } from 'vitest';
import { computeBudget } from '../../src/pipeline';
import { scenarioR1, scenarioR2 } from '../fixtures/reference-scenarios';

// Acceptance values: docs/planar-model.md §11, "expected numbers from an independent reference"; agreement within 0.5 %.
const TOLERANCE = 0.005;
const DEG = 180 / Math.PI;

type Row = [tS: number, headingDeg: number, drmsM: number, alongM: number, crossM: number, speedMps: number];

function sigmaAt(result: ReturnType<typeof computeBudget>, tS: number) {
  const k = Math.round(tS / 0.1);
  const s = (name: 'heading' | 'drms' | 'along-track' | 'cross-track' | 'speed') => Math.sqrt(result.series.quantities[name]!.total[k]);
  return [s('heading') * DEG, s('drms'), s('along-track'), s('cross-track'), s('speed')];
}

function expectTable(result: ReturnType<typeof computeBudget>, table: Row[]) {
  for (const [t, ...expected] of table) {
    const got = sigmaAt(result, t);
    expected.forEach((e, i) => expect(Math.abs(got[i] / e - 1), `t = ${t} s, column ${i}`).toBeLessThan(TOLERANCE));
  }
}

describe('reference scenario R1 (one GNSS outage)', () => {
  const result = computeBudget(scenarioR1());

  it('matches the heading, DRMS, along, cross and speed table within 0.5 %', () => {
    expectTable(result, [
      [0.0, 2.0, 1.1767, 0.83205, 0.83205, 0.053852],
      [60.0, 0.25894, 0.56285, 0.36833, 0.4256, 0.022452],
      [179.9, 0.11694, 0.41346, 0.22507, 0.34683, 0.020118],
      [200.0, 0.17687, 0.56192, 0.47496, 0.30028, 0.020118],
      [240.0, 0.24678, 1.05119, 0.48941, 0.93031, 0.020118],
      [299.9, 0.36763, 2.53129, 0.53727, 2.47362, 0.020118],
    ]);
  });

  it('splits the heading variance at 299.9 s as the reference does (to 0.05 percentage points)', () => {
    const k = Math.round(299.9 / 0.1);
    const heading = result.series.quantities.heading!;
    const share = (id: string) => (100 * heading.bySource[result.model.sources.findIndex((s) => s.id === id)][k]) / heading.total[k];
    const expected: [string, number][] = [
      ['gyro.bi', 54.65], ['gnss.white', 33.42], ['gyro.sf', 5.99], ['gyro.arw', 2.48], ['gyro.bias', 2.36], ['mission.initialPosition', 1.05],
    ];
    for (const [id, pct] of expected) expect(Math.abs(share(id) - pct), id).toBeLessThan(0.05);
  });

  it('reports no numerical problem', () => {
    expect(result.history.issues).toEqual([]);
  });
});

describe('reference scenario R2 (every sensor)', () => {
  const result = computeBudget(scenarioR2());

  it('has the 11 states and 14 sources the reference describes', () => {
    expect(result.model.states.length).toBe(11);
    expect(result.model.sources.length).toBe(14);
    expect(result.trajectory.tS.length - 1).toBe(6000);
  });

  it('matches the heading, DRMS, along, cross and speed table within 0.5 %', () => {
    expectTable(result, [
      [0.0, 1.79284, 1.65434, 1.1698, 1.1698, 0.067082],
      [100.0, 0.23812, 1.20375, 0.85029, 0.85208, 0.03153],
      [289.9, 0.20255, 1.08395, 0.64121, 0.87395, 0.030636],
      [459.9, 0.17833, 0.9703, 0.5715, 0.78413, 0.030397],
      [600.0, 0.14668, 0.97632, 0.65666, 0.72249, 0.030195],
    ]);
  });
});
