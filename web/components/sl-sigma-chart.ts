import { LitElement, css, html, nothing } from 'lit';
import { customElement, property, query } from 'lit/decorators.js';
import type { ViewResult } from '../../src';
import { ChartController } from '../charts/chart-controller';
import { sigmaChartAxis, sigmaPlot, type SigmaChartKind, type SigmaPlot } from '../charts/sigma-series';
import { num, seconds } from '../charts/findings-text';
import { timeChartOptions } from '../charts/time-chart-options';

/**
 * One σ-over-time plot (heading in deg, position in m, or speed in m/s):
 * the 1σ series, the requirements' curves at their levels, each limit as a
 * dashed line over its window, and the outages shaded. A new `view`
 * updates the same chart in place.
 */
@customElement('sl-sigma-chart')
export class SlSigmaChart extends LitElement {
  static override styles = css`
    :host { display: block; }
    figure { margin: 0; }
    figcaption { font-size: 12px; font-weight: 600; color: var(--sl-ink); margin-bottom: 2px; }
    .plot { position: relative; height: 230px; }
    .cut { font-size: 11px; color: var(--sl-ink-soft); margin: 2px 0 0; }
  `;

  /** The results to plot; nothing is drawn without `view.result`. */
  @property({ attribute: false }) view?: ViewResult;
  /** Which plot: 'heading', 'position' or 'speed'. */
  @property() kind: SigmaChartKind = 'heading';

  @query('canvas') private canvas!: HTMLCanvasElement;
  private plot?: SigmaPlot;

  /** The chart.js instance behind the plot, once drawn (for tests and image export). */
  readonly charts = new ChartController(this);

  override render() {
    const { yTitle, unit } = sigmaChartAxis(this.kind);
    const cut = this.plot?.cut;
    return html`
      <figure>
        <figcaption>${yTitle} over time</figcaption>
        <div class="plot"><canvas role="img" aria-label=${`${yTitle} over time, with requirement limits and outages`}></canvas></div>
        ${cut ? html`<p class="cut">The axis stops at ${num(this.plot!.yMax!)} ${unit}; the curves reach ${num(cut.value)} ${unit} at ${seconds(cut.tS)}.</p>` : nothing}
      </figure>
    `;
  }

  override willUpdate(): void {
    this.plot = this.view?.result ? sigmaPlot(this.view, this.kind) : undefined;
  }

  override updated(): void {
    if (!this.view?.result || !this.plot) return;
    const { unit, yTitle } = sigmaChartAxis(this.kind);
    this.charts.draw(this.canvas, {
      labels: this.view.result.series.t_s.slice(),
      datasets: this.plot.datasets,
      options: timeChartOptions({ yTitle, unit, bands: this.view.plan?.outages ?? [], yMax: this.plot.yMax, t: this.view.result.series.t_s }),
    });
  }
}

declare global {
  interface HTMLElementTagNameMap {
    'sl-sigma-chart': SlSigmaChart;
  }
}
