import { afterEach, describe, expect, it } from 'vitest';
import { allowGeneratedKernels } from '../../src/covariance/compiled-propagation';
import { computeBudget } from '../../src/pipeline';
import type { BudgetInput } from '../../src/inputs/budget-input';
import { scenarioR1, scenarioR2, scenarioWithStates } from '../fixtures/reference-scenarios';

/** A scenario with every duration scaled (the large models on a short mission keep the test quick). */
function shortened(b: BudgetInput, factor: number): BudgetInput {
  for (const seg of b.mission.segments) seg.duration.value *= factor;
  for (const s of b.sensors) for (const o of s.outages ?? []) { o.start.value *= factor; o.end.value *= factor; }
  return b;
}

/** Largest |a - b| / max(|a|, |b|) over two arrays (0 where both are 0). */
function largestRelativeDifference(a: ArrayLike<number>, b: ArrayLike<number>): number {
  let worst = 0;
  for (let i = 0; i < a.length; i++) {
    const scale = Math.max(Math.abs(a[i]), Math.abs(b[i]));
    if (scale > 0) worst = Math.max(worst, Math.abs(a[i] - b[i]) / scale);
  }
  return worst;
}

afterEach(() => allowGeneratedKernels(true));

describe('the optimised engine against the generic path', () => {
  // Common practice, no source: an optimisation must not change the answer beyond round-off.
  const models: [string, () => BudgetInput][] = [
    ['R1', scenarioR1],
    ['R2', scenarioR2],
    ['R2 at 23 states', () => shortened(scenarioWithStates(23), 0.05)],
    ['R2 at 33 states', () => shortened(scenarioWithStates(33), 0.03)],
    ['R2 at 45 states', () => shortened(scenarioWithStates(45), 0.02)],
  ];
  it.each(models)('%s: every series, share and final covariance agree to 1e-10 relative', (_, scenario) => {
    const fast = computeBudget(scenario());
    allowGeneratedKernels(false);
    const generic = computeBudget(scenario());
    expect(fast.model.states.length).toBe(generic.model.states.length);
    for (const [q, s] of Object.entries(generic.series.quantities)) {
      const f = fast.series.quantities[q as keyof typeof fast.series.quantities]!;
      expect(largestRelativeDifference(f.total, s!.total), q).toBeLessThanOrEqual(1e-10);
      s!.bySource.forEach((src, i) => expect(largestRelativeDifference(f.bySource[i], src), `${q} ${i}`).toBeLessThanOrEqual(1e-10));
    }
    expect(largestRelativeDifference(fast.history.finalCovariance, generic.history.finalCovariance)).toBeLessThanOrEqual(1e-10);
    expect(fast.requirements).toEqual(generic.requirements);
  }, 30_000);
});
