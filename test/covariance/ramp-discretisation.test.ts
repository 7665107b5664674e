import { describe, expect, it } from 'vitest';
import { RampDiscretiser } from '../../src/covariance/ramp-discretisation';
import { discretiseStep } from '../../src/covariance/discretise-step';
import { reachability } from '../../src/covariance/sparse-rows';
import { resolveMission } from '../../src/mission/resolve-mission';
import { buildErrorModel } from '../../src/sensors/build-error-model';
import { scenarioR2 } from '../fixtures/reference-scenarios';

describe('discretisation on a speed ramp', () => {
  it('interpolates Φ and every Q_d in speed to within 1e-12 of the direct discretisation', () => {
    const input = scenarioR2();
    const mission = resolveMission(input.mission);
    const model = buildErrorModel(input.sensors, mission);
    const seg = { label: 'ramp', startS: 0, endS: 30, speedStartMps: 0, speedEndMps: 6, turnRateRadps: 0.05 };
    const ramp = new RampDiscretiser(model, seg, 0.1);
    const pattern = reachability(model.dynamics(6, 0.05), model.states.length);
    for (const v of [0.01, 1.234, 3, 5.999]) {
      const direct = discretiseStep(model, v, 0.05, 0.1, 'van-loan', pattern);
      const got = ramp.at(v);
      const close = (a: Float64Array, b: Float64Array, what: string) => {
        const scale = Math.max(...Array.from(b, Math.abs));
        a.forEach((x, i) => expect(Math.abs(x - b[i]), `${what} at ${v} m/s`).toBeLessThanOrEqual(1e-12 * scale));
      };
      close(got.phi.val, direct.phi.val, 'Φ');
      got.qdBySource.forEach((q, s) => q.val.length && close(q.val, direct.qdBySource[s].val, `Q_d of ${model.sources[s].id}`));
    }
  });
});
