import { LitElement, css, html, svg } from 'lit';
import { customElement, property } from 'lit/decorators.js';
import type { InertialView } from '../../src';
import { formatSignificant } from '../../src';
import { roundLength } from '../charts/plan-geometry';
import { seriesColour } from '../styles/palette';

// A small drawing so that its text stays legible beside the plan view in half the findings' width.
const W = 300,
  H = 230,
  LEFT = 40,
  RIGHT = 10,
  TOP = 20,
  BOTTOM = 30;

/**
 * The nominal path's profile: height over horizontal distance travelled,
 * with the stretches flown during each outage drawn over it in the
 * sensor's colour, and round ticks on both axes.
 */
@customElement('sl-profile-view')
export class SlProfileView extends LitElement {
  static override styles = css`
    :host {
      display: block;
    }
    svg {
      width: 100%;
      height: auto;
      background: var(--sl-panel);
      border: 1px solid var(--sl-rule);
      border-radius: var(--sl-radius);
    }
    text {
      font: 11px var(--sl-font);
      fill: var(--sl-ink);
    }
    .path {
      fill: none;
      stroke: var(--sl-ink);
      stroke-width: 1.5;
    }
    .outage {
      fill: none;
      stroke-width: 6;
      stroke-linecap: round;
      opacity: 0.6;
    }
    .axis {
      stroke: var(--sl-ink-soft);
      stroke-width: 1;
      fill: none;
    }
    p {
      font-size: 12px;
      color: var(--sl-ink-soft);
      margin: 4px 0 0;
    }
  `;

  /** The 3-D view whose path is drawn. */
  @property({ attribute: false }) inertial?: InertialView;

  override render() {
    const v = this.inertial;
    if (!v || v.path.height.length === 0) return html`<p>No path to draw yet.</p>`;
    const { distanceM: d, height: h } = v.path;
    const d1 = Math.max(d[d.length - 1], 1);
    // A tenth of the height range free above and below, so a level flight does not lie on the frame.
    const pad = Math.max((Math.max(...h) - Math.min(...h)) / 10, 1);
    const h0 = Math.min(...h) - pad,
      h1 = Math.max(...h) + pad;
    const x = (m: number) => LEFT + (m / d1) * (W - LEFT - RIGHT);
    const y = (m: number) => H - BOTTOM - ((m - h0) / (h1 - h0)) * (H - TOP - BOTTOM);
    const points = (ks: number[]) => ks.map((k) => `${x(d[k]).toFixed(1)},${y(h[k]).toFixed(1)}`).join(' ');
    const all = d.map((_m, k) => k);
    const sensors = [...new Set(v.outages.map((o) => o.sensorId))];
    const dStep = roundLength(d1 / 3),
      hStep = roundLength((h1 - h0) / 4);
    const dTicks = Array.from({ length: Math.floor(d1 / dStep) + 1 }, (_v, i) => i * dStep);
    const hTicks = Array.from(
      { length: Math.floor((h1 - h0) / hStep) + 1 },
      (_v, i) => Math.ceil(h0 / hStep) * hStep + i * hStep,
    ).filter((t) => t <= h1 && t >= h0);
    return html`
      <svg
        viewBox="0 0 ${W} ${H}"
        role="img"
        aria-label="Profile of the nominal path: height over horizontal distance, with outages"
      >
        <path class="axis" d="M${LEFT},${TOP} V${H - BOTTOM} H${W - RIGHT}"></path>
        ${dTicks.map((t) => svg`<text x=${x(t).toFixed(1)} y=${H - BOTTOM + 14}
          text-anchor="middle">${formatSignificant(t, 3)}</text>`)}
        ${hTicks.map((t) => svg`<text x=${LEFT - 4} y=${(y(t) + 4).toFixed(1)}
          text-anchor="end">${formatSignificant(t, 4)}</text>`)}
        <text x=${W - RIGHT} y=${H - 3} text-anchor="end">distance flown (m)</text>
        <text x="4" y="12">height (m)</text>
        ${v.outages.map((o) => {
          const ks = all.filter((k) => v.t[k] >= o.startS && v.t[k] <= o.endS);
          return ks.length > 1
            ? svg`<polyline class="outage" data-outage=${o.id}
                stroke=${seriesColour(sensors.indexOf(o.sensorId))} points=${points(ks)}></polyline>`
            : null;
        })}
        <polyline class="path" points=${points(all)}></polyline>
      </svg>
      <p>
        ${sensors.length
          ? `Coloured: flown while ${sensors.join(', ')} ${sensors.length > 1 ? 'are' : 'is'} out.`
          : 'No outages.'}
      </p>
    `;
  }
}

declare global {
  interface HTMLElementTagNameMap {
    'sl-profile-view': SlProfileView;
  }
}
