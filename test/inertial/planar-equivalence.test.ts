import { describe, expect, it } from 'vitest';
import { computeBudget } from '../../src/pipeline';
import { runInertialBudget } from '../../src/inertial/run-inertial';
import type { SourceInput } from '../../src/inputs/budget-input';
import type { ImuRowInput, InertialSegmentInput } from '../../src/inertial/inertial-input';
import { budget, gyro, q, wheel } from '../fixtures/small-budgets';
import { FLAT_EARTH, inertialBudget } from '../fixtures/small-inertial';

// docs/inertial-model.md §7: on a level mission the yaw error from a z-gyro alone is the planar
// model's heading error (docs/planar-model.md §3: dpsi' = bc + bbi + brw + ω sg + ng), exactly when
// Earth rotation is off and the transport rate vanishes (test-only Earth, radius 1e15 m).
const segments = [[60, 5, 0], [20, 5, 4.5], [40, 5, 0], [15, 5, -6], [30, 5, 0]];

const gyroRows: SourceInput[] = [
  { id: 'arw', kind: 'white-noise', value: q(0.2, 'deg/√h') },
  { id: 'bi', kind: 'bias-instability', value: q(5, 'deg/h'), correlationTime: q(150, 's') },
  { id: 'bias', kind: 'turn-on-bias', value: q(30, 'deg/h') },
  { id: 'sf', kind: 'scale-factor', value: q(1000, 'ppm') },
  { id: 'rrw', kind: 'rate-random-walk', value: q(2, 'deg/h/√h') },
];

describe('a level planar-equivalent mission', () => {
  it('gives the planar model\'s heading sigma as the inertial yaw sigma at every step (1e-9 relative)', () => {
    const planar = computeBudget(budget({
      start: { north: q(0, 'm'), east: q(0, 'm'), heading: q(30, 'deg') },
      initialSigma: { position: q(1, 'm'), heading: q(2, 'deg') },
      segments: segments.map(([d, v, w]) => ({ duration: q(d, 's'), speed: q(v, 'm/s'), turnRate: q(w, 'deg/s') })),
    }, [gyro(gyroRows), wheel([{ id: 'sf', kind: 'scale-factor', value: q(1, '%') }])], 0.1));
    const inertialSegments: InertialSegmentInput[] = segments.map(([d, v, w]) => ({ duration: q(d, 's'), speed: q(v, 'm/s'), turnRate: q(w, 'deg/s') }));
    const zRows: ImuRowInput[] = gyroRows.map((r) => ({ ...r, instrument: 'gyro', axis: 'z' }));
    const b = inertialBudget(inertialSegments, zRows, 0.1,
      { heading: (2 * Math.PI) / 180 });
    b.mission.start.heading = q(30, 'deg');
    const yaw = runInertialBudget(b, { earth: FLAT_EARTH, contributions: false }).series.yaw.sigma;
    const heading = planar.series.quantities.heading!.total;
    expect(yaw.length).toBe(heading.length);
    heading.forEach((v, k) => expect(Math.abs(yaw[k] / Math.sqrt(v) - 1), `step ${k}`).toBeLessThan(1e-9));
  });
});
