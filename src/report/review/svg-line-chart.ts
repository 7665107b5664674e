/**
 * A small line chart rendered to an SVG string, for the review report.
 * Hand-written because the project's chart library (chart.js) draws on a
 * canvas, which a self-contained report file and the Node CLI do not have;
 * an SVG string is plain text, prints sharply and needs no script.
 * Series differ by dash pattern and marker shape as well as colour (see
 * series-styles.ts), so the chart reads on a black-and-white print.
 * Plot-area margins are fixed, so charts of one report line up on x.
 */
import { linearTicks, type AxisTicks } from '../tick-labels';
import { formatSignificant } from '../../units';
import { escapeHtml } from './escape-html';
import { markerSvg, seriesStyle } from './series-styles';
import { decimateMinMax, valueAt } from './chart-points';

/** One line: y against x (same length), in the chart's units. */
export interface ChartSeries {
  label: string;
  x: number[];
  y: number[];
}

/** A line chart: series, horizontal limit lines and shaded x spans (outages). */
export interface LineChart {
  title: string;
  xLabel: string;
  yLabel: string;
  series: ChartSeries[];
  limits: { label: string; value: number }[];
  bands: { label: string; from: number; to: number }[];
  /** y range; default from 0 to the largest value or limit. */
  yMin?: number;
  yMax?: number;
  /** A logarithmic x axis (every x, band end included, must be positive), ticked at 1, 2 and 5 per decade. */
  xLog?: boolean;
}

/** Overall size and plot margins, px (viewBox units; the SVG scales to its container). */
const WIDTH = 720;
const PLOT_HEIGHT = 230;
const MARGIN = { left: 70, right: 18, top: 10, bottom: 42 };
const BAND_ROW_PX = 15;
const LEGEND_ROW_PX = 18;
const CHAR_PX = 6.2;
const MARKERS_PER_SERIES = 6;

/**
 * Renders the chart as one `<svg>` element (no scripts, no external
 * references). `idPrefix` keeps the ids of its hatch pattern and clip path
 * unique when several charts share one HTML page.
 */
export function renderLineChartSvg(given: LineChart, idPrefix = 'chart'): string {
  // A log axis is drawn as a linear one over log10 x, with ticks labelled in x.
  const chart = given.xLog ? logX(given) : given;
  const xs = chart.series.flatMap((s) => [s.x[0], s.x[s.x.length - 1]]).filter(Number.isFinite);
  const xMin = Math.min(...xs, ...chart.bands.map((b) => b.from));
  const xMax = Math.max(...xs, ...chart.bands.map((b) => b.to));
  const yMax = chart.yMax ?? defaultTop(chart, xMin + SETTLING_FRACTION * (xMax - xMin));
  const yMin = chart.yMin ?? 0;
  const offScale = chart.series.some((s) => s.y.some((y) => y > yMax));
  const bandRows = placeBandLabels(chart.bands, xMin, xMax);
  const top = MARGIN.top + BAND_ROW_PX * bandRows.rowCount;
  const plotW = WIDTH - MARGIN.left - MARGIN.right;
  const sx = (x: number) => MARGIN.left + ((x - xMin) / (xMax - xMin || 1)) * plotW;
  const sy = (y: number) => top + PLOT_HEIGHT - ((y - yMin) / (yMax - yMin || 1)) * PLOT_HEIGHT;
  const legend = layoutLegend(chart);
  const height = top + PLOT_HEIGHT + MARGIN.bottom + legend.height;
  const parts = [
    `<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 ${WIDTH} ${height}" width="${WIDTH}" height="${height}" role="img" class="chart">`,
    `<title>${escapeHtml(chart.title)}</title>`,
    `<defs><pattern id="${idPrefix}-hatch" width="6" height="6" patternUnits="userSpaceOnUse" patternTransform="rotate(45)"><rect width="6" height="6" fill="#ececec"/><line x1="0" y1="0" x2="0" y2="6" stroke="#9a9a9a" stroke-width="1.2"/></pattern></defs>`,
    ...chart.bands.map((b, i) => bandSvg(b, sx, top, bandRows.rows[i], idPrefix)),
    axesSvg(chart, { xMin, xMax, yMin, yMax, sx, sy, top }),
    ...chart.limits.map((l, i) => limitSvg(l, i, sx(xMin), sx(xMax), sy(l.value))),
    `<clipPath id="${idPrefix}-plot"><rect x="${MARGIN.left}" y="${top}" width="${plotW}" height="${PLOT_HEIGHT}"/></clipPath>`,
    `<g clip-path="url(#${idPrefix}-plot)">`,
    ...chart.series.map((s, i) => seriesSvg(s, i, sx, sy, xMin, xMax)),
    '</g>',
    offScale ? `<text x="${MARGIN.left + 4}" y="${top + 12}" font-size="10" font-style="italic">↑ values above the top of the scale (start-up)</text>` : '',
    legend.svg(top + PLOT_HEIGHT + MARGIN.bottom),
    '</svg>',
  ];
  return parts.join('\n');
}

