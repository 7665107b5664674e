import type { ReportSection } from '../review-report';
import { fmt, levelLabel, numCell, type ReviewContext } from '../review-context';
import { describeTuning } from '../../filter-design-text';

/**
 * The filter as tuned against the truth (docs/suboptimal-filter.md), when
 * rows carry a `tuning`: what the filter believes and what its error actually
 * is, per requirement and per quantity, with a plain verdict, the rows tuned
 * differently and the normalised innovation variance per aiding sensor. The
 * numbers are `run --json`'s `filterDesign`.
 */
export function filterDesignSection(ctx: ReviewContext): ReportSection | undefined {
  const fd = ctx.filterDesign?.json;
  if (!fd) return undefined;
  return {
    id: 'filter-design', title: 'Filter as tuned versus truth',
    blocks: [
      { kind: 'paragraph', text: 'The rows as written are the truth; the filter runs with its own design (each row\'s tuning). Believed: the filter\'s own covariance. Actual: the truth propagated with the filter\'s gains (Gelb, Applied Optimal Estimation, 1974, §7.2). Requirements below are judged on the actual error.' },
      {
        kind: 'table', id: 'filter-tuning', caption: 'Rows the filter models differently from the truth', columns: ['Row', 'Filter design'],
        rows: ctx.input.sensors.flatMap((s) => s.sources.flatMap((row) => (row.tuning ? [[`${s.id}.${row.id}`, describeTuning(row.tuning, row.value)]] : []))),
      },
      {
        kind: 'table', id: 'filter-requirements', caption: 'Worst value over each requirement\'s window: believed by the filter and actual',
        columns: ['Requirement', 'Quantity (level)', 'Limit', 'Believed worst', 'Actual worst', 'Actual / believed', 'Verdict (actual)'], numericColumns: [2, 3, 4, 5],
        rows: fd.actual.requirements.map((r, i) => {
          const b = fd.believed.requirements[i];
          return [
            r.id, `${r.quantity} (${levelLabel(r.level)})`, { text: `${fmt(r.limit)} ${r.unit}`, value: r.limit },
            { text: `${fmt(b.worst)} ${r.unit}`, value: b.worst }, { text: `${fmt(r.worst)} ${r.unit}`, value: r.worst },
            b.worst > 0 ? numCell(r.worst / b.worst) : '', r.verdict.toUpperCase(),
          ];
        }),
      },
      {
        kind: 'table', id: 'filter-confidence', caption: 'Believed and actual 1σ of each quantity where they differ most, with the verdict',
        columns: ['Quantity', 'Believed 1σ', 'Actual 1σ', 'at t (s)', 'Verdict'], numericColumns: [1, 2, 3],
        rows: fd.confidence.map((c) => {
          const p = c.verdict.includes('conservative') ? c.mostConservative : c.mostOverconfident;
          return [c.quantity, { text: `${fmt(p.believed)} ${c.unit}`, value: p.believed }, { text: `${fmt(p.actual)} ${c.unit}`, value: p.actual }, numCell(p.t_s), c.verdict];
        }),
      },
      ...(fd.innovations.length ? [{
        kind: 'table' as const, id: 'filter-innovations', caption: 'Normalised innovation variance per aiding sensor (1 = consistent, above 1 = overconfident)',
        columns: ['Sensor', 'Measurements', 'Mean', 'Largest'], numericColumns: [1, 2, 3],
        rows: fd.innovations.map((r) => [r.sensor, numCell(r.count), numCell(r.mean), numCell(r.max)]),
      }] : []),
    ],
  };
}
