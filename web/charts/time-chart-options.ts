import type { ChartOptions, TooltipItem } from 'chart.js';
import { narrowLogTicks, yTickLabels } from './y-tick-labels';
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

const FONT = { family: 'system-ui, sans-serif', size: 11 };

/** Width of every time plot's y axis (labels and title), px. */
export const Y_AXIS_WIDTH_PX = 68;

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
        ticks: { font: FONT, callback: (_v, i, ticks) => yTickLabels(ticks.map((t) => t.value), spec.logarithmic === true)[i] },
        // One width for every time plot's y axis, so their plot areas (and outage bands) line up on the page.
        afterFit: (scale) => { scale.width = Y_AXIS_WIDTH_PX; },
        // A log axis over less than a decade gets round, evenly spaced ticks (y-tick-labels.ts).
        afterBuildTicks: (scale) => {
          const even = spec.logarithmic ? narrowLogTicks(scale.min, scale.max) : undefined;
          if (even) scale.ticks = even.map((value) => ({ value }));
        },
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
