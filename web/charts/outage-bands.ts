import type { Chart, ChartType, Plugin } from 'chart.js';
import { OUTAGE_FILL, OUTAGE_INK } from '../styles/palette';

/** One shaded stretch of a time plot: an aiding sensor's outage, in seconds from the mission start. */
export interface OutageBand {
  sensorId: string;
  id: string;
  startS: number;
  endS: number;
}

/** Options of {@link outageBands}, under `options.plugins.slOutageBands`. */
export interface OutageBandOptions {
  bands: OutageBand[];
}

declare module 'chart.js' {
  // TType must match chart.js's declaration for the interfaces to merge.
  // eslint-disable-next-line @typescript-eslint/no-unused-vars
  interface PluginOptionsByType<TType extends ChartType> {
    /** Outage bands drawn by web/charts/outage-bands.ts. */
    slOutageBands?: OutageBandOptions;
  }
}

const LABEL_FONT = '10px system-ui, sans-serif';
const ROW_PX = 12;

/** The band's left and right edges in canvas pixels, clipped to the plot area; undefined when outside it. */
function bandPixels(chart: Chart, band: OutageBand): [number, number] | undefined {
  const x = chart.scales.x, area = chart.chartArea;
  const left = Math.max(area.left, x.getPixelForValue(band.startS));
  const right = Math.min(area.right, x.getPixelForValue(band.endS));
  return right > left ? [left, right] : undefined;
}

/** Label rows so that labels of overlapping bands do not print over each other. */
function labelRows(ctx: CanvasRenderingContext2D, placed: { left: number; text: string }[]): number[] {
  const rowEnds: number[] = [];
  return placed.map(({ left, text }) => {
    const width = ctx.measureText(text).width + 6;
    let row = rowEnds.findIndex((end) => end <= left);
    if (row < 0) row = rowEnds.length;
    rowEnds[row] = left + width;
    return row;
  });
}

/**
 * A chart.js plugin of our own: shades each outage as a translucent band
 * behind the data, then draws its edges and a label naming the sensor and
 * the outage over the data (so they stay visible on filled charts too).
 * Register it per chart (`plugins: [outageBands]`); it draws nothing
 * without `options.plugins.slOutageBands.bands`. The chart's x scale must
 * be time in seconds.
 */
export const outageBands: Plugin<'line', OutageBandOptions> = {
  id: 'slOutageBands',
  beforeDatasetsDraw(chart, _args, options) {
    const bands = options.bands ?? [];
    const { ctx, chartArea: area } = chart;
    ctx.save();
    ctx.fillStyle = OUTAGE_FILL;
    for (const band of bands) {
      const px = bandPixels(chart, band);
      if (px) ctx.fillRect(px[0], area.top, px[1] - px[0], area.bottom - area.top);
    }
    ctx.restore();
  },
  afterDatasetsDraw(chart, _args, options) {
    const bands = options.bands ?? [];
    const { ctx, chartArea: area } = chart;
    const placed = bands.flatMap((b) => {
      const px = bandPixels(chart, b);
      return px ? [{ left: px[0], right: px[1], text: `${b.sensorId}: ${b.id}` }] : [];
    });
    ctx.save();
    ctx.font = LABEL_FONT;
    ctx.strokeStyle = OUTAGE_INK;
    ctx.fillStyle = OUTAGE_INK;
    ctx.lineWidth = 1;
    ctx.setLineDash([2, 3]);
    for (const p of placed) {
      for (const x of [p.left, p.right]) {
        ctx.beginPath();
        ctx.moveTo(x, area.top);
        ctx.lineTo(x, area.bottom);
        ctx.stroke();
      }
    }
    ctx.textBaseline = 'top';
    // A label starts at its band's left edge, but moves left to stay inside the plot area near the right end.
    const starts = placed.map((p) => Math.max(area.left + 2, Math.min(p.left + 3, area.right - ctx.measureText(p.text).width - 2)));
    const rows = labelRows(ctx, placed.map((p, i) => ({ left: starts[i], text: p.text })));
    rows.forEach((row, i) => ctx.fillText(placed[i].text, starts[i], area.top + 2 + row * ROW_PX));
    ctx.restore();
  },
};
