import type { ReportBlock, ReportSection } from '../review-report';
import { fmt, levelLabel, type ReviewContext } from '../review-context';
import type { ChartSeries, LineChart } from '../svg-line-chart';
import type { QuantityName } from '../../../inputs/budget-input';
import { requirementSeries } from '../../requirement-curves';

/** The report's over-time charts: which `run --json` series each draws, and in which unit. */
const CHARTS: { key: string; title: string; unit: string; series: [jsonKey: string, label: string][] }[] = [
  { key: 'heading', title: 'Heading error', unit: 'deg', series: [['heading_sigma_deg', 'heading 1σ']] },
  { key: 'speed', title: 'Speed error', unit: 'm/s', series: [['speed_sigma_mps', 'speed 1σ']] },
  { key: 'position', title: 'Position error per axis', unit: 'm', series: [['north_sigma_m', 'north 1σ'], ['east_sigma_m', 'east 1σ'], ['along_sigma_m', 'along-track 1σ'], ['cross_sigma_m', 'cross-track 1σ']] },
  { key: 'horizontal', title: 'Horizontal position error', unit: 'm', series: [['drms_m', 'DRMS'], ['cep_m', 'CEP (50 %)'], ['r95_m', 'R95 (95 %)']] },
];

const chartOf = (q: QuantityName) => (q === 'heading' || q === 'speed' || q === 'horizontal' ? q : 'position');
const unitOf = (q: QuantityName) => CHARTS.find((c) => c.key === chartOf(q))!.unit;

/** Outage bands of every aiding sensor, for any over-time chart. */
export function outageBands(ctx: ReviewContext): LineChart['bands'] {
  return ctx.result.model.streams.flatMap((s) => s.outages.map((o) => ({ label: `${s.sensorId} ${o.id}`, from: o.startS, to: o.endS })));
}

/** σ over time per quantity, each requirement's own curve at its level with its limit drawn, outages shaded. */
export function sigmaChartsSection(ctx: ReviewContext): ReportSection {
  const t = ctx.json.series.t_s;
  const reqs = requirementSeries(ctx.result, unitOf);
  const blocks: ReportBlock[] = [];
  for (const c of CHARTS) {
    const series: ChartSeries[] = c.series.filter(([k]) => ctx.json.series[k]).map(([k, label]) => ({ label, x: t, y: ctx.json.series[k] }));
    if (series.length === 0) continue;
    const mine = reqs.filter((r) => chartOf(r.quantity) === c.key);
    for (const r of mine) series.push({ label: `${r.id}: ${r.quantity} at ${levelLabel(r.level)}`, x: t, y: Array.from(r.values) });
    const chart: LineChart = {
      title: c.title, xLabel: 'mission time (s)', yLabel: `${c.title.toLowerCase()} (${c.unit})`, series,
      limits: mine.map((r) => ({ label: `${r.id} limit ${fmt(r.limit)} ${r.unit}`, value: r.limit })),
      bands: outageBands(ctx),
    };
    blocks.push({ kind: 'chart', chart, caption: `${c.title} over the mission (${c.unit}); hatched spans are outages of aiding sensors${mine.length ? '; thick lines are requirement limits' : ''}.` });
  }
  return { id: 'charts', title: 'Errors over time', blocks };
}
