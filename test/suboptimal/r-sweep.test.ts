import { describe, expect, it } from 'vitest';
import { computeBudget } from '../../src/pipeline';
import { sweepFilterR } from '../../src/suboptimal/r-sweep';
import { budget, gyro, q, wheel } from '../fixtures/small-budgets';

// Gelb, Applied Optimal Estimation, 1974, ch. 4 and §7.2: the Kalman filter tuned to the truth is the
// minimum-variance linear filter, so scaling its R either way can only raise the actual error; the filter's
// own (believed) variance grows monotonically with its R (the Riccati map is monotone, from memory).
describe('the R sweep of a filter otherwise equal to the truth', () => {
  const input = budget({
    start: { north: q(0, 'm'), east: q(0, 'm'), heading: q(30, 'deg') },
    initialSigma: { position: q(2, 'm'), heading: q(3, 'deg') },
    segments: [{ duration: q(60, 's'), speed: q(3, 'm/s'), turnRate: q(0, 'deg/s') }, { duration: q(40, 's'), speed: q(3, 'm/s'), turnRate: q(2, 'deg/s') }],
  }, [
    gyro([{ id: 'arw', kind: 'white-noise', value: q(0.5, 'deg/√h') }, { id: 'bias', kind: 'turn-on-bias', value: q(30, 'deg/h') }]),
    wheel([{ id: 'sf', kind: 'scale-factor', value: q(1, '%') }]),
    { id: 'gnss', kind: 'gnss-position', rate: q(1, 'Hz'), outages: [{ start: q(50, 's'), end: q(80, 's') }], sources: [{ id: 'white', kind: 'white-noise', value: q(1.5, 'm') }] },
  ], 0.5, {
    requirements: [
      { id: 'pos', quantity: 'horizontal', level: '95%', limit: q(10, 'm') },
      { id: 'head', quantity: 'heading', level: '2sigma', limit: q(5, 'deg') },
    ],
  });
  const base = computeBudget(input);
  const sweep = sweepFilterR(input, base, 'gnss', [0.1, 0.3, 0.7, 1, 1.5, 3, 10]);

  it('has its smallest actual worst value at the truth (×1) for every requirement', () => {
    expect(sweep.bestFactor).toEqual({ pos: 1, head: 1 });
    const one = sweep.points.find((p) => p.factor === 1)!;
    for (const p of sweep.points) p.values.forEach((v, j) => expect(v.actualWorst).toBeGreaterThanOrEqual(one.values[j].actualWorst * (1 - 1e-12)));
    // and the position requirement really pays for a wrong R, both ways
    expect(sweep.points[0].values[0].actualWorst).toBeGreaterThan(one.values[0].actualWorst * 1.01);
    expect(sweep.points.at(-1)!.values[0].actualWorst).toBeGreaterThan(one.values[0].actualWorst * 1.01);
  });

  it('gives actual = believed at ×1, and a believed worst that grows with R', () => {
    const one = sweep.points.find((p) => p.factor === 1)!;
    for (const v of one.values) expect(v.actualWorst / v.believedWorst - 1).toBeLessThan(1e-12);
    for (let i = 1; i < sweep.points.length; i++) {
      sweep.points[i].values.forEach((v, j) => expect(v.believedWorst).toBeGreaterThanOrEqual(sweep.points[i - 1].values[j].believedWorst * (1 - 1e-12)));
    }
  });

  it('refuses a sensor that gives the filter no R, naming the option', () => {
    expect(() => sweepFilterR(input, base, 'gyro')).toThrow(/--sensor: "gyro" gives the filter no R to scale; aiding sensors with R here: gnss/);
  });
});
