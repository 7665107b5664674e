import type { ReportBlock, ReportSection } from '../review-report';
import { fmt, numCell, type ReviewContext } from '../review-context';
import type { RSweep } from '../../../suboptimal/r-sweep';

/** Half-width of the band marking ×1 (the truth's R) on the log axis, as a factor. */
const TRUTH_MARK_FACTOR = 1.03;

/**
 * The R sweeps asked for: one aiding sensor's R in the filter scaled from
 * ×0.1 to ×10, each requirement's actual and believed worst value against
 * the scale on a log axis, ×1 (the truth's R) marked (the numbers of
 * `sigma-ledger r-sweep --json`).
 */
export function rSweepSection(ctx: ReviewContext): ReportSection | undefined {
  if (ctx.rSweeps.length === 0) return undefined;
  return {
    id: 'r-sweep', title: 'What the R choice costs',
    blocks: [
      { kind: 'paragraph', text: 'With the filter otherwise equal to the truth, the actual worst value is smallest at ×1: the Kalman filter is the minimum-variance linear filter for its truth (Gelb, Applied Optimal Estimation, 1974, ch. 4 and §7.2). Inflating R buys a filter that believes more than it gets; trusting R too much makes it overconfident.' },
      ...ctx.rSweeps.flatMap((s): ReportBlock[] => ('problem' in s ? [{ kind: 'paragraph', text: `${s.sensorId}: not run: ${s.problem}` }] : sweepBlocks(s))),
    ],
  };
}

function sweepBlocks(s: RSweep): ReportBlock[] {
  const x = s.points.map((p) => p.factor);
  const requirements = s.points[0]?.values ?? [];
  const charts = requirements.map((r, i): ReportBlock => ({
    kind: 'chart',
    caption: `${r.requirementId} against ${s.sensorId}'s R scale in the filter (log axis); the hatched mark is ×1, the truth's R; the smallest actual worst is at ×${fmt(s.bestFactor[r.requirementId])}.`,
    chart: {
      title: `${s.sensorId} R sweep: ${r.requirementId}`, xLabel: `${s.sensorId} R scale in the filter (×)`, yLabel: `worst ${r.requirementId} (${r.unit})`, xLog: true,
      series: [
        { label: 'actual worst', x, y: s.points.map((p) => p.values[i].actualWorst) },
        { label: 'believed worst', x, y: s.points.map((p) => p.values[i].believedWorst) },
      ],
      limits: [{ label: `limit ${fmt(r.limit)} ${r.unit}`, value: r.limit }],
      bands: [{ label: 'truth ×1', from: 1 / TRUTH_MARK_FACTOR, to: TRUTH_MARK_FACTOR }],
    },
  }));
  const table: ReportBlock = {
    kind: 'table', id: `r-sweep-${s.sensorId}`, caption: `${s.sensorId}: worst value of each requirement at each R scale, actual and believed`,
    columns: ['R scale', ...requirements.flatMap((r) => [`${r.requirementId} actual (${r.unit})`, `${r.requirementId} believed (${r.unit})`])],
    numericColumns: Array.from({ length: 1 + 2 * requirements.length }, (_, i) => i),
    rows: s.points.map((p) => [numCell(p.factor), ...p.values.flatMap((v) => [numCell(v.actualWorst), numCell(v.believedWorst)])]),
  };
  return [...charts, table];
}
