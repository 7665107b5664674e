import type { ViewResult } from '../../src';
import { convert } from '../../src';
import { quantitySpec, type VarianceQuantity } from '../../src';
import { LIMIT_DASH, TOTAL_COLOUR, seriesColour } from '../styles/palette';
import type { LineDataset } from './chart-controller';
import { levelText, num, quantityText } from './findings-text';
import { requirementsOf } from './result-shapes';

/** Dash of the believed (filter's own) σ lines, apart from the limits' dash. */
const BELIEVED_DASH = [2, 3];

/** The three σ-over-time plots. */
export type SigmaChartKind = 'heading' | 'position' | 'speed';

interface KindSpec {
  unit: string;
  yTitle: string;
  /** Series keys of the JSON result drawn as they are, with their legend labels. */
  base: [key: string, label: string][];
  /** Requirement quantities drawn on this plot. */
  quantities: readonly string[];
}

/** A quantity's 1σ series key in the JSON result and its legend label, from the quantity table. */
function sigmaLine(q: VarianceQuantity): [key: string, label: string] {
  return [quantitySpec(q).seriesKey!, `${quantitySpec(q).label} 1σ`];
}

const KINDS: Record<SigmaChartKind, KindSpec> = {
  heading: { unit: 'deg', yTitle: 'heading error (deg)', base: [sigmaLine('heading')], quantities: ['heading'] },
  position: {
    unit: 'm', yTitle: 'position error (m)',
    base: [sigmaLine('along-track'), sigmaLine('cross-track'), [quantitySpec('drms').seriesKey!, quantitySpec('drms').label]],
    quantities: ['horizontal', 'north', 'east', 'along-track', 'cross-track'],
  },
  speed: { unit: 'm/s', yTitle: 'speed error (m/s)', base: [sigmaLine('speed')], quantities: ['speed'] },
};

/** Requirement curves that would repeat a series already drawn: a quantity's 1σ, DRMS, and R95 when shown. */
function repeatsBase(quantity: string, level: string, showsR95: boolean): boolean {
  if (level === '1sigma') return quantity !== 'north' && quantity !== 'east';
  return quantity === 'horizontal' && level === '95%' && showsR95;
}

/** Unit and y-axis title of a σ plot. */
export function sigmaChartAxis(kind: SigmaChartKind): { unit: string; yTitle: string } {
  return { unit: KINDS[kind].unit, yTitle: KINDS[kind].yTitle };
}

/** Whether the result has the series a σ plot needs (no speed input means no speed plot). */
export function hasSigmaChart(view: ViewResult, kind: SigmaChartKind): boolean {
  return view.result?.series[KINDS[kind].base[0][0]] !== undefined;
}

/** One σ plot: its datasets and, when the start would squash the rest, where to cut the y axis. */
export interface SigmaPlot {
  datasets: LineDataset[];
  /** Top of the y axis in the plot's unit; undefined lets the axis fit all data. */
  yMax?: number;
  /** The highest value cut off by `yMax`, and when (s from the mission start). */
  cut?: { value: number; tS: number };
}

/**
 * One σ plot ({@link sigmaDatasets}) with its y axis: when requirements are
 * drawn and the curves rise far above both their limits and their values
 * inside the requirement windows (a large initial uncertainty, say), the
 * axis stops at 1.2 times the largest limit or 1.1 times the largest value
 * inside a window, whichever is higher, and the peak cut off is reported.
 */
