import { LitElement, css, html } from 'lit';
import { customElement, property, query, state } from 'lit/decorators.js';
import type { JsonResult } from '../../src';
import { ChartController } from '../charts/chart-controller';
import type { OutageBand } from '../charts/outage-bands';
import { SHARE_QUANTITIES, shareDatasets } from '../charts/share-series';
import { timeChartOptions } from '../charts/time-chart-options';

/**
 * Share of variance over time: for the picked quantity, a stacked area of
 * each source's share of the total variance, in %, summing to 100 % at
 * every step. The seven sources with the largest peak share are named; the
 * rest are summed as "other sources". Outage edges are drawn over the areas.
 */
@customElement('sl-share-chart')
export class SlShareChart extends LitElement {
  static override styles = css`
    :host { display: block; }
    .picker { display: flex; gap: 4px; flex-wrap: wrap; align-items: center; font-size: 12px; margin-bottom: 6px; }
    .picker span { color: var(--sl-ink-soft); margin-right: 4px; }
    .picker button {
      font: inherit; border: 1px solid var(--sl-rule); background: var(--sl-panel); color: var(--sl-ink);
      border-radius: var(--sl-radius); padding: 2px 8px; cursor: pointer;
    }
    .picker button[aria-pressed='true'] { background: var(--sl-accent); border-color: var(--sl-accent); color: #fff; }
    .plot { position: relative; height: 340px; }
    p { font-size: 12px; color: var(--sl-ink-soft); margin: 6px 0 0; }
  `;

  /** The results whose `contributions` are plotted. */
  @property({ attribute: false }) result?: JsonResult;
  /** Outages to mark on the time axis (s from the mission start). */
  @property({ attribute: false }) outages: OutageBand[] = [];

  /** Key of `result.contributions` being shown. */
  @state() private quantity = 'heading';

  @query('canvas') private canvas!: HTMLCanvasElement;

  /** The chart.js instance, once drawn (for tests and image export). */
  readonly charts = new ChartController(this);

  override render() {
    const offered = SHARE_QUANTITIES.filter(([key]) => this.result?.contributions[key]);
    return html`
      <div class="picker" role="group" aria-label="Quantity">
        <span>Share of variance of</span>
        ${offered.map(([key, label]) => html`
          <button aria-pressed=${String(key === this.quantity)} data-quantity=${key} @click=${() => this.pick(key)}>${label}</button>`)}
      </div>
      <div class="plot"><canvas role="img" aria-label=${`share of variance of ${this.quantity} by source over time, in percent`}></canvas></div>
      <p>Each source's variance as a percentage of the total variance at that time; the areas add up to 100 %.</p>
    `;
  }

  override updated(): void {
    if (!this.result) return;
    this.charts.draw(this.canvas, {
      labels: this.result.series.t_s.slice(),
      datasets: shareDatasets(this.result, this.quantity),
      options: timeChartOptions({ yTitle: 'share of variance (%)', unit: '%', bands: this.outages, stacked: true, yMax: 100, t: this.result.series.t_s }),
    });
  }

  private pick(key: string): void {
    this.quantity = key;
  }
}

declare global {
  interface HTMLElementTagNameMap {
    'sl-share-chart': SlShareChart;
  }
}
