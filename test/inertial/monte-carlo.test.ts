import { describe, expect, it } from 'vitest';
import { inertialSimulation } from '../../src/inertial/monte-carlo/inertial-simulation';
import { rotationFromVector, vectorFromRotation } from '../../src/inertial/monte-carlo/rotation3';
import type { InertialBudgetInput } from '../../src/inertial/inertial-input';
import { blockCount, reduceNodes } from '../../src/simulation/block-tree';
import { runBlocks } from '../../src/simulation/run-blocks';
import { findFlags } from '../../src/simulation/study-flags';
import { BAND_TAIL, studyStatistics } from '../../src/simulation/study-statistics';
import { imuRow, inertialBudget } from '../fixtures/small-inertial';
import { q } from '../fixtures/small-budgets';
import { jstatChiSquareInv } from '../simulation/chi-square-reference';

/**
 * A linear-enough 3-D case (invented, not demo data): a level vehicle at 5 m/s, straight then a gentle turn,
 * a tactical-grade IMU (small biases and noise), GNSS position at 1 Hz with 1 m noise and a 40 s outage,
 * small initial errors: attitude errors stay near a milliradian, so the linearisation holds.
 */
function linearCase(): InertialBudgetInput {
  const b = inertialBudget(
    [
      { duration: q(80, 's'), speed: q(5, 'm/s'), turnRate: q(0, 'deg/s') },
      { duration: q(60, 's'), speed: q(5, 'm/s'), turnRate: q(1.5, 'deg/s') },
      { duration: q(60, 's'), speed: q(5, 'm/s'), turnRate: q(0, 'deg/s') },
    ],
    [
      imuRow('accelerometer', 'turn-on-bias', 0.5, 'mg'), imuRow('gyro', 'turn-on-bias', 5, 'deg/h'),
      imuRow('accelerometer', 'white-noise', 0.05, 'm/s/√h'), imuRow('gyro', 'white-noise', 0.1, 'deg/√h'),
    ],
    1,
    { horizontalPosition: 1, verticalPosition: 1, horizontalVelocity: 0.05, verticalVelocity: 0.05, tilt: 1e-3, heading: 0.005 },
  );
  b.aiding = [{
    id: 'gnss', kind: 'gnss-position', rate: q(1, 'Hz'), outages: [{ id: 'canopy', start: q(120, 's'), end: q(160, 's') }],
    rows: [{ id: 'white', kind: 'white-noise', value: q(1, 'm'), vertical: q(1.5, 'm') }],
  }];
  return b;
}

describe('3-D Monte Carlo check (truth by nonlinear error propagation, EKF about its own solution)', () => {
  it('rotation vector and rotation matrix are inverse maps (Rodrigues; a rotation of 1 rad about (1, 2, 2)/3)', () => {
    // exp of φ = (1/3, 2/3, 2/3) rad has trace 1 + 2 cos 1 (Groves 2013, §2.2.1, from memory).
    const r = rotationFromVector(1 / 3, 2 / 3, 2 / 3, new Float64Array(9));
    expect(r[0] + r[4] + r[8]).toBeCloseTo(1 + 2 * Math.cos(1), 14);
    const back = vectorFromRotation(r, new Float64Array(3));
    [1 / 3, 2 / 3, 2 / 3].forEach((v, i) => expect(back[i]).toBeCloseTo(v, 13));
  });

  it('a linear-enough case, 256 seeded runs: RMS within the χ² band of the covariance σ and NEES within its bounds', () => {
    // Bar-Shalom, Li and Kirubarajan 2001, §5.4.2: N·RMS²/σ² ~ χ²(N), N·(average NEES) ~ χ²(N·n).
    const model = inertialSimulation(linearCase());
    const runs = 256;
    const sums = reduceNodes(runBlocks(model, { seed: 2026, runs, firstBlock: 0, endBlock: blockCount(runs) }), blockCount(runs));
    const stats = studyStatistics(model, sums);
    expect(findFlags(stats, model.outages).map((f) => f.text)).toEqual([]);
    const steps = stats.tS.length, N = stats.runs;
    // Two-sided bounds holding at every step at once (Bonferroni over the steps), from jstat.
    const lowF = Math.sqrt(jstatChiSquareInv(BAND_TAIL / 2 / steps, N) / N), highF = Math.sqrt(jstatChiSquareInv(1 - BAND_TAIL / 2 / steps, N) / N);
    for (const qs of stats.quantities) {
      for (let k = 1; k < steps; k++) {
        expect(qs.rms[k], `${qs.id} at ${stats.tS[k]} s`).toBeGreaterThanOrEqual(qs.budgetSigma[k] * lowF);
        expect(qs.rms[k], `${qs.id} at ${stats.tS[k]} s`).toBeLessThanOrEqual(qs.budgetSigma[k] * highF);
        // The filter's own σ (about its own solution) is the budget's (about the nominal path) within 2 %.
        expect(Math.abs(qs.filterSigma[k] / qs.budgetSigma[k] - 1), `${qs.id} filter σ at ${stats.tS[k]} s`).toBeLessThan(0.02);
      }
    }
    for (const g of stats.nees) {
      for (let k = 0; k < steps; k++) {
        const dofTotal = g.dof[k] * N;
        expect(g.average[k], `${g.id} NEES at ${stats.tS[k]} s`).toBeGreaterThanOrEqual(jstatChiSquareInv(BAND_TAIL / 2 / steps, dofTotal) / N);
        expect(g.average[k], `${g.id} NEES at ${stats.tS[k]} s`).toBeLessThanOrEqual(jstatChiSquareInv(1 - BAND_TAIL / 2 / steps, dofTotal) / N);
      }
    }
  }, 300_000);

  it('simulate reaches the 3-D model through the dispatch hook when a loaded budget carries a 3-D input', async () => {
    const { simulationModelFor } = await import('../../src/cli/simulation-model');
    const { InertialSimulation } = await import('../../src/inertial/monte-carlo/inertial-simulation');
    const loaded = { inertialInput: linearCase() } as unknown as Parameters<typeof simulationModelFor>[0];
    const model = simulationModelFor(loaded);
    expect(model).toBeInstanceOf(InertialSimulation);
    expect(model.quantities.map((x) => x.id)).toContain('yaw');
  });
});

