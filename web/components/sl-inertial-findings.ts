import { LitElement, css, html, nothing } from 'lit';
import { customElement, property, state } from 'lit/decorators.js';
import type { PlanView, ViewResult } from '../../src';
import { num, seconds } from '../charts/findings-text';
import { levelText } from '../charts/findings-text';
import { tabBarStyles } from '../inertial/quantity-field';
import './sl-inertial-chart';
import './sl-inertial-shares';
import './sl-plan-view';
import './sl-profile-view';

type Tab = 'overview' | 'shares' | 'calibration';
const TABS: [Tab, string][] = [
  ['overview', 'Over time'],
  ['shares', 'Shares'],
  ['calibration', 'Calibration'],
];

/**
 * The results side of the page for a 3-D budget: requirement verdicts,
 * σ over time (horizontal position, height, attitude, velocity), the path
 * from above beside its profile (height over distance), shares of variance
 * by source, and the calibration states' σ per axis.
 */
@customElement('sl-inertial-findings')
export class SlInertialFindings extends LitElement {
  static override styles = [
    tabBarStyles,
    css`
    :host {
      display: block;
      padding: 0 12px 24px;
      font-size: 13px;
      color: var(--sl-ink);
      background: var(--sl-paper);
    }
    h3 {
      font-size: 13px;
      margin: 14px 0 6px;
      color: var(--sl-ink-soft);
      text-transform: uppercase;
      letter-spacing: 0.04em;
    }
    table {
      border-collapse: collapse;
      width: 100%;
      background: var(--sl-panel);
    }
    th,
    td {
      text-align: left;
      padding: 3px 6px;
      border-bottom: 1px solid var(--sl-rule);
      font-size: 12px;
    }
    td.num {
      text-align: right;
      font-variant-numeric: tabular-nums;
    }
    .pass {
      color: var(--sl-pass, #1a7f37);
      font-weight: 600;
    }
    .fail {
      color: var(--sl-fail);
      font-weight: 600;
    }
    .charts {
      display: grid;
      gap: 10px;
    }
    .views {
      display: grid;
      grid-template-columns: 1fr 1fr;
      gap: 8px;
      align-items: start;
    }
    .stale {
      opacity: 0.6;
    }
    .note {
      color: var(--sl-ink-soft);
      font-size: 12px;
    }
    h3 span.unit-symbol {
      text-transform: none;
    }
  `,
  ];

  @property({ attribute: false }) view?: ViewResult;
  @property({ type: Boolean }) stale = false;
  @state() private tab: Tab = 'overview';

  override render() {
    const v = this.view?.inertial;
    return html`
      <div role="tablist" aria-label="3-D results">
        ${TABS.map(([key, label]) =>
            html`<button role="tab" aria-selected=${String(this.tab === key)}
              @click=${() => (this.tab = key)}>${label}</button>`)}
      </div>
      ${
        !v
          ? html`<p class="note">
              ${this.view?.blocked ? `Nothing computed: ${this.view.blocked.message}` : 'Computing…'}
            </p>`
          : html` <div class=${this.stale ? 'stale' : ''}>
              ${
                this.tab === 'shares'
                  ? html`<h3>Share of variance</h3>
                      <sl-inertial-shares .inertial=${v}></sl-inertial-shares>`
                  : this.tab === 'calibration'
                    ? this.calibration()
                    : this.overview()
              }
            </div>`
      }
    `;
  }

  private overview() {
    const v = this.view!.inertial!;
    const plan: PlanView = { north: v.path.north, east: v.path.east, t: v.t, landmarks: [], outages: v.outages };
    return html`
      <h3>Requirements</h3>
      ${
        v.verdicts.length
          ? html` <table aria-label="Requirement verdicts">
              <thead>
                <tr>
                  <th>requirement</th>
                  <th>quantity</th>
                  <th>limit</th>
                  <th>worst</th>
                  <th>at</th>
                  <th>verdict</th>
                </tr>
              </thead>
              <tbody>
                ${v.verdicts.map(
                  (r) =>
                    html` <tr data-requirement=${r.id}>
                      <td>${r.id}</td>
                      <td>${r.quantity} ${levelText(r.level)}</td>
                      <td class="num">${num(r.limit)} ${r.unit}</td>
                      <td class="num">${num(r.worst)} ${r.unit}</td>
                      <td class="num">${seconds(r.worstAtS)}</td>
                      <td class=${r.pass ? 'pass' : 'fail'}>
                        ${r.pass ? 'meets' : `exceeds from ${seconds(r.firstExceedS!)}`}
                      </td>
                    </tr>`,
                )}
              </tbody>
            </table>`
          : html`<p class="note">No requirements.</p>`
      }
      ${v.issues.length ?
          html`<p class="note" role="status">Numerical conditions: ${v.issues.join('; ')}</p>` : nothing}
      <h3>Error over time</h3>
      <div class="charts">
        ${['position', 'height', 'attitude', 'velocity'].map((k) =>
            html`<sl-inertial-chart .view=${this.view} kind=${k}></sl-inertial-chart>`)}
      </div>
      <h3>Path: plan and profile</h3>
      <div class="views">
        <sl-plan-view .plan=${plan}></sl-plan-view><sl-profile-view .inertial=${v}></sl-profile-view>
      </div>
    `;
  }

  private calibration() {
    const v = this.view!.inertial!;
    return html` <h3>Calibration states <span class="unit-symbol">(1σ)</span></h3>
      <table aria-label="Calibration states">
        <thead>
          <tr>
            <th>state</th>
            <th>start</th>
            <th>end</th>
          </tr>
        </thead>
        <tbody>
          ${v.calibration.map(
            (c) =>
              html`<tr>
                <td>${c.label}</td>
                <td class="num">${num(c.values[0])} ${c.unit}</td>
                <td class="num">${num(c.values[c.values.length - 1])} ${c.unit}</td>
              </tr>`,
          )}
        </tbody>
      </table>`;
  }
}

declare global {
  interface HTMLElementTagNameMap {
    'sl-inertial-findings': SlInertialFindings;
  }
}
