import type { ReportSection } from '../review-report';
import { numCell, type ReviewContext } from '../review-context';
import { outageBands } from './sigma-charts-section';

/** How each calibration state's σ converges: σ over time divided by its largest value, and its first and last σ in SI. */
export function calibrationSection(ctx: ReviewContext): ReportSection | undefined {
  const cal = ctx.json.calibration;
  if (cal.length === 0) return undefined;
  const t = ctx.json.series.t_s;
  const last = t.length - 1;
  return {
    id: 'calibration', title: 'Calibration convergence',
    blocks: [
      {
        kind: 'chart',
        caption: 'Each calibration state\'s σ divided by its largest σ over the mission (1 = no better than its worst); hatched spans are outages.',
        chart: {
          title: 'Calibration states', xLabel: 'mission time (s)', yLabel: 'σ / largest σ', yMin: 0, yMax: 1.05, limits: [], bands: outageBands(ctx),
          series: cal.map((c) => {
            const top = Math.max(...c.sigma) || 1;
            return { label: c.state, x: t, y: c.sigma.map((s) => s / top) };
          }),
        },
      },
      {
        kind: 'table', id: 'calibration', caption: 'Calibration states, 1σ in SI', columns: ['State', 'Unit', 'σ at start', 'σ at end', 'End / start'], numericColumns: [2, 3, 4],
        rows: cal.map((c) => [c.state, c.unit === '1' ? '(ratio)' : c.unit, numCell(c.sigma[0]), numCell(c.sigma[last]), c.sigma[0] > 0 ? numCell(c.sigma[last] / c.sigma[0]) : '']),
      },
    ],
  };
}
