import { describe, expect, it } from 'vitest';
import { discretiseVanLoan } from '../../src/covariance/van-loan';
import { discretiseInertialStep } from '../../src/inertial/inertial-discretisation';
import { inertialDynamics, noiseColumn } from '../../src/inertial/inertial-dynamics';
import { resolveInertialMission } from '../../src/inertial/inertial-mission';
import { buildInertialTrajectory } from '../../src/inertial/inertial-trajectory';
import { buildInertialModel } from '../../src/inertial/build-inertial-model';
import { runInertialBudget } from '../../src/inertial/run-inertial';
import { droneScenario, roverScenario } from '../fixtures/inertial-scenarios';

describe('inertial discretisation', () => {
  it('gives each source the Q_d of Van Loan\'s method inside a banked turn (1e-12 of the largest entry)', () => {
    // C. F. Van Loan, IEEE Trans. Automatic Control 23(3), 1978 (../../src/covariance/van-loan.ts).
    const input = droneScenario();
    input.mission.attitudeRule = 'banked';
    input.mission.segments = input.mission.segments.slice(1, 5); // the banked rule refuses the drone's vertical climb and descent
    for (const a of input.aiding) a.outages = [];
    input.mission.segments[2].verticalSpeed = { value: 1.5, unit: 'm/s' }; // climbing in the turn: pitch and roll both non-zero
    const mission = resolveInertialMission(input.mission);
    const rows = buildInertialTrajectory(mission, 0.1);
    const model = buildInertialModel(input, mission);
    const row = rows[Math.round(123 / 0.1)]; // inside the 15 deg/s turn, rolled and accelerating sideways
    expect(Math.abs(row.rollRad)).toBeGreaterThan(0.1);
    expect(Math.abs(row.pitchRad)).toBeGreaterThan(0.1);
    const d = discretiseInertialStep(model, row, 0.1);
    const n = model.states.length;
    const f = inertialDynamics(model, row);
    model.sources.forEach((src, s) => {
      if (src.noise.length === 0) return;
      const gqg = new Float64Array(n * n);
      for (const noise of src.noise) {
        const g = noiseColumn(model, noise, row);
        for (let i = 0; i < n; i++) for (let j = 0; j < n; j++) gqg[i * n + j] += noise.psdSI * g[i] * g[j];
      }
      const expected = discretiseVanLoan(f, gqg, n, 0.1).qd;
      const actual = new Float64Array(n * n);
      d.qdBySource[s].index.forEach((e, p) => (actual[e] = d.qdBySource[s].val[p]));
      const scale = Math.max(...expected.map(Math.abs));
      expected.forEach((x, e) => expect(Math.abs(actual[e] - x), `${src.id} entry ${e}`).toBeLessThanOrEqual(1e-12 * scale));
    });
  });

  it.each([['drone', droneScenario, [300, 344.9, 600]], ['rover', roverScenario, [430, 549.9, 900]]] as const)(
    'holding F over straight segments changes the %s reference values by less than 1e-4 (docs/inertial-model.md §10)',
    (_name, scenario, times) => {
      const held = runInertialBudget(scenario(), { contributions: false });
      const exact = runInertialBudget(scenario(), { contributions: false, everyStep: true });
      for (const t of times) {
        const k = Math.round(t / 0.1);
        for (const [id, s] of Object.entries(held.series)) {
          expect(Math.abs(s.sigma[k] / exact.series[id].sigma[k] - 1), `${id} at ${t} s`).toBeLessThan(1e-4);
        }
      }
    }, 600_000);
});