/** Part of the x range at the start left out when choosing the y scale, so a start-up transient does not flatten the rest. */
const SETTLING_FRACTION = 0.02;

/** Top of the y axis: the largest value after the settling part, or the largest limit, plus 8 %. */
function defaultTop(chart: LineChart, settledX: number): number {
  let top = Math.max(1e-12, ...chart.limits.map((l) => l.value));
  for (const s of chart.series) {
    for (let k = 0; k < s.x.length; k++) if (s.x[k] >= settledX && s.y[k] > top) top = s.y[k];
  }
  return top * 1.08;
}

interface Scales { xMin: number; xMax: number; yMin: number; yMax: number; sx: (x: number) => number; sy: (y: number) => number; top: number }

function axesSvg(chart: LineChart, s: Scales): string {
  const bottom = s.top + PLOT_HEIGHT;
  const left = MARGIN.left, right = WIDTH - MARGIN.right;
  const xt = chart.xLog ? logTicks(s.xMin, s.xMax) : linearTicks(s.xMin, s.xMax, 8);
  const yt = linearTicks(s.yMin, s.yMax, 5);
  const out = [`<rect x="${left}" y="${s.top}" width="${right - left}" height="${PLOT_HEIGHT}" fill="none" stroke="#000" stroke-width="0.8"/>`];
  yt.values.forEach((v, i) => {
    const y = s.sy(v).toFixed(1);
    out.push(`<line x1="${left}" x2="${right}" y1="${y}" y2="${y}" stroke="#d0d0d0" stroke-width="0.6"/>`);
    out.push(`<text x="${left - 5}" y="${y}" text-anchor="end" dominant-baseline="middle" font-size="11">${yt.labels[i]}</text>`);
  });
  xt.values.forEach((v, i) => {
    const x = s.sx(v).toFixed(1);
    out.push(`<line x1="${x}" x2="${x}" y1="${bottom}" y2="${bottom + 4}" stroke="#000" stroke-width="0.8"/>`);
    out.push(`<text x="${x}" y="${bottom + 16}" text-anchor="middle" font-size="11">${xt.labels[i]}</text>`);
  });
  out.push(`<text x="${(left + right) / 2}" y="${bottom + 34}" text-anchor="middle" font-size="12">${escapeHtml(chart.xLabel)}</text>`);
  out.push(`<text transform="translate(14 ${s.top + PLOT_HEIGHT / 2}) rotate(-90)" text-anchor="middle" font-size="12">${escapeHtml(chart.yLabel)}</text>`);
  return out.join('\n');
}

/** The chart over log10 x (xLog kept, so the axis is ticked in decades). */
function logX(chart: LineChart): LineChart {
  return {
    ...chart,
    series: chart.series.map((s) => ({ ...s, x: s.x.map(Math.log10) })),
    bands: chart.bands.map((b) => ({ ...b, from: Math.log10(b.from), to: Math.log10(b.to) })),
  };
}

/** Ticks at 1, 2 and 5 times each power of ten within [lo, hi] (log10 units), labelled as the value x. */
export function logTicks(lo: number, hi: number): AxisTicks {
  const values: number[] = [], labels: string[] = [];
  for (let e = Math.floor(lo); e <= Math.ceil(hi); e++) {
    for (const m of [1, 2, 5]) {
      const v = e + Math.log10(m);
      if (v < lo - 1e-9 || v > hi + 1e-9) continue;
      values.push(v);
      labels.push(formatSignificant(m * 10 ** e, 1));
    }
  }
  return { values, labels };
}

