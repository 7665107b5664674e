/**
 * The "filter as tuned" part of `sigma-ledger run`: which rows the filter
 * is tuned differently from the truth, what it believes against its actual
 * error per quantity, the requirements judged on the actual error, the
 * filter's normalised innovation variance and the largest truth shares of
 * the actual error at the end.
 */
import type { BudgetInput, TuningInput } from '../inputs/budget-input';
import type { ErrorModel } from '../covariance/error-model';
import type { FilterDesignResult } from '../suboptimal/compute-filter-design';
import { formatSignificant } from '../units';
import { DISPLAY, varianceFactor } from './display-units';

const fmt = (x: number) => formatSignificant(x, 4);

/** Lines describing each tuned row, e.g. `gyro.bi: filter carries it as a random walk`. Throws nothing. */
export function tunedRowLines(input: BudgetInput): string[] {
  return input.sensors.flatMap((s) => s.sources.flatMap((row) => (row.tuning ? [`  ${s.id}.${row.id}: ${describeTuning(row.tuning, row.value)}`] : [])));
}

/** One row's filter design in words, beside its truth value. Throws nothing. */
export function describeTuning(t: TuningInput, truth: { value: number; unit: string }): string {
  if (t.leftOut) return 'left out of the filter';
  const parts: string[] = [];
  if (t.value) parts.push(`tuned with ${fmt(t.value.value)} ${t.value.unit} (truth ${fmt(truth.value)} ${truth.unit})`);
  if (t.correlationTime) parts.push(`correlation time ${fmt(t.correlationTime.value)} ${t.correlationTime.unit}`);
  if (t.inflation !== undefined) parts.push(`variance inflated ×${fmt(t.inflation)} in the filter`);
  if (t.model === 'random-walk') parts.push('carried as a random walk (the truth is Gauss-Markov)');
  if (t.model === 'folded') parts.push('folded into R as white noise');
  if (t.model === 'states') parts.push('carried as Gauss-Markov states');
  return parts.join('; ') || 'as the truth';
}

/** The section's text (ends with a newline). Throws nothing. */
export function formatFilterDesign(design: FilterDesignResult, truth: ErrorModel, input: BudgetInput): string {
  const reqs = design.actual.requirements;
  const lines = [
    'FILTER AS TUNED VERSUS TRUTH (the rows are the truth; the filter uses its own design below)',
    ...tunedRowLines(input),
    '',
    'BELIEVED vs ACTUAL (1σ; believed = the filter\'s own covariance, actual = the truth run with its gains):',
    ...design.confidence.map((c) => `  ${DISPLAY[c.quantity].label}: ${c.verdict}; at the end ${fmt(c.atEnd.believedSigma)} vs ${fmt(c.atEnd.actualSigma)} ${c.unit}`),
    '',
    `REQUIREMENTS ON THE ACTUAL ERROR: ${reqs.filter((r) => r.verdict === 'pass').length} of ${reqs.length} hold`,
    ...reqs.map((r, i) => {
      const b = design.believed.requirements[i];
      return `  [${r.verdict.toUpperCase()}] ${r.id}: actual worst ${fmt(r.worstValue)} ${r.limit.unit}, the filter believes ${fmt(b.worstValue)} ${r.limit.unit} (${b.verdict}), limit ${r.limit.value} ${r.limit.unit}`;
    }),
    '',
    ...innovationLines(design),
    ...shareLines(design, truth),
  ];
  return lines.join('\n') + '\n';
}

function innovationLines(design: FilterDesignResult): string[] {
  if (design.innovations.length === 0) return [];
  return [
    'NORMALISED INNOVATION VARIANCE (actual innovation variance / the filter\'s predicted one; 1 = consistent, above 1 = overconfident):',
    ...design.innovations.map((r) => `  ${r.sensorId}: mean ${fmt(r.mean)}, largest ${fmt(r.max)} over ${r.ratio.length} scalar measurements`),
    '',
  ];
}

function shareLines(design: FilterDesignResult, truth: ErrorModel): string[] {
  const last = design.actual.series.tS.length - 1;
  const lines = ['ACTUAL ERROR AT THE END, truth sources by share of variance:'];
  for (const [q, s] of Object.entries(design.actual.series.quantities)) {
    if (!s || s.total[last] <= 0) continue;
    const quantity = q as keyof typeof DISPLAY;
    const f = varianceFactor(quantity);
    lines.push(`  ${DISPLAY[quantity].label}: ${fmt(Math.sqrt(s.total[last] * f))} ${DISPLAY[quantity].unit}`);
    s.bySource
      .map((v, i) => ({ id: truth.sources[i].id, share: v[last] / s.total[last] }))
      .filter((x) => x.share >= 0.01)
      .sort((a, b) => b.share - a.share)
      .forEach((x) => lines.push(`      ${(100 * x.share).toFixed(1).padStart(5)} %  ${x.id}`));
  }
  return lines;
}
