import type { ReportSection } from '../review-report';
import { fmt, levelLabel, numCell, type ReviewContext } from '../review-context';

/** Every requirement's verdict and margin, and the time to exceed it after each outage begins. */
export function requirementsSection(ctx: ReviewContext): ReportSection {
  const reqs = ctx.json.requirements;
  if (reqs.length === 0) return { id: 'requirements', title: 'Requirements', blocks: [{ kind: 'paragraph', text: 'The document gives no requirements.' }] };
  return {
    id: 'requirements', title: 'Requirements and verdicts',
    blocks: [
      {
        kind: 'table', id: 'verdicts', caption: 'Verdicts over each requirement\'s window (margin = limit − worst; negative fails)',
        columns: ['Requirement', 'Quantity (level)', 'Limit', 'Window (s)', 'Worst', 'at t (s)', 'Margin', 'Verdict'], numericColumns: [2, 4, 5, 6],
        rows: reqs.map((r) => [
          r.id, `${r.quantity} (${levelLabel(r.level)})`, { text: `${fmt(r.limit)} ${r.unit}`, value: r.limit }, `${fmt(r.window_s[0])} to ${fmt(r.window_s[1])}`,
          { text: `${fmt(r.worst)} ${r.unit}`, value: r.worst }, numCell(r.worst_t_s), { text: `${fmt(r.margin)} ${r.unit}`, value: r.margin }, r.verdict.toUpperCase(),
        ]),
      },
      {
        kind: 'table', id: 'time-to-exceed', caption: 'Time from each outage\'s start until the requirement first breaks',
        columns: ['Requirement', 'Sensor', 'Outage', 'Span (s)', 'Time to exceed (s)'], numericColumns: [4],
        rows: reqs.flatMap((r) => r.outages.map((o) => [
          r.id, o.sensor, o.outage, `${fmt(o.start_s)} to ${fmt(o.end_s)}`,
          o.timeToExceed_s === null ? 'holds throughout' : numCell(o.timeToExceed_s),
        ])),
      },
    ],
  };
}