function bandSvg(b: LineChart['bands'][number], sx: (x: number) => number, top: number, row: number, idPrefix: string): string {
  const x0 = sx(b.from), x1 = sx(b.to);
  const labelY = MARGIN.top + BAND_ROW_PX * row + 10;
  return [
    `<rect x="${x0.toFixed(1)}" y="${top}" width="${(x1 - x0).toFixed(1)}" height="${PLOT_HEIGHT}" fill="url(#${idPrefix}-hatch)" opacity="0.7"/>`,
    `<text x="${((x0 + x1) / 2).toFixed(1)}" y="${labelY}" text-anchor="middle" font-size="10" font-style="italic">${escapeHtml(b.label)}</text>`,
  ].join('\n');
}

/** Rows for the band labels so that no two overlap (each label goes in the first row where it fits). */
export function placeBandLabels(bands: LineChart['bands'], xMin: number, xMax: number): { rows: number[]; rowCount: number } {
  const plotW = WIDTH - MARGIN.left - MARGIN.right;
  const rowEnds: number[] = [];
  const rows = bands.map((b) => {
    const centre = MARGIN.left + (((b.from + b.to) / 2 - xMin) / (xMax - xMin || 1)) * plotW;
    const half = (b.label.length * CHAR_PX) / 2 + 4;
    let row = rowEnds.findIndex((end) => end <= centre - half);
    if (row < 0) row = rowEnds.push(-Infinity) - 1;
    rowEnds[row] = centre + half;
    return row;
  });
  return { rows, rowCount: Math.max(1, rowEnds.length) };
}

function limitSvg(l: LineChart['limits'][number], i: number, x0: number, x1: number, y: number): string {
  const atRight = i % 2 === 0;
  return [
    `<line x1="${x0}" x2="${x1}" y1="${y.toFixed(1)}" y2="${y.toFixed(1)}" stroke="#000" stroke-width="1.8"/>`,
    `<text x="${atRight ? x1 - 4 : x0 + 4}" y="${(y - 4).toFixed(1)}" text-anchor="${atRight ? 'end' : 'start'}" font-size="11" font-weight="bold" paint-order="stroke" stroke="#fff" stroke-width="3">${escapeHtml(l.label)}</text>`,
  ].join('\n');
}

function seriesSvg(s: ChartSeries, i: number, sx: (x: number) => number, sy: (y: number) => number, xMin: number, xMax: number): string {
  const st = seriesStyle(i);
  const pts = decimateMinMax(s.x, s.y, sx, sy);
  const d = pts.map(([x, y], k) => `${k === 0 ? 'M' : 'L'}${x.toFixed(1)} ${y.toFixed(1)}`).join('');
  const markers = Array.from({ length: MARKERS_PER_SERIES }, (_, k) => {
    const x = xMin + ((k + 0.3 + 0.11 * (i % 6)) / MARKERS_PER_SERIES) * (xMax - xMin);
    const y = valueAt(s.x, s.y, x);
    return Number.isFinite(y) ? markerSvg(st.marker, sx(x), sy(y), st.colour) : '';
  });
  return `<path d="${d}" fill="none" stroke="${st.colour}" stroke-width="1.5" stroke-dasharray="${st.dash}"/>\n${markers.join('')}`;
}

function layoutLegend(chart: LineChart): { height: number; svg: (y0: number) => string } {
  const items = chart.series.map((s, i) => ({ label: s.label, i, w: 34 + s.label.length * CHAR_PX + 16 }));
  const placed: { label: string; i: number; x: number; row: number }[] = [];
  let x = MARGIN.left, row = 0;
  for (const it of items) {
    if (x + it.w > WIDTH - MARGIN.right && x > MARGIN.left) { row++; x = MARGIN.left; }
    placed.push({ label: it.label, i: it.i, x, row });
    x += it.w;
  }
  const rows = items.length ? row + 1 : 0;
  return {
    height: rows * LEGEND_ROW_PX,
    svg: (y0) => placed.map((p) => {
      const st = seriesStyle(p.i);
      const y = y0 + p.row * LEGEND_ROW_PX + 6;
      return `<line x1="${p.x}" x2="${p.x + 28}" y1="${y}" y2="${y}" stroke="${st.colour}" stroke-width="1.5" stroke-dasharray="${st.dash}"/>` +
        markerSvg(st.marker, p.x + 14, y, st.colour) +
        `<text x="${p.x + 34}" y="${y}" dominant-baseline="middle" font-size="11">${escapeHtml(p.label)}</text>`;
    }).join('\n'),
  };
}
