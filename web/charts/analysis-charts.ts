/**
 * chart.js data of the two filter analyses: the ranked sensitivity bars
 * (largest relative change first) and one R-sweep plot per requirement
 * (actual and believed worst value against the R scale on a log axis, the
 * limit dashed, ×1 marked as the truth's R).
 */
import type { ChartConfiguration } from 'chart.js';
import type { RSweep, SensitivityEntry } from '../../src/index';
import { formatSignificant } from '../../src';
import type { LineChartData, LineDataset } from './chart-controller';
import { LIMIT_DASH, seriesColour, TOTAL_COLOUR } from '../styles/palette';

/** Bars drawn (the table lists every entry). */
export const SENSITIVITY_BARS = 20;
/** The believed curve's dash: dotted, as on the σ plots. */
const BELIEVED_DASH = [2, 3];
/** Half-width of the ×1 mark, as a factor on the log axis. */
const TRUTH_MARK = 1.03;
const FONT = { family: 'system-ui, sans-serif', size: 11 };

/** The bar chart of the largest entries: one bar per (value, requirement), in % of the base worst value. */
export function sensitivityBars(entries: SensitivityEntry[]): ChartConfiguration<'bar', number[], string> {
  const shown = entries.slice(0, SENSITIVITY_BARS);
  return {
    type: 'bar',
    data: {
      labels: shown.map((e) => `${e.target} → ${e.requirementId}`),
      datasets: [{ label: 'largest change in the worst value (% of the base worst)', data: shown.map((e) => 100 * e.relativeChange), backgroundColor: seriesColour(0) }],
    },
    options: {
      indexAxis: 'y', animation: false, responsive: true, maintainAspectRatio: false,
      scales: {
        x: { type: 'linear', min: 0, title: { display: true, text: 'largest change in the worst value (% of the base worst)', font: FONT }, ticks: { font: FONT } },
        y: { type: 'category', ticks: { font: FONT, autoSkip: false } },
      },
      plugins: {
        legend: { display: false },
        tooltip: { callbacks: { label: (item) => `${formatSignificant(item.parsed.x ?? 0, 3)} % (${shown[item.dataIndex].change.toPrecision(3)} ${shown[item.dataIndex].unit})` } },
      },
    },
  };
}

/** The R-sweep plot of requirement `i`: actual and believed worst against the scale, the limit, ×1 marked. */
export function rSweepPlot(sweep: RSweep, i: number): LineChartData {
  const x = sweep.points.map((p) => p.factor);
  const v = sweep.points.map((p) => p.values[i]);
  const r = v[0];
  const line = (label: string, data: number[], colour: string, dash: number[]): LineDataset =>
    ({ label, data, borderColor: colour, backgroundColor: colour, fill: false, borderDash: dash, pointRadius: 2 });
  const datasets = [
    line('actual worst', v.map((p) => p.actualWorst), seriesColour(0), []),
    line('believed by the filter', v.map((p) => p.believedWorst), seriesColour(1), BELIEVED_DASH),
    { ...line(`limit ${formatSignificant(r.limit, 3)} ${r.unit}`, x.map(() => r.limit), TOTAL_COLOUR, LIMIT_DASH), pointRadius: 0 },
  ];
  return {
    labels: x, datasets,
    options: {
      animation: false, responsive: true, maintainAspectRatio: false, interaction: { mode: 'index', intersect: false },
      scales: {
        x: { type: 'logarithmic', min: x[0], max: x[x.length - 1], title: { display: true, text: `${sweep.sensorId} R scale in the filter (×, log)`, font: FONT }, ticks: { font: FONT } },
        y: { type: 'linear', min: 0, title: { display: true, text: `worst ${r.requirementId} (${r.unit})`, font: FONT }, ticks: { font: FONT } },
      },
      plugins: {
        legend: { position: 'bottom', labels: { boxWidth: 14, boxHeight: 2, font: FONT } },
        slOutageBands: { bands: [{ sensorId: 'truth R', id: '×1', startS: 1 / TRUTH_MARK, endS: TRUTH_MARK }] },
        tooltip: { callbacks: { title: (items) => (items.length ? `R ×${formatSignificant(items[0].parsed.x ?? 0, 3)}` : '') } },
      },
    },
  };
}