export function sigmaPlot(view: ViewResult, kind: SigmaChartKind): SigmaPlot {
  const datasets = sigmaDatasets(view, kind);
  const t = view.result?.series.t_s ?? [];
  const reqs = view.result ? requirementsOf(view.result).filter((r) => KINDS[kind].quantities.includes(r.quantity)) : [];
  if (reqs.length === 0) return { datasets };
  const inWindow = (k: number) => reqs.some((r) => t[k] >= r.window_s[0] - 1e-9 && t[k] <= r.window_s[1] + 1e-9);
  let inside = 0, peak = { value: 0, tS: 0 };
  for (const d of datasets) {
    d.data.forEach((v, k) => {
      if (v === null) return;
      if (inWindow(k)) inside = Math.max(inside, v);
      if (v > peak.value) peak = { value: v, tS: t[k] };
    });
  }
  const top = niceCeil(Math.max(1.1 * inside, 1.2 * Math.max(...reqs.map((r) => r.limit * convert(1, r.unit, KINDS[kind].unit, r.id)))));
  return peak.value > top ? { datasets, yMax: top, cut: peak } : { datasets };
}

/**
 * The datasets of one σ plot, in the plot's unit (deg, m or m/s): the
 * result's 1σ series first (heading: `heading_sigma_deg` as it is), R95 on
 * the position plot when a horizontal requirement exists; with a filter
 * design, each base series as the filter believes it (dotted) and as its
 * actual error; then each
 * requirement's own curve at its level (once per quantity and level), then
 * each requirement's limit as a dashed line over its window.
 */
export function sigmaDatasets(view: ViewResult, kind: SigmaChartKind): LineDataset[] {
  const spec = KINDS[kind];
  const series = view.result?.series ?? {};
  const reqs = view.result ? requirementsOf(view.result).filter((r) => spec.quantities.includes(r.quantity)) : [];
  const showsR95 = kind === 'position' && reqs.some((r) => r.quantity === 'horizontal') && series.r95_m !== undefined;
  const base = [...spec.base, ...(showsR95 ? [['r95_m', 'R95'] as [string, string]] : [])].filter(([key]) => series[key]);
  const lines: LineDataset[] = base.map(([key, label], i) => line(label, series[key].slice(), seriesColour(i)));
  // With a filter design: what the filter believes (dashed) and its actual error, beside the optimal filter's.
  const design = view.result?.filterDesign;
  if (design) {
    for (const [key, label] of base) {
      const believed = design.believed.series[key], actual = design.actual.series[key];
      if (believed) lines.push({ ...line(`${label}, believed by the filter as tuned`, believed.slice(), seriesColour(lines.length)), borderDash: BELIEVED_DASH });
      if (actual) lines.push(line(`${label}, actual with the filter as tuned`, actual.slice(), seriesColour(lines.length)));
    }
  }
  const drawn = new Set<string>();
  for (const c of view.curves) {
    const key = `${c.quantity}|${c.level}`;
    if (!spec.quantities.includes(c.quantity) || drawn.has(key) || repeatsBase(c.quantity, c.level, showsR95)) continue;
    drawn.add(key);
    const f = convert(1, c.unit, spec.unit, c.id);
    lines.push(line(`${quantityText(c.quantity)} ${levelText(c.level)}`, c.values.map((v) => v * f), seriesColour(lines.length)));
  }
  const t = series.t_s ?? [];
  for (const r of reqs) {
    const y = r.limit * convert(1, r.unit, spec.unit, r.id);
    const [from, to] = r.window_s;
    const values = t.map((s) => (s >= from - 1e-9 && s <= to + 1e-9 ? y : null));
    lines.push({ ...line(`limit ${r.id}: ${num(r.limit)} ${r.unit} (${levelText(r.level)})`, values, TOTAL_COLOUR), borderDash: LIMIT_DASH, spanGaps: false });
  }
  return lines;
}

/** The smallest of 1, 1.2, 1.5, 2, 2.5, 3, 4, 5, 6, 8 times a power of ten that is at least `x` (> 0): a round axis top. */
export function niceCeil(x: number): number {
  const p = 10 ** Math.floor(Math.log10(x));
  return ([1, 1.2, 1.5, 2, 2.5, 3, 4, 5, 6, 8, 10].find((k) => k * p >= x * (1 - 1e-12)) ?? 10) * p;
}

function line(label: string, data: (number | null)[], colour: string): LineDataset {
  return { label, data, borderColor: colour, backgroundColor: colour, fill: false, borderDash: [] };
}
