import { LitElement, css, html, nothing } from 'lit';
import { customElement, property, query } from 'lit/decorators.js';
import { ChartController } from '../charts/chart-controller';
import type { CalibrationGroup } from '../charts/calibration-groups';
import type { OutageBand } from '../charts/outage-bands';
import { timeChartOptions } from '../charts/time-chart-options';
import { seriesColour } from '../styles/palette';

/**
 * σ over time of the calibration states that share one unit (gyro biases
 * in deg/h, scale factors in ppm, ...): how well the aiding pins each of
 * them down, with the outages shaded. The y axis is logarithmic because
 * calibration σ often falls by decades. A new group updates the same chart.
 */
@customElement('sl-calibration-chart')
export class SlCalibrationChart extends LitElement {
  static override styles = css`
    :host { display: block; }
    h3 { font-size: 12px; margin: 0 0 2px; }
    .plot { position: relative; height: 220px; }
  `;

  /** Times of the σ values, s from the mission start. */
  @property({ attribute: false }) t: number[] = [];
  /** The states to plot, σ in `group.unit`. */
  @property({ attribute: false }) group?: CalibrationGroup;
  /** Outages to shade (s from the mission start). */
  @property({ attribute: false }) outages: OutageBand[] = [];

  @query('canvas') private canvas!: HTMLCanvasElement;

  /** The chart.js instance, once drawn (for tests and image export). */
  readonly charts = new ChartController(this);

  override render() {
    const g = this.group;
    if (!g) return nothing;
    const si = g.unit === g.unitSI ? '' : g.unitSI === '1' || g.unitSI === '' ? ' (engine states as plain ratios)' : ` (engine states in ${g.unitSI})`;
    return html`
      <h3>${g.title}: 1σ in ${g.unit}${si}</h3>
      <div class="plot"><canvas role="img" aria-label=${`1σ of ${g.title} over time, in ${g.unit}`}></canvas></div>
    `;
  }

  override updated(): void {
    const g = this.group;
    if (!g) return;
    this.charts.draw(this.canvas, {
      labels: this.t.slice(),
      datasets: g.states.map((s, i) => ({ label: s.state, data: s.sigma, borderColor: seriesColour(i), backgroundColor: seriesColour(i), fill: false })),
      options: timeChartOptions({ yTitle: `1σ (${g.unit}, log scale)`, unit: g.unit, bands: this.outages, t: this.t, logarithmic: true }),
    });
  }
}

declare global {
  interface HTMLElementTagNameMap {
    'sl-calibration-chart': SlCalibrationChart;
  }
}
