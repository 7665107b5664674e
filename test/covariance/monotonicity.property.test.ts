import { describe, it } from 'vitest';
import fc from 'fast-check';
import { computeBudget } from '../../src/pipeline';
import type { BudgetInput } from '../../src/inputs/budget-input';
import { budgetArb, makeBudget } from '../fixtures/random-budgets';


// docs/planar-model.md §9: for an optimal filter the covariance never decreases when a noise magnitude grows
// (the Riccati map is monotone in P0, Q and R; Anderson & Moore, Optimal Filtering, 1979, from memory),
// to round-off: 1e-12 relative is allowed there.
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
