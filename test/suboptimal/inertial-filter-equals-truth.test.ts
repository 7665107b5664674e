/**
 * The truth-versus-filter run on the shared CovarianceProblem with the 3-D
 * model (docs/suboptimal-filter.md, docs/inertial-model.md): a short rover
 * mission (invented scenario, test/fixtures/inertial-scenarios.ts).
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { runInertialBudget, type InertialBudget } from '../../src/inertial/run-inertial';
import { runInertialTruthVersusFilter, type InertialTruthVersusFilter } from '../../src/suboptimal/inertial-truth-versus-filter';
import { RECORDED_PAIRS } from '../../src/inertial/inertial-quantities';
import { roverScenario } from '../fixtures/inertial-scenarios';

/** The rover's first 35 s: a start, a straight run with GNSS, odometer and constraints, part of a turn. */
function shortRover() {
  const b = roverScenario();
  b.mission.segments = b.mission.segments.slice(0, 3);
  b.mission.segments[1].duration.value = 20;
  b.mission.segments[2].duration.value = 10;
  b.aiding[0].outages = [];
  return b;
}

function worstRelative(a: ArrayLike<number>, b: ArrayLike<number>): number {
  let worst = 0;
  for (let k = 0; k < b.length; k++) worst = Math.max(worst, Math.abs(a[k] - b[k]) / Math.max(Math.abs(b[k]), 1e-300));
  return worst;
}

// Gelb, Applied Optimal Estimation, 1974, §7.2: with the filter's model equal to the truth the actual error
// covariance of the suboptimal recursion is the filter's own, which is the optimal (Kalman) run.
describe('3-D model: filter = truth', () => {
  let optimal: InertialBudget, design: InertialTruthVersusFilter;
  beforeAll(() => {
    optimal = runInertialBudget(shortRover());
    design = runInertialTruthVersusFilter(shortRover(), shortRover());
  }, 300_000);

  it('gives actual = believed = the optimal run within 1e-12 relative at every recorded entry and step', () => {
    const steps = optimal.run.steps;
    RECORDED_PAIRS.forEach(([i, j], p) => {
      if (i !== j) return;
      const opt = optimal.run.recorded[p].subarray(0, steps);
      expect(worstRelative(design.run.actual.totalRecorded[p], design.run.believed.totalRecorded[p]), `actual vs believed P[${i}][${j}]`).toBeLessThan(1e-12);
      expect(worstRelative(design.run.actual.totalRecorded[p], opt), `actual vs optimal P[${i}][${j}]`).toBeLessThan(1e-12);
    });
    expect(Object.keys(design.run.actual.measurementCounts).sort()).toEqual(Object.keys(optimal.run.measurementCounts).sort());
    expect(design.run.actual.issues).toEqual([]);
  });

  it('gives each truth source the optimal run\'s share (within 1e-12 of the total) and a normalised innovation variance of 1', () => {
    const steps = optimal.run.steps;
    RECORDED_PAIRS.forEach(([i, j], p) => {
      if (i !== j) return;
      for (let s = 0; s < optimal.run.sourceCount; s++) {
        let worst = 0;
        for (let k = 0; k < steps; k++) {
          const share = optimal.run.recorded[p][(s + 1) * steps + k], total = optimal.run.recorded[p][k];
          worst = Math.max(worst, Math.abs(design.run.actual.recorded[p][(s + 1) * steps + k] - share) / Math.max(total, 1e-300));
        }
        expect(worst, `${optimal.model.sources[s].id} P[${i}][${j}]`).toBeLessThan(1e-12);
      }
    });
    for (const r of design.run.innovations) for (const v of r.ratio) expect(Math.abs(v - 1), r.sensorId).toBeLessThan(1e-9);
  });
});

// Gelb, Applied Optimal Estimation, 1974, ch. 4 and §7.2: the Kalman filter is the minimum-variance linear
// filter for its truth, so a filter with the wrong R has at least the optimal actual variance, and the
// truth sources' shares still sum to the actual total (the recursion is linear in P0, Q and R).
describe('3-D model: the filter trusts the GNSS 4 times too much (R / 16)', () => {
  let optimal: InertialBudget, design: InertialTruthVersusFilter;
  beforeAll(() => {
    optimal = runInertialBudget(shortRover());
    const filter = shortRover();
    const white = filter.aiding[0].rows[0];
    white.value.value /= 4;
    if (white.vertical) white.vertical.value /= 4;
    design = runInertialTruthVersusFilter(shortRover(), filter);
  }, 300_000);

  it('has an actual position variance at or above the optimum, above what the filter believes at the end', () => {
    const steps = optimal.run.steps;
    for (const p of [0, 1, 2]) {
      for (let k = 0; k < steps; k++) {
        expect(design.run.actual.totalRecorded[p][k], `P[${p}][${p}] step ${k}`).toBeGreaterThanOrEqual(optimal.run.recorded[p][k] * (1 - 1e-9));
      }
      expect(design.run.actual.totalRecorded[p][steps - 1]).toBeGreaterThan(design.run.believed.totalRecorded[p][steps - 1] * 1.1);
    }
    const gnss = design.run.innovations.find((r) => r.sensorId === 'gnss')!;
    expect(Math.max(...gnss.ratio)).toBeGreaterThan(1.5);
  });

  it('has truth shares that sum to the actual total at every step (1e-9 relative)', () => {
    const { actual } = design.run, steps = actual.steps;
    for (const p of [0, 1, 2, 6, 7, 8].map((i) => RECORDED_PAIRS.findIndex(([a, b]) => a === i && b === i))) {
      for (let k = 0; k < steps; k += 7) {
        let sum = 0;
        for (let s = 0; s < actual.sourceCount; s++) sum += actual.recorded[p][(s + 1) * steps + k];
        expect(Math.abs(sum - actual.recorded[p][k])).toBeLessThanOrEqual(1e-9 * actual.recorded[p][k]);
      }
    }
  });
});
