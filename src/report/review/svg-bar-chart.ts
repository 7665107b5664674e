/**
 * A ranked horizontal bar chart rendered to an SVG string, for the review
 * report (hand-written for the reason svg-line-chart.ts gives: chart.js needs
 * a canvas, which a self-contained report and the Node CLI do not have).
 * Bars are one dark fill with the value written beside each, so the chart
 * reads on a black-and-white print.
 */
import { linearTicks } from '../tick-labels';
import { formatSignificant } from '../../units';
import { escapeHtml } from './escape-html';

/** Bars in the order given (largest first for a ranking), values ≥ 0 in `unit`. */
export interface BarChart {
  title: string;
  xLabel: string;
  bars: { label: string; value: number }[];
}

const WIDTH = 720;
const ROW_PX = 18;
const MARGIN = { left: 300, right: 70, top: 8, bottom: 40 };
const CHAR_PX = 6.2;

/** Renders the chart as one `<svg>` element (no scripts, no external references). */
export function renderBarChartSvg(chart: BarChart): string {
  const top = Math.max(1e-12, ...chart.bars.map((b) => b.value)) * 1.05;
  const plotW = WIDTH - MARGIN.left - MARGIN.right, plotH = ROW_PX * chart.bars.length;
  const height = MARGIN.top + plotH + MARGIN.bottom;
  const sx = (v: number) => MARGIN.left + (v / top) * plotW;
  const bottom = MARGIN.top + plotH;
  const ticks = linearTicks(0, top, 6);
  const maxChars = Math.floor((MARGIN.left - 10) / CHAR_PX);
  const parts = [
    `<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 ${WIDTH} ${height}" width="${WIDTH}" height="${height}" role="img" class="chart">`,
    `<title>${escapeHtml(chart.title)}</title>`,
    ...ticks.values.map((v, i) => {
      const x = sx(v).toFixed(1);
      return `<line x1="${x}" x2="${x}" y1="${MARGIN.top}" y2="${bottom + 4}" stroke="#d0d0d0" stroke-width="0.6"/>` +
        `<text x="${x}" y="${bottom + 16}" text-anchor="middle" font-size="11">${ticks.labels[i]}</text>`;
    }),
    ...chart.bars.map((b, i) => {
      const y = MARGIN.top + i * ROW_PX, label = b.label.length > maxChars ? `${b.label.slice(0, maxChars - 1)}…` : b.label;
      return `<text x="${MARGIN.left - 6}" y="${y + ROW_PX / 2}" text-anchor="end" dominant-baseline="middle" font-size="11">${escapeHtml(label)}</text>` +
        `<rect x="${MARGIN.left}" y="${y + 3}" width="${(sx(b.value) - MARGIN.left).toFixed(1)}" height="${ROW_PX - 6}" fill="#3b4a6b"/>` +
        `<text x="${(sx(b.value) + 4).toFixed(1)}" y="${y + ROW_PX / 2}" dominant-baseline="middle" font-size="10">${formatSignificant(b.value, 3)}</text>`;
    }),
    `<line x1="${MARGIN.left}" x2="${MARGIN.left}" y1="${MARGIN.top}" y2="${bottom}" stroke="#000" stroke-width="0.8"/>`,
    `<text x="${MARGIN.left + plotW / 2}" y="${bottom + 34}" text-anchor="middle" font-size="12">${escapeHtml(chart.xLabel)}</text>`,
    '</svg>',
  ];
  return parts.join('\n');
}
