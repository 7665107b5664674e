import { LitElement, css, html } from 'lit';
import { customElement, property, query } from 'lit/decorators.js';
import type { ViewResult } from '../../src';
import { ChartController } from '../charts/chart-controller';
import { INERTIAL_PLOTS, inertialPlotDatasets, type InertialPlotSpec } from '../charts/inertial-chart-data';
import { timeChartOptions } from '../charts/time-chart-options';

/**
 * One σ-over-time plot of a 3-D budget (horizontal position, height,
 * attitude or velocity): the 1σ lines, the requirements on those
 * quantities with their limits, and the aiding outages shaded.
 */
@customElement('sl-inertial-chart')
export class SlInertialChart extends LitElement {
  static override styles = css`
    :host {
      display: block;
    }
    figure {
      margin: 0;
    }
    figcaption {
      font-size: 12px;
      font-weight: 600;
      color: var(--sl-ink);
      margin-bottom: 2px;
    }
    .plot {
      position: relative;
      height: 220px;
    }
  `;

  @property({ attribute: false }) view?: ViewResult;
  /** Which plot: a key of INERTIAL_PLOTS (position, height, attitude, velocity). */
  @property() kind = 'position';

  @query('canvas') private canvas!: HTMLCanvasElement;
  /** The chart.js instance, once drawn (for tests). */
  readonly charts = new ChartController(this);

  private get spec(): InertialPlotSpec {
    return INERTIAL_PLOTS.find((p) => p.key === this.kind) ?? INERTIAL_PLOTS[0];
  }

  override render() {
    return html` <figure>
      <figcaption>${this.spec.title} over time</figcaption>
      <div class="plot">
        <canvas role="img" aria-label=${`${this.spec.title} over time, with requirement limits and outages`}></canvas>
      </div>
    </figure>`;
  }

  override updated(): void {
    const v = this.view?.inertial;
    if (!v) return;
    const windows = new Map(v.verdicts.map((r) => [r.id, r.windowS]));
    this.charts.draw(this.canvas, {
      labels: v.t.slice(),
      datasets: inertialPlotDatasets(v, this.view!.curves, this.spec, windows),
      options: timeChartOptions({ yTitle: this.spec.title, unit: this.spec.unit, bands: v.outages, t: v.t }),
    });
  }
}

declare global {
  interface HTMLElementTagNameMap {
    'sl-inertial-chart': SlInertialChart;
  }
}
