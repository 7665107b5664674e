import type { ChartDataset, ChartOptions } from 'chart.js';
import type { ReactiveController, ReactiveControllerHost } from 'lit';
import { Chart } from './register-charts';
import { outageBands } from './outage-bands';
import { keptIndices, pick } from './decimate-series';

/** A line dataset of the findings: values by step, null where there is nothing to draw. */
export type LineDataset = ChartDataset<'line', (number | null)[]>;

/** What one chart shows: x values (time in s), datasets over them and the options. */
export interface LineChartData {
  labels: number[];
  datasets: LineDataset[];
  options: ChartOptions<'line'>;
}

/**
 * Owns one chart.js line chart for a lit component: creates it on the
 * first `draw`, then updates it in place (`chart.update('none')`) so a
 * recompute costs no new chart; destroys it when the host leaves the page
 * and asks for a redraw when the host comes back. Datasets with the same
 * label keep their object (and so their shown/hidden state in the legend).
 */
export class ChartController implements ReactiveController {
  /** The chart.js instance, once drawn. */
  chart?: Chart<'line', (number | null)[], number>;

  constructor(private readonly host: ReactiveControllerHost) {
    host.addController(this);
  }

  hostConnected(): void {
    if (!this.chart) this.host.requestUpdate();
  }

  hostDisconnected(): void {
    this.chart?.destroy();
    this.chart = undefined;
  }

  /**
   * Draws `data` on `canvas`: a new chart the first time (or on a new canvas), an in-place update afterwards.
   * A very long series is thinned for drawing only (decimate-series.ts); the result's numbers stay exact.
   */
  draw(canvas: HTMLCanvasElement, full: LineChartData): void {
    const data = thinned(full, Math.max(500, canvas.clientWidth || 1000));
    const chart = this.chart;
    if (!chart || chart.canvas !== canvas) {
      chart?.destroy();
      this.chart = new Chart(canvas, {
        type: 'line',
        data: { labels: data.labels, datasets: data.datasets },
        options: data.options,
        plugins: [outageBands],
      });
      return;
    }
    const byLabel = new Map(chart.data.datasets.map((d) => [d.label, d]));
    chart.data.labels = data.labels;
    chart.data.datasets = data.datasets.map((next) => {
      const kept = byLabel.get(next.label);
      return kept ? Object.assign(kept, next) : next;
    });
    chart.options = data.options;
    chart.update('none');
  }
}

/** The chart's data with every series at the steps keptIndices chooses (the same object when nothing is thinned). */
function thinned(data: LineChartData, buckets: number): LineChartData {
  const kept = keptIndices(data.labels.length, data.datasets.map((d) => d.data), buckets);
  if (kept.length === data.labels.length) return data;
  return {
    ...data,
    labels: pick(data.labels, kept),
    datasets: data.datasets.map((d) => ({ ...d, data: pick(d.data, kept) })),
  };
}
