/**
 * What the Allan chart draws: the measured deviation at each τ, its
 * IEEE Std 952 band σ(1 ± δ) shaded, each term of the whole-curve fit as a
 * dashed line and the fit's sum, all in the curve's display unit, on
 * logarithmic axes. Colours from the colour-blind-safe palette; no animation.
 */
import type { ChartOptions, TooltipItem } from 'chart.js';
import { termDeviation } from '../../src';
import { SENSOR_TERM_UNITS } from '../../src';
import { formatSignificant, unitFor } from '../../src';
import type { LineChartData, LineDataset } from '../charts/chart-controller';
import { seriesColour, TOTAL_COLOUR } from '../styles/palette';
import type { AllanOutcome } from './log-protocol';

/** Label of the band's lower edge, which the legend leaves out (the upper edge names the band). */
export const BAND_LOWER_LABEL = 'band lower edge';

const FONT = { family: 'system-ui, sans-serif', size: 11 };

/** A translucent version of a '#rrggbb' colour. */
function translucent(hex: string, alpha: number): string {
  const n = parseInt(hex.slice(1), 16);
  return `rgba(${n >> 16}, ${(n >> 8) & 255}, ${n & 255}, ${alpha})`;
}

/** Tick label of a log axis: 1, 2 and 5 times a power of ten, else nothing. */
function logTick(v: number): string {
  const mantissa = v / 10 ** Math.floor(Math.log10(v) + 1e-9);
  return [1, 2, 5].some((m) => Math.abs(mantissa - m) < 1e-6) ? formatSignificant(v, 3) : '';
}

/** The fitted terms' lines and their root-sum-square, in the display unit, at each τ. */
function fitLines(o: AllanOutcome, toDisplay: number): LineDataset[] {
  const tau = o.result.points.map((p) => p.tau_s);
  const used = o.result.analysis.terms.filter((t) => t.method === 'fit' && !t.atZero && t.valueSI > 0);
  const lines = used.map((t, i): LineDataset => ({
    label: `${t.name} (fit)`, data: tau.map((x) => termDeviation(t.id, t.valueSI, x) * toDisplay),
    borderColor: seriesColour(i + 1), backgroundColor: seriesColour(i + 1), borderDash: [5, 4], borderWidth: 1.2, pointRadius: 0, fill: false,
  }));
  const sum = tau.map((x) => Math.sqrt(used.reduce((s, t) => s + termDeviation(t.id, t.valueSI, x) ** 2, 0)) * toDisplay);
  return [...lines, { label: 'sum of fitted terms', data: sum, borderColor: TOTAL_COLOUR, backgroundColor: TOTAL_COLOUR, borderWidth: 1.5, pointRadius: 0, fill: false }];
}

/** The datasets and options of the chart. Throws nothing for an outcome the worker produced. */
export function allanChartData(o: AllanOutcome): LineChartData {
  const r = o.result;
  const unit = r.adevUnit;
  const toDisplay = 1 / unitFor(unit, SENSOR_TERM_UNITS[r.kind].rateDimension, 'unit').factorToSI;
  const measured = seriesColour(0);
  const positive = (x: number) => (x > 0 ? x : null);
  const datasets: LineDataset[] = [
    { label: 'IEEE Std 952 band σ(1 ± δ)', data: r.points.map((p) => positive(p.upper)), borderWidth: 0, pointRadius: 0, backgroundColor: translucent(measured, 0.18), fill: '+1' },
    { label: BAND_LOWER_LABEL, data: r.points.map((p) => positive(p.lower)), borderWidth: 0, pointRadius: 0, backgroundColor: translucent(measured, 0.18), fill: false },
    { label: 'overlapping Allan deviation', data: r.points.map((p) => positive(p.adev)), borderColor: measured, backgroundColor: measured, borderWidth: 2, pointRadius: 2.5, fill: false },
    ...fitLines(o, toDisplay),
  ];
  // The fitted lines may fall decades below the data at the ends; the y axis stays near the measured curve.
  const low = Math.min(...r.points.map((p) => (p.lower > 0 ? p.lower : p.adev)).filter((x) => x > 0));
  const high = Math.max(...r.points.map((p) => p.upper));
  return { labels: r.points.map((p) => p.tau_s), datasets, options: allanChartOptions(unit, low / Y_MARGIN, high * Y_MARGIN) };
}

/** Factor of head room above and below the measured curve on the y axis. */
const Y_MARGIN = 3;

function allanChartOptions(unit: string, yMin: number, yMax: number): ChartOptions<'line'> {
  return {
    animation: false,
    responsive: true,
    maintainAspectRatio: false,
    interaction: { mode: 'index', intersect: false },
    elements: { line: { tension: 0 } },
    scales: {
      x: { type: 'logarithmic', title: { display: true, text: 'cluster time τ (s, log scale)', font: FONT }, ticks: { font: FONT, callback: (v) => logTick(Number(v)) } },
      y: { type: 'logarithmic', min: Number.isFinite(yMin) ? yMin : undefined, max: Number.isFinite(yMax) ? yMax : undefined, title: { display: true, text: `Allan deviation σ(τ) (${unit}, log scale)`, font: FONT }, ticks: { font: FONT, callback: (v) => logTick(Number(v)) } },
    },
    plugins: {
      legend: { position: 'bottom', labels: { boxWidth: 14, boxHeight: 2, font: FONT, filter: (item) => item.text !== BAND_LOWER_LABEL } },
      tooltip: {
        filter: (item) => item.dataset.label !== BAND_LOWER_LABEL,
        callbacks: {
          title: (items: TooltipItem<'line'>[]) => (items.length ? `τ = ${formatSignificant(items[0].parsed.x ?? 0, 3)} s` : ''),
          label: (item: TooltipItem<'line'>) => `${item.dataset.label}: ${formatSignificant(item.parsed.y ?? 0, 3)} ${unit}`,
        },
      },
    },
  };
}
