import { describe, it } from 'vitest';
import fc from 'fast-check';
import { runInertialBudget } from '../../src/inertial/run-inertial';
import type { AidingInput, ImuRowInput, InertialBudgetInput } from '../../src/inertial/inertial-input';
import { q } from '../fixtures/small-budgets';

// Sub-normal magnitudes (5e-324) are refused as implausible inputs (src/inputs/plausible-range.ts): read them as zero.
const double = (c: Parameters<typeof fc.double>[0]) => fc.double(c).map((v) => (Math.abs(v) < 1e-100 ? 0 : v));

// docs/planar-model.md §9: for an optimal filter the covariance never decreases when a noise
// magnitude grows (the Riccati map is monotone in P0, Q and R; Anderson & Moore, Optimal
// Filtering, 1979, from memory), to round-off. Extended here to the 3-D model.
const mag = (max: number) => double({ min: 0, max, noNaN: true });

const arb = fc.record({
  ground: fc.boolean(),
  segments: fc.array(fc.record({ duration: double({ min: 3, max: 12, noNaN: true }), speed: double({ min: 0, max: 8, noNaN: true }),
    turn: double({ min: -10, max: 10, noNaN: true }), up: double({ min: -1, max: 1, noNaN: true }) }), { minLength: 1, maxLength: 3 }),
  gyro: fc.tuple(mag(0.5), mag(10), mag(50), mag(3000), mag(5), mag(20)),
  accel: fc.tuple(mag(0.1), mag(100), mag(3), mag(1000)),
  gnss: fc.option(fc.tuple(double({ min: 0.3, max: 3, noNaN: true }), mag(1), fc.boolean(), double({ min: 0, max: 0.8, noNaN: true }))),
  others: fc.tuple(fc.boolean(), fc.boolean(), fc.boolean(), fc.boolean()),
  pick: fc.nat(),
  factor: double({ min: 1.1, max: 3, noNaN: true }),
});
type Params = typeof arb extends fc.Arbitrary<infer T> ? T : never;

