import { describe, expect, it } from 'vitest';
import { loadBudget } from '../../src/cli/load-budget';
import { computeBudget } from '../../src/pipeline';
import { DeadReckoningRun } from '../../src/simulation/dead-reckoning-run';
import { planPlanarRuns } from '../../src/simulation/planar-plan';
import { RunRandom } from '../../src/simulation/run-random';
import { fileURLToPath } from 'node:url';

/** The orchard rover (four rows, three headland turns) with every error set to zero. */
function errorFreeOrchard() {
  const input = structuredClone(loadBudget(fileURLToPath(new URL('../../budgets/orchard-rover.json', import.meta.url))).sheet.input!);
  for (const s of input.sensors) for (const row of s.sources) if (row.kind !== 'quantisation') row.value.value = 0;
  for (const s of input.sensors) s.sources = s.sources.filter((r) => r.kind !== 'quantisation');
  // Dead reckoning alone: an aiding sensor with zero noise (R = 0) is refused, and aiding does not move the dead-reckoned path.
  input.sensors = input.sensors.filter((s) => s.kind === 'yaw-gyro' || s.kind === 'wheel-speed');
  input.requirements = [];
  input.mission.initialSigma = { position: { value: 0, unit: 'm' }, heading: { value: 0, unit: 'deg' } };
  const budget = computeBudget(input, { contributions: false });
  return planPlanarRuns(budget.model, budget.mission, budget.trajectory);
}

describe('dead reckoning of the simulation', () => {
  it('follows the nominal path through the turns when every error is zero (midpoint rule, error (ωΔt)²/24 of the distance)', () => {
    // Closed form of the path: arcs of constant turn rate (src/mission/nominal-trajectory.ts, itself checked against the reference scenarios).
    const plan = errorFreeOrchard();
    const dr = new DeadReckoningRun(plan);
    const rng = RunRandom.forRun(1, 0);
    dr.start(rng, { northM: 0, eastM: 0, headingRad: 0 });
    const t = plan.trajectory;
    let worstM = 0, worstRad = 0;
    for (let k = 1; k < t.tS.length; k++) {
      dr.advanceTo(t.tS[k], rng);
      worstM = Math.max(worstM, Math.hypot(dr.northM - t.northM[k], dr.eastM - t.eastM[k]));
      worstRad = Math.max(worstRad, Math.abs(dr.headingRad - t.headingRad[k]));
    }
    // 480 m driven; (ωΔt)²/24 with ω = 11.25 deg/s and Δt = 5 ms is 4e-8: allow 1e-5 m for round-off over 90,000 samples.
    expect(worstM).toBeLessThan(1e-5);
    expect(worstRad).toBeLessThan(1e-9);
    expect(Math.hypot(t.northM[t.tS.length - 1], t.eastM[t.tS.length - 1])).toBeGreaterThan(10);
  }, 120_000);
});
