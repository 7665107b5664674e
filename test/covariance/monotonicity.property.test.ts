import { describe, it } from 'vitest';
import fc from 'fast-check';
import { computeBudget } from '../../src/pipeline';
import type { BudgetInput, SensorInput, SourceInput } from '../../src/inputs/budget-input';

// docs/planar-model.md §9: for an optimal filter the covariance never decreases when a noise magnitude grows
// (the Riccati map is monotone in P0, Q and R; Anderson & Moore, Optimal Filtering, 1979, from memory),
// to round-off: 1e-12 relative is allowed there.
const q = (value: number, unit: string) => ({ value, unit });
const row = (id: string, kind: SourceInput['kind'], value: number, unit: string, extra: Partial<SourceInput> = {}): SourceInput =>
  ({ id, kind, value: q(value, unit), ...extra });

const segmentArb = fc.record({
  duration: fc.double({ min: 5, max: 30, noNaN: true }),
  speed: fc.double({ min: 0, max: 8, noNaN: true }),
  turn: fc.double({ min: -6, max: 6, noNaN: true }),
});

const budgetArb = fc.record({
  segments: fc.array(segmentArb, { minLength: 1, maxLength: 3 }),
  gyro: fc.tuple(
    fc.double({ min: 0, max: 1, noNaN: true }), fc.double({ min: 0, max: 20, noNaN: true }), fc.double({ min: 20, max: 300, noNaN: true }),
    fc.double({ min: 0, max: 50, noNaN: true }), fc.double({ min: 0, max: 5000, noNaN: true }), fc.double({ min: 0, max: 5, noNaN: true }),
    fc.double({ min: 0, max: 0.01, noNaN: true }),
  ),
  wheel: fc.tuple(fc.double({ min: 0, max: 3, noNaN: true }), fc.double({ min: 0, max: 0.1, noNaN: true })),
  gnss: fc.option(fc.tuple(fc.double({ min: 0.3, max: 3, noNaN: true }), fc.double({ min: 0, max: 1, noNaN: true }), fc.boolean(), fc.double({ min: 0, max: 0.9, noNaN: true }))),
  compass: fc.option(fc.tuple(fc.double({ min: 0.5, max: 5, noNaN: true }), fc.double({ min: 0, max: 2, noNaN: true }))),
  landmarkBearingDeg: fc.option(fc.double({ min: 0, max: 360, noNaN: true })),
  initial: fc.tuple(fc.double({ min: 0, max: 3, noNaN: true }), fc.double({ min: 0, max: 3, noNaN: true })),
  pick: fc.nat(),
  factor: fc.double({ min: 1.1, max: 3, noNaN: true }),
});

type Params = typeof budgetArb extends fc.Arbitrary<infer T> ? T : never;

function makeBudget(p: Params): BudgetInput {
  const [arw, bi, biT, bias, sf, rrw, lsb] = p.gyro;
  const sensors: SensorInput[] = [
    { id: 'gyro', kind: 'yaw-gyro', rate: q(100, 'Hz'), sources: [
      row('arw', 'white-noise', arw, 'deg/√h'), row('bi', 'bias-instability', bi, 'deg/h', { correlationTime: q(biT, 's') }),
      row('bias', 'turn-on-bias', bias, 'deg/h'), row('sf', 'scale-factor', sf, 'ppm'), row('rrw', 'rate-random-walk', rrw, 'deg/h/√h'),
      row('lsb', 'quantisation', lsb, 'deg/s'),
    ] },
    { id: 'wheel', kind: 'wheel-speed', rate: q(10, 'Hz'), sources: [row('sf', 'scale-factor', p.wheel[0], '%'), row('white', 'white-noise', p.wheel[1], 'm/s')] },
  ];
  const durationS = p.segments.reduce((a, s) => a + s.duration, 0);
  if (p.gnss) {
    const [white, mp, states, outageStart] = p.gnss;
    sensors.push({ id: 'gnss', kind: 'gnss-position', rate: q(1, 'Hz'),
      outages: [{ start: q(outageStart * durationS, 's'), end: q(Math.min(durationS, (outageStart + 0.1) * durationS), 's') }],
      sources: [row('white', 'white-noise', white, 'm'), row('mp', 'multipath', mp, 'm', { correlationTime: q(60, 's'), multipathModel: states ? 'states' : 'folded' })] });
  }
  if (p.compass) sensors.push({ id: 'compass', kind: 'compass', rate: q(2, 'Hz'), sources: [row('white', 'white-noise', p.compass[0], 'deg'), row('bias', 'turn-on-bias', p.compass[1], 'deg')] });
  if (p.landmarkBearingDeg !== null) {
    const b = (p.landmarkBearingDeg * Math.PI) / 180; // 300 m beyond the farthest reach of the path
    sensors.push({ id: 'radar', kind: 'range-bearing', rate: q(1, 'Hz'), maxRange: q(2000, 'm'),
      landmarks: [{ id: 'post', north: q(1000 * Math.cos(b), 'm'), east: q(1000 * Math.sin(b), 'm') }],
      sources: [row('range', 'white-noise', 0.5, 'm'), row('bearing', 'white-noise', 1, 'deg'), row('rbias', 'turn-on-bias', 0.2, 'm')] });
  }
  return {
    step: q(0.5, 's'),
    mission: {
      start: { north: q(0, 'm'), east: q(0, 'm'), heading: q(10, 'deg') },
      initialSigma: { position: q(p.initial[0], 'm'), heading: q(p.initial[1], 'deg') },
      segments: p.segments.map((s) => ({ duration: q(s.duration, 's'), speed: q(s.speed, 'm/s'), turnRate: q(s.turn, 'deg/s') })),
    },
    sensors,
  };
}

describe('raising a noise magnitude', () => {
  it('never lowers any output sigma at any step (random budgets, seeded)', () => {
    fc.assert(
      fc.property(budgetArb, (p) => {
        const before = makeBudget(p);
        const rows = before.sensors.flatMap((s, i) => s.sources.map((_r, j) => [i, j] as const));
        const [si, rj] = rows[p.pick % rows.length];
        const after: BudgetInput = JSON.parse(JSON.stringify(before));
        after.sensors[si].sources[rj].value.value *= p.factor;
        const a = computeBudget(before).series, b = computeBudget(after).series;
        for (const [name, s] of Object.entries(a.quantities)) {
          const grown = b.quantities[name as keyof typeof a.quantities]!.total;
          s!.total.forEach((v, k) => {
            if (grown[k] < v * (1 - 1e-12) - 1e-300) throw new Error(`${name} fell at step ${k} when ${before.sensors[si].id}.${before.sensors[si].sources[rj].id} grew: ${v} -> ${grown[k]}`);
          });
        }
      }),
      { seed: 20261201, numRuns: 60 },
    );
  });
});
