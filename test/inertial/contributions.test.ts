import { beforeAll, describe, expect, it } from 'vitest';
import { EigenvalueDecomposition, Matrix } from 'ml-matrix';
import { runInertialBudget, type InertialBudget } from '../../src/inertial/run-inertial';
import { roverScenario } from '../fixtures/inertial-scenarios';

// docs/planar-model.md §7 (Gelb, Applied Optimal Estimation, 1974, sec. 7.3): with the gains fixed
// from the full run the recursion is linear in (P0, Q, R), so the per-source P_s sum to P, and the
// Joseph form keeps every P_s symmetric positive semi-definite.
/** The rover scenario shortened to 109 s (ramps, a stop with ZUPT, a turn, an outage), so every aiding kind acts. */
function shortRover() {
  const b = roverScenario();
  b.mission.segments = b.mission.segments.slice(0, 8);
  b.mission.segments[1].duration.value = 20;
  b.mission.segments[3].duration.value = 20;
  b.mission.segments[7].duration.value = 19;
  b.aiding[0].outages = [{ id: 'outage', start: { value: 60, unit: 's' }, end: { value: 100, unit: 's' } }];
  return b;
}

describe('per-source contributions of the inertial model', () => {
  let run: InertialBudget;
  beforeAll(() => { run = runInertialBudget(shortRover()); }, 300_000);

  it('sum to the total of every output at every step (1e-9 relative)', () => {
    for (const s of Object.values(run.series)) {
      s.sigma.forEach((sigma, k) => {
        const sum = s.varianceBySource.reduce((a, v) => a + v[k], 0);
        expect(Math.abs(sum - sigma * sigma), `${s.id} at step ${k}`).toBeLessThanOrEqual(1e-9 * sigma * sigma + 1e-300);
      });
    }
  });

  it('keep every P_s positive semi-definite (eigenvalues above −1e-12 of the largest)', () => {
    const n = run.model.states.length;
    run.run.finalSourceCovariances.forEach((p, s) => {
      const m = new Matrix(Array.from({ length: n }, (_, i) => Array.from(p.subarray(i * n, (i + 1) * n))));
      const ev = new EigenvalueDecomposition(m, { assumeSymmetric: true }).realEigenvalues;
      const largest = Math.max(...ev.map(Math.abs));
      expect(Math.min(...ev), run.model.sources[s].id).toBeGreaterThanOrEqual(-1e-12 * largest);
    });
  });

  it('uses every aiding kind of the scenario (ZUPT while stopped, constraints and odometer while moving)', () => {
    expect(Object.keys(run.run.measurementCounts).sort()).toEqual(['gnss', 'nhc', 'odometer', 'zupt']);
    expect(run.run.issues).toEqual([]);
  });
});
