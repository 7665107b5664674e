import { LitElement, css, html, nothing } from 'lit';
import { customElement, property, query } from 'lit/decorators.js';
import { ChartController } from '../charts/chart-controller';
import { allanChartData } from '../logs/allan-chart-data';
import type { AllanOutcome } from '../logs/log-protocol';

/**
 * The overlapping Allan deviation of a log on log-log axes: the measured
 * curve with its IEEE Std 952 band shaded, each term of the whole-curve fit
 * dashed, and their sum. A new outcome updates the same chart.
 */
@customElement('sl-log-allan-chart')
export class SlLogAllanChart extends LitElement {
  static override styles = css`
    :host { display: block; }
    h3 { font-size: 12px; margin: 8px 0 2px; }
    .plot { position: relative; height: 320px; background: var(--sl-panel); }
    .note { font-size: 11px; color: var(--sl-ink-soft); margin: 4px 0; max-width: 70ch; }
  `;

  /** The computed log; nothing is drawn without one. */
  @property({ attribute: false }) outcome?: AllanOutcome;

  @query('canvas') private canvas!: HTMLCanvasElement;

  /** The chart.js instance, once drawn (for tests and image export). */
  readonly charts = new ChartController(this);

  override render() {
    const o = this.outcome;
    if (!o) return nothing;
    const unit = o.result.adevUnit;
    return html`
      <h3>Overlapping Allan deviation of ${o.fileName}, in ${unit}</h3>
      <div class="plot"><canvas role="img" aria-label=${`Allan deviation in ${unit} against cluster time in s, both on log scales, with the fitted noise terms`}></canvas></div>
      <p class="note">The shaded band is σ(1 ± δ) with the IEEE Std 952 percentage error δ = 1/√(2(N/n − 1)). These bounds understate
        the real scatter of the estimates, so read the band as a rough guide, not as a confidence interval.
        Dashed lines are the terms of the whole-curve fit; the solid dark line is their sum.</p>
    `;
  }

  override updated(): void {
    if (this.outcome) this.charts.draw(this.canvas, allanChartData(this.outcome));
  }
}

declare global {
  interface HTMLElementTagNameMap {
    'sl-log-allan-chart': SlLogAllanChart;
  }
}
