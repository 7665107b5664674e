import type { ChartOptions, TooltipItem } from 'chart.js';
import { formatSignificant } from '../../src';
import type { OutageBand } from './outage-bands';

/** What differs between the findings' time plots. */
export interface TimeChartSpec {
  /** Title of the y axis, with its unit, e.g. "heading σ (deg)". */
  yTitle: string;
  /** Unit written after every value in tooltips, e.g. "deg" or "%". */
  unit: string;
  bands: OutageBand[];
  /** Stack the datasets (share-of-variance areas). */
  stacked?: boolean;
  /** Fixed top of the y axis (100 for shares); otherwise it fits the data. */
  yMax?: number;
  /** Times of the samples, s: the x axis spans the first to the last. */
  t: number[];
  /** A logarithmic y axis (for σ spanning decades; zero values are not drawn); linear from 0 otherwise. */
  logarithmic?: boolean;
}

/**
 * Log-axis tick label: over several decades (`crowded`) only at 1, 2 and 5
 * times a power of ten; otherwise at every one-digit value (0.5, 0.6, ...),
 * so the axis's own end values (0.49) do not print over their neighbours.
 */
function logTick(v: number, crowded: boolean): string {
  const mantissa = v / 10 ** Math.floor(Math.log10(v) + 1e-9);
  const shown = crowded ? [1, 2, 5].some((m) => Math.abs(mantissa - m) < 1e-6) : Math.abs(mantissa - Math.round(mantissa)) < 1e-6;
  return shown ? chartNumber(v) : '';
}

const FONT = { family: 'system-ui, sans-serif', size: 11 };

/** A value for tooltips and ticks: three significant digits. */
export const chartNumber = (x: number) => formatSignificant(x, 3);

/**
 * Options shared by every time plot of the findings: no animation (so
 * screenshots are complete), a linear time axis in seconds, a linear y axis
 * from 0 (or a logarithmic one), tooltips that show every series at the hovered time with units,
 * and the outage bands.
 */
export function timeChartOptions(spec: TimeChartSpec): ChartOptions<'line'> {
  return {
    animation: false,
    responsive: true,
    maintainAspectRatio: false,
    normalized: true,
    interaction: { mode: 'index', intersect: false },
    elements: { point: { radius: 0, hoverRadius: 3 }, line: { borderWidth: 1.5, tension: 0 } },
    scales: {
      x: { type: 'linear', min: spec.t[0], max: spec.t[spec.t.length - 1], title: { display: true, text: 'time (s)', font: FONT }, ticks: { font: FONT, maxTicksLimit: 10 } },
      y: {
        type: spec.logarithmic ? 'logarithmic' : 'linear', min: spec.logarithmic ? undefined : 0, max: spec.yMax, stacked: spec.stacked,
        title: { display: true, text: spec.yTitle, font: FONT },
        ticks: { font: FONT, callback: (v, _i, ticks) => (spec.logarithmic ? logTick(Number(v), ticks.length > 8) : chartNumber(Number(v))) },
      },
    },
    plugins: {
      legend: { position: 'bottom', labels: { boxWidth: 14, boxHeight: spec.stacked ? 10 : 2, font: FONT } },
      tooltip: {
        callbacks: {
          title: (items: TooltipItem<'line'>[]) => (items.length ? `t = ${formatSignificant(items[0].parsed.x ?? 0, 4)} s` : ''),
          label: (item: TooltipItem<'line'>) => `${item.dataset.label}: ${chartNumber(item.parsed.y ?? 0)} ${spec.unit}`,
        },
      },
      slOutageBands: { bands: spec.bands },
    },
  };
}
