import { describe, expect, it } from 'vitest';
import { computeBudget } from '../../src/pipeline';
import { MAX_RECORDED_ENTRIES, planRecording, recordingStride } from '../../src/covariance/record-plan';
import type { BudgetInput } from '../../src/inputs/budget-input';
import { scenarioR2 } from '../fixtures/reference-scenarios';

const q = (value: number, unit: string) => ({ value, unit });

/** R2 with requirements that break during its GNSS outages and checkpoints off the stride. */
function r2WithRequirements(): BudgetInput {
  const b = scenarioR2();
  b.requirements = [
    { id: 'pos95', quantity: 'horizontal', level: '95%', limit: q(1.8, 'm') },
    { id: 'cep', quantity: 'horizontal', level: '50%', limit: q(0.8, 'm') },
    { id: 'hdg', quantity: 'heading', level: '2sigma', limit: q(0.38, 'deg'), window: { start: q(100, 's'), end: q(500, 's') } },
  ];
  b.checkpoints = [{ id: 'mid', time: q(333.3, 's') }, { id: 'late', time: q(461.7, 's') }];
  return b;
}

describe('the record plan', () => {
  it('keeps every N-th step, the last and the steps asked for, in order', () => {
    const plan = planRecording(23, 5, [7, 22, 40, -1]);
    expect(Array.from(plan.recordedSteps)).toEqual([0, 5, 7, 10, 15, 20, 22]);
    expect(plan.rowOfStep[7]).toBe(2);
    expect(plan.rowOfStep[8]).toBe(-1);
  });

  it('bounds the source-step entries a run keeps unless a larger stride is asked for', () => {
    const steps = 360_001; // 10 h at 0.1 s
    const every = recordingStride(steps, 14);
    expect(15 * Math.ceil(steps / every)).toBeLessThanOrEqual(MAX_RECORDED_ENTRIES + 15 * every);
    expect(recordingStride(6001, 14)).toBe(1);
    expect(recordingStride(6001, 14, 10)).toBe(10);
  });

  it('gives the same verdicts, times-to-exceed and checkpoints thinned as whole, and the same numbers at the kept steps', () => {
    const whole = computeBudget(r2WithRequirements());
    const thinned = computeBudget(r2WithRequirements(), { every: 37 });
    expect(thinned.recordEvery).toBe(37);
    expect(thinned.requirements).toEqual(whole.requirements);
    expect(thinned.checkpoints).toEqual(whole.checkpoints);
    // The outages make the limits break between kept steps: a thinned series would give other times.
    const times = whole.requirements.flatMap((r) => r.outages.map((o) => o.timeToExceedS)).filter((t) => t !== null);
    expect(times.length).toBeGreaterThan(0);
    const kept = Array.from(thinned.history.recordedSteps);
    expect(kept.length).toBeLessThan(whole.series.tS.length / 30);
    for (const [name, s] of Object.entries(whole.series.quantities)) {
      const t = thinned.series.quantities[name as keyof typeof whole.series.quantities]!;
      kept.forEach((k, r) => {
        expect(t.total[r]).toBe(s!.total[k]);
        s!.bySource.forEach((src, i) => expect(t.bySource[i][r]).toBe(src[k]));
      });
    }
    kept.forEach((k, r) => expect(thinned.series.r95M[r]).toBe(whole.series.r95M[k]));
    thinned.history.calibrationSigma.forEach((sigma, c) => kept.forEach((k, r) => expect(sigma[r]).toBe(whole.history.calibrationSigma[c][k])));
  }, 30_000);
});
