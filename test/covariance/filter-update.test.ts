import { describe, expect, it } from 'vitest';
import { computeBudget } from '../../src/pipeline';
import type { SensorInput } from '../../src/inputs/budget-input';
import { budget, gyro, q, straightMission, wheel } from '../fixtures/small-budgets';

function gnss(sigmaM: number, rateHz = 1, extra: Partial<SensorInput> = {}): SensorInput {
  return { id: 'gnss', kind: 'gnss-position', rate: q(rateHz, 'Hz'), sources: [{ id: 'white', kind: 'white-noise', value: q(sigmaM, 'm') }], ...extra };
}

describe('GNSS fixes of a static position', () => {
  // Repeated independent fixes of a constant: sigma0² sigma² / (sigma² + k sigma0²) (docs/checks.md §5, least squares of k fixes with a prior).
  it('shrink the variance as sigma0² sigma² / (sigma² + k sigma0²) after k fixes', () => {
    const r = computeBudget(budget(straightMission(10, 0, { positionM: 3, headingDeg: 0 }), [gyro([]), wheel(), gnss(1.5)], 1));
    const north = r.series.quantities.north!.total;
    for (let k = 1; k <= 10; k++) {
      const expected = (9 * 2.25) / (2.25 + k * 9);
      expect(Math.abs(north[k - 1] / expected - 1), `after ${k} fixes`).toBeLessThan(1e-12);
    }
  });

  it('split between prior and fix as worked by hand (sigma0 = 2 m, sigma = 1 m: 0.16 + 0.64 = 0.8 m²)', () => {
    // Gain K = 4/5; prior share (1 - K)² 4 = 0.16; fix share K² 1 = 0.64 (docs/planar-model.md §7, fixed-gain recursion).
    const r = computeBudget(budget(straightMission(1, 0, { positionM: 2, headingDeg: 0 }), [gyro([]), wheel(), gnss(1)], 1));
    const north = r.series.quantities.north!;
    const share = (id: string) => north.bySource[r.model.sources.findIndex((s) => s.id === id)][0];
    expect(share('mission.initialPosition')).toBeCloseTo(0.16, 14);
    expect(share('gnss.white')).toBeCloseTo(0.64, 14);
    expect(north.total[0]).toBeCloseTo(0.8, 14);
  });
});

describe('steady state of a random walk observed in white noise', () => {
  // Scalar discrete Riccati equation, P- = (Q + √(Q² + 4QR))/2, P+ = P- - Q (docs/checks.md §5.1;
  // Brown & Hwang, Introduction to Random Signals and Applied Kalman Filtering, from memory).
  // Along-track driven by speed noise of PSD σ²/f_s over a 1 s step is exactly such a walk.
  const cases: [number, number, number][] = [
    [1, 1, 0.6180339887],
    [0.01, 1, 0.095124922],
    [2, 0.5, 0.4142135624],
  ];
  for (const [qVar, rVar, expectedPlus] of cases) {
    it(`reaches P+ = ${expectedPlus} for Q = ${qVar}, R = ${rVar}`, () => {
      const sensors = [gyro([]), wheel([{ id: 'white', kind: 'white-noise', value: q(Math.sqrt(qVar), 'm/s') }], 1), gnss(Math.sqrt(rVar))];
      const r = computeBudget(budget(straightMission(400, 1), sensors, 1));
      const along = r.series.quantities['along-track']!.total;
      expect(along[along.length - 1]).toBeCloseTo(expectedPlus, 9);
    });
  }
});

describe('measurement timing and outages', () => {
  it('takes a fix at the outage end but not at its start (half-open windows, docs/planar-model.md §5)', () => {
    const sensors = [gyro([]), wheel(), gnss(1, 1, { outages: [{ start: q(2, 's'), end: q(5, 's') }] })];
    const r = computeBudget(budget(straightMission(8, 0, { positionM: 10, headingDeg: 0 }), sensors, 1));
    expect(r.history.measurementCounts.gnss).toBe(2 * 6); // t = 0, 1, 5, 6, 7, 8, north and east each
  });

  it('processes a faster sensor several times within one step', () => {
    const sensors = [gyro([]), wheel(), gnss(1, 10)];
    const r = computeBudget(budget(straightMission(1, 0, { positionM: 10, headingDeg: 0 }), sensors, 0.5));
    expect(r.history.measurementCounts.gnss).toBe(2 * 11);
    const north = r.series.quantities.north!.total;
    expect(north[north.length - 1]).toBeCloseTo((100 * 1) / (1 + 11 * 100), 12);
  });
});
