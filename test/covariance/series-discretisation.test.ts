import { describe, expect, it } from 'vitest';
import { discretiseBySeries } from '../../src/covariance/series-discretisation';
import { discretiseVanLoan } from '../../src/covariance/van-loan';
import { seededRandom } from '../fixtures/seeded-random';

function maxRelativeDifference(a: Float64Array, b: Float64Array): number {
  const scale = Math.max(...Array.from(b, Math.abs));
  return Math.max(...Array.from(a, (x, i) => Math.abs(x - b[i]))) / scale;
}

describe('discretisation by power series', () => {
  it('reproduces the CWNA closed form q [[T³/3, T²/2], [T²/2, T]] (Bar-Shalom, Li & Kirubarajan 2001, §6.2.2)', () => {
    const { phi, unitQd } = discretiseBySeries(Float64Array.from([0, 1, 0, 0]), 2, 0.1, [1]);
    [1, 0.1, 0, 1].forEach((x, i) => expect(phi[i]).toBeCloseTo(x, 15));
    const expected = [0.001 / 3, 0.005, 0.005, 0.1];
    unitQd[0].forEach((v, i) => expect(Math.abs(v / expected[i] - 1)).toBeLessThan(1e-14));
  });

  it('agrees with Van Loan for random dynamics of the planar model size, halving long steps', () => {
    const random = seededRandom(11);
    for (const [n, scale, dt] of [[6, 0.3, 0.1], [11, 1, 0.1], [11, 5, 1], [13, 0.05, 2]] as const) {
      const f = Float64Array.from({ length: n * n }, () => (random() < 0.3 ? scale * (2 * random() - 1) : 0));
      const series = discretiseBySeries(f, n, dt, [0, n - 1]);
      expect(maxRelativeDifference(series.phi, discretiseVanLoan(f, new Float64Array(n * n), n, dt).phi), `Φ n=${n}`).toBeLessThan(1e-12);
      [0, n - 1].forEach((c, i) => {
        const g = new Float64Array(n * n);
        g[c * n + c] = 1;
        expect(maxRelativeDifference(series.unitQd[i], discretiseVanLoan(f, g, n, dt).qd), `Q_d n=${n} c=${c}`).toBeLessThan(1e-12);
      });
    }
  });
});