function makeBudget(p: Params): InertialBudgetInput {
  const [arw, bi, bias, sf, rrw, biz] = p.gyro, [vrw, abi, abias, asf] = p.accel;
  const g = (id: string, kind: ImuRowInput['kind'], value: number, unit: string, extra: Partial<ImuRowInput> = {}): ImuRowInput =>
    ({ id, instrument: 'gyro', kind, value: q(value, unit), ...extra });
  const a = (id: string, kind: ImuRowInput['kind'], value: number, unit: string, extra: Partial<ImuRowInput> = {}): ImuRowInput =>
    ({ id, instrument: 'accelerometer', kind, value: q(value, unit), ...extra });
  const durationS = p.segments.reduce((s, x) => s + x.duration, 0);
  const aiding: AidingInput[] = [];
  if (p.gnss) {
    const [white, mp, states, outage] = p.gnss;
    aiding.push({ id: 'gnss', kind: 'gnss-position', rate: q(1, 'Hz'), leverArm: { x: q(0.3, 'm'), y: q(0, 'm'), z: q(-0.4, 'm') },
      outages: [{ start: q(outage * durationS, 's'), end: q((outage + 0.2) * durationS, 's') }],
      rows: [{ id: 'white', kind: 'white-noise', value: q(white, 'm'), vertical: q(2 * white, 'm') },
        { id: 'mp', kind: 'multipath', value: q(mp, 'm'), correlationTime: q(30, 's'), multipathModel: states ? 'states' : 'folded' }] });
  }
  const [vel, baro, heading, ground] = p.others;
  if (vel) aiding.push({ id: 'vel', kind: 'gnss-velocity', rate: q(2, 'Hz'), rows: [{ id: 'white', kind: 'white-noise', value: q(0.1, 'm/s') }] });
  if (baro) aiding.push({ id: 'baro', kind: 'barometer', rate: q(2, 'Hz'), rows: [{ id: 'white', kind: 'white-noise', value: q(0.5, 'm') }, { id: 'bias', kind: 'turn-on-bias', value: q(2, 'm') }] });
  if (heading) aiding.push({ id: 'hdg', kind: 'heading-aid', rate: q(2, 'Hz'), rows: [{ id: 'white', kind: 'white-noise', value: q(2, 'deg') }, { id: 'bias', kind: 'turn-on-bias', value: q(1, 'deg') }] });
  if (ground) {
    aiding.push({ id: 'odo', kind: 'odometer', rate: q(2, 'Hz'), rows: [{ id: 'white', kind: 'white-noise', value: q(0.05, 'm/s') }, { id: 'sf', kind: 'scale-factor', value: q(1, '%') }] });
    aiding.push({ id: 'nhc', kind: 'motion-constraint', rate: q(2, 'Hz'), rows: [{ id: 'white', kind: 'white-noise', value: q(0.1, 'm/s') }] });
    aiding.push({ id: 'zupt', kind: 'zero-velocity', rate: q(2, 'Hz'), rows: [{ id: 'white', kind: 'white-noise', value: q(0.01, 'm/s') }] });
  }
  return {
    step: q(0.5, 's'),
    mission: {
      start: { north: q(0, 'm'), east: q(0, 'm'), heading: q(20, 'deg'), latitude: q(40, 'deg'), height: q(100, 'm') },
      attitudeRule: p.ground ? 'ground' : 'level',
      initialSigma: { horizontalPosition: q(1, 'm'), verticalPosition: q(2, 'm'), horizontalVelocity: q(0.1, 'm/s'),
        verticalVelocity: q(0.1, 'm/s'), tilt: q(0.5, 'deg'), heading: q(2, 'deg') },
      // Under the ground rule a slope needs forward speed: at most 45° here.
      segments: p.segments.map((s) => ({ duration: q(s.duration, 's'), speed: q(s.speed, 'm/s'), turnRate: q(s.turn, 'deg/s'),
        verticalSpeed: q(p.ground ? Math.max(-s.speed, Math.min(s.speed, s.up)) : s.up, 'm/s') })),
    },
    imu: { id: 'imu', rate: q(100, 'Hz'), rows: [
      g('arw', 'white-noise', arw, 'deg/√h'), g('bi', 'bias-instability', bi, 'deg/h', { correlationTime: q(100, 's') }),
      g('biz', 'bias-instability', biz, 'deg/h', { correlationTime: q(50, 's'), axis: 'z' }), g('bias', 'turn-on-bias', bias, 'deg/h'),
      g('sf', 'scale-factor', sf, 'ppm'), g('rrw', 'rate-random-walk', rrw, 'deg/h/√h'),
      a('vrw', 'white-noise', vrw, 'm/s/√h'), a('bi', 'bias-instability', abi, 'µg', { correlationTime: q(200, 's') }) as ImuRowInput,
      a('abias', 'turn-on-bias', abias, 'mg'), a('asf', 'scale-factor', asf, 'ppm'),
    ].map((r, i) => ({ ...r, id: `${r.id}${i}` })) },
    aiding,
  };
}

describe('raising a noise magnitude in a 3-D budget', () => {
  it('never lowers any output sigma at any step (random budgets, seeded)', () => {
    fc.assert(
      fc.property(arb, (p) => {
        const before = makeBudget(p);
        const rows: { value: { value: number } }[] = [...before.imu.rows, ...before.aiding.flatMap((s) => s.rows)];
        const after: InertialBudgetInput = JSON.parse(JSON.stringify(before));
        const afterRows: { value: { value: number }; id: string }[] = [...after.imu.rows, ...after.aiding.flatMap((s) => s.rows)];
        const picked = afterRows[p.pick % rows.length];
        picked.value.value *= p.factor;
        const a = runInertialBudget(before, { contributions: false }), b = runInertialBudget(after, { contributions: false });
        for (const [id, s] of Object.entries(a.series)) {
          s.sigma.forEach((v, k) => {
            const grown = b.series[id].sigma[k];
            if (grown < v * (1 - 1e-10) - 1e-150) throw new Error(`${id} fell at step ${k} when ${picked.id} grew: ${v} -> ${grown}`);
          });
        }
      }),
      { seed: 20261202, numRuns: 25 },
    );
  }, 600_000);
});
