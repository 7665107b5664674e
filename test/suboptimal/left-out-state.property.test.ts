import { describe, it } from 'vitest';
import fc from 'fast-check';
import { computeBudget } from '../../src/pipeline';
import { computeFilterDesign } from '../../src/suboptimal/compute-filter-design';
import { budgetArb, makeBudget } from '../fixtures/random-budgets';

// The Kalman filter is the minimum-variance linear estimator for its model (Gelb, Applied Optimal Estimation,
// 1974, ch. 4; Maybeck, vol. 1, 1979, ch. 5): any other gain sequence on the same measurements, such as
// that of a filter leaving a state out, gives an actual error covariance at least as large, at every step
// and for every quantity (Gelb §7.2). And with the gains fixed, the actual error is linear in the truth's
// (P0, Q, R), so each truth row's share sums to the actual total (Gelb §7.3).
const STATE_KINDS = ['bias-instability', 'turn-on-bias', 'scale-factor', 'rate-random-walk', 'multipath'];

describe('a filter that leaves rows with states out', () => {
  it('is never better than the optimum, and the actual error\'s shares sum to its total (random budgets, seeded)', () => {
    fc.assert(
      fc.property(budgetArb, fc.array(fc.nat(), { minLength: 1, maxLength: 3 }), (p, picks) => {
        const input = makeBudget(p);
        // Rows that own states (a filter without a white-noise row would believe R = 0: a different defect).
        const rows = input.sensors.flatMap((s, i) => s.sources.flatMap((r, j) => (STATE_KINDS.includes(r.kind) ? [[i, j] as const] : [])));
        for (const pick of picks) {
          const [i, j] = rows[pick % rows.length];
          input.sensors[i].sources[j] = { ...input.sensors[i].sources[j], tuning: { leftOut: true } };
        }
        const base = computeBudget(input);
        const design = computeFilterDesign(input, base);
        for (const [name, optimal] of Object.entries(base.series.quantities)) {
          const actual = design.actual.series.quantities[name as keyof typeof base.series.quantities]!;
          optimal!.total.forEach((v, k) => {
            if (actual.total[k] < v * (1 - 1e-9) - 1e-300) throw new Error(`${name} at step ${k}: actual ${actual.total[k]} below the optimum ${v}`);
            const sum = actual.bySource.reduce((a, s) => a + s[k], 0);
            if (Math.abs(sum - actual.total[k]) > 1e-9 * Math.max(actual.total[k], 1e-300)) throw new Error(`${name} at step ${k}: shares sum to ${sum}, total ${actual.total[k]}`);
          });
        }
      }),
      { seed: 20261202, numRuns: 25 },
    );
  }, 120_000);
});
