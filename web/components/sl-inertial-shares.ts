import { LitElement, css, html } from 'lit';
import { customElement, property, query, state } from 'lit/decorators.js';
import type { InertialView, JsonResult } from '../../src';
import { ChartController } from '../charts/chart-controller';
import { num } from '../charts/findings-text';
import { shareDatasets } from '../charts/share-series';
import { timeChartOptions } from '../charts/time-chart-options';

/** Quantities offered in the 3-D share picker, in order. */
const OFFERED = ['drms', 'height', 'yaw', 'roll', 'pitch', 'north', 'east', 'velocityNorth', 'velocityDown'];

/**
 * Share of variance over time for a 3-D budget: the picked quantity's
 * stacked areas (the planar share chart's datasets, fed the 3-D sources),
 * and a table of each source's share at the mission's end with the
 * document row that owns it.
 */
@customElement('sl-inertial-shares')
export class SlInertialShares extends LitElement {
  static override styles = css`
    :host {
      display: block;
      font-size: 12px;
    }
    .picker {
      display: flex;
      gap: 4px;
      flex-wrap: wrap;
      align-items: center;
      margin-bottom: 6px;
    }
    .picker button {
      font: inherit;
      border: 1px solid var(--sl-rule);
      background: var(--sl-panel);
      color: var(--sl-ink);
      border-radius: var(--sl-radius);
      padding: 2px 8px;
      cursor: pointer;
    }
    .picker button[aria-pressed='true'] {
      background: var(--sl-accent);
      border-color: var(--sl-accent);
      color: #fff;
    }
    .plot {
      position: relative;
      height: 300px;
    }
    table {
      border-collapse: collapse;
      width: 100%;
      margin-top: 8px;
    }
    th,
    td {
      text-align: left;
      padding: 2px 6px;
      border-bottom: 1px solid var(--sl-rule);
    }
    td.num {
      text-align: right;
      font-variant-numeric: tabular-nums;
    }
    code {
      font: 11px var(--sl-mono);
    }
    p {
      color: var(--sl-ink-soft);
      margin: 4px 0;
    }
  `;

  @property({ attribute: false }) inertial?: InertialView;
  @state() private quantity = 'drms';
  @query('canvas') private canvas!: HTMLCanvasElement;
  /** The chart.js instance, once drawn (for tests). */
  readonly charts = new ChartController(this);

  override render() {
    const v = this.inertial;
    const entries = v?.shares[this.quantity] ?? [];
    const end = entries.map((e) => e.variance[e.variance.length - 1] ?? 0);
    const total = end.reduce((s, x) => s + x, 0);
    const ranked = entries
      .map((e, i) => ({ e, share: total > 0 ? (100 * end[i]) / total : 0 }))
      .sort((a, b) => b.share - a.share);
    return html`
      <div class="picker" role="group" aria-label="Quantity">
        <span>Share of variance of</span>
        ${OFFERED.filter((q) => v?.lines[q]).map(
          (q) =>
            html` <button
              aria-pressed=${String(q === this.quantity)}
              data-quantity=${q}
              @click=${() => (this.quantity = q)}
            >
              ${v!.lines[q].label}
            </button>`,
        )}
      </div>
      ${
        entries.length
          ? html`<div class="plot">
              <canvas
                role="img"
                aria-label=${`share of variance of ${this.quantity} by source over time, in percent`}
              ></canvas>
            </div>`
          : html`<p>Shares follow once every source's contribution is computed.</p>`
      }
      <table aria-label="Share at the end of the mission">
        <thead>
          <tr>
            <th>source</th>
            <th>row in the budget</th>
            <th>share at the end</th>
          </tr>
        </thead>
        <tbody>
          ${ranked.map(
            ({ e, share }) =>
              html`<tr>
                <td>${e.sourceId} (${e.label})</td>
                <td><code>${e.path ?? '—'}</code></td>
                <td class="num">${num(share)} %</td>
              </tr>`,
          )}
        </tbody>
      </table>
    `;
  }

  override updated(): void {
    const v = this.inertial;
    const entries = v?.shares[this.quantity];
    if (!v || !entries?.length || !this.canvas) return;
    // The planar share datasets read `contributions[quantity]` (source id -> variance per step); the 3-D sources
    // fit that shape.
    const contributions = { [this.quantity]: Object.fromEntries(entries.map((e) => [e.sourceId, e.variance])) };
    this.charts.draw(this.canvas, {
      labels: v.t.slice(),
      datasets: shareDatasets({ contributions } as unknown as JsonResult, this.quantity),
      options: timeChartOptions({
        yTitle: 'share of variance (%)',
        unit: '%',
        bands: v.outages,
        stacked: true,
        yMax: 100,
        t: v.t,
      }),
    });
  }
}

declare global {
  interface HTMLElementTagNameMap {
    'sl-inertial-shares': SlInertialShares;
  }
}
