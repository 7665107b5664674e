import { describe, expect, it } from 'vitest';
import { computeBudget } from '../../src/pipeline';
import { computeFilterDesign } from '../../src/suboptimal/compute-filter-design';
import { exampleInputs, withoutTuning } from './example-inputs';

/** Largest |a − b| / max(|b|, floor) over a series. */
function worstRelative(a: Float64Array, b: Float64Array): number {
  let worst = 0;
  for (let k = 0; k < b.length; k++) worst = Math.max(worst, Math.abs(a[k] - b[k]) / Math.max(Math.abs(b[k]), 1e-300));
  return worst;
}

// Gelb, Applied Optimal Estimation, 1974, §7.2: when the filter's model is the truth, the actual error
// covariance of the suboptimal recursion is the filter's own covariance, i.e. the optimal run.
describe.each(exampleInputs())('filter = truth on budgets/%s', (_file, tuned) => {
  const input = withoutTuning(tuned);
  const base = computeBudget(input);
  const design = computeFilterDesign(input, base);

  it('gives actual = believed = the optimal run within 1e-12 relative for every quantity at every step', () => {
    for (const [q, series] of Object.entries(base.series.quantities)) {
      expect(worstRelative(design.actual.series.quantities[q as 'heading']!.total, series!.total), `actual ${q}`).toBeLessThan(1e-12);
      expect(worstRelative(design.believed.series.quantities[q as 'heading']!.total, series!.total), `believed ${q}`).toBeLessThan(1e-12);
    }
  });

  it('gives each truth source the optimal run\'s share within 1e-12 of the total', () => {
    for (const [q, series] of Object.entries(base.series.quantities)) {
      const actual = design.actual.series.quantities[q as 'heading']!;
      series!.bySource.forEach((share, s) => {
        let worst = 0;
        for (let k = 0; k < share.length; k++) worst = Math.max(worst, Math.abs(actual.bySource[s][k] - share[k]) / Math.max(series!.total[k], 1e-300));
        expect(worst, `${q} ${base.model.sources[s].id}`).toBeLessThan(1e-12);
      });
    }
  });

  it('judges the requirements as the optimal run does, with a normalised innovation variance of 1', () => {
    expect(design.actual.requirements.map((r) => r.verdict)).toEqual(base.requirements.map((r) => r.verdict));
    for (const r of design.innovations) {
      expect(r.mean, r.sensorId).toBeCloseTo(1, 12);
      expect(r.max, r.sensorId).toBeCloseTo(1, 12);
    }
  });
});
