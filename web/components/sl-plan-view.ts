import { LitElement, css, html, nothing, svg } from 'lit';
import { customElement, property } from 'lit/decorators.js';
import type { PlanView } from '../../src';
import { planGeometry, polylinePoints, type PlanGeometry, type Px } from '../charts/plan-geometry';
import { formatSignificant } from '../../src';
import { seriesColour } from '../styles/palette';
import { placeOutageLabels, type PlacedLabel } from '../charts/plan-labels';

const W = 520, H = 340, MARGIN = 34;

/** Label positions that do not print over each other: each moves down a line until it is clear. */
function placeLabels(anchors: { at: Px; text: string }[]): Px[] {
  const boxes: { x0: number; x1: number; y: number }[] = [];
  return anchors.map(({ at, text }) => {
    const x0 = at.x + 8, x1 = x0 + text.length * 6;
    let y = at.y - 6;
    while (boxes.some((b) => Math.abs(b.y - y) < 11 && x0 < b.x1 && b.x0 < x1)) y += 12;
    boxes.push({ x0, x1, y });
    return { x: x0, y };
  });
}

/**
 * The nominal path seen from above (north up, east right, one scale for
 * both): start and end markers, the stretches driven during each outage
 * highlighted in the sensor's colour and labelled, landmarks as labelled
 * triangles, a scale bar in metres and a north arrow.
 */
@customElement('sl-plan-view')
export class SlPlanView extends LitElement {
  static override styles = css`
    :host { display: block; }
    svg { width: 100%; height: auto; background: var(--sl-panel); border: 1px solid var(--sl-rule); border-radius: var(--sl-radius); }
    text { font: 11px var(--sl-font); fill: var(--sl-ink); paint-order: stroke; stroke: var(--sl-panel); stroke-width: 3px; }
    .path { fill: none; stroke: var(--sl-ink); stroke-width: 1.5; }
    .outage { fill: none; stroke-linecap: round; stroke-linejoin: round; opacity: 0.6; }
    .landmark path { fill: var(--sl-panel); stroke: var(--sl-accent); stroke-width: 1.5; }
    .rule { stroke: var(--sl-ink); stroke-width: 1.5; fill: none; }
    .arrowhead { fill: var(--sl-ink); }
    ul { display: flex; flex-wrap: wrap; gap: 4px 14px; list-style: none; padding: 0; margin: 4px 0 0; font-size: 12px; color: var(--sl-ink-soft); }
    .leader { stroke: var(--sl-ink-soft); stroke-width: 0.8; fill: none; }
    .badge circle { fill: var(--sl-panel); stroke: var(--sl-ink); stroke-width: 1; }
    .badge text { font-size: 10px; text-anchor: middle; stroke: none; }
    .swatch { display: inline-block; width: 16px; height: 6px; border-radius: 3px; margin-right: 4px; vertical-align: middle; opacity: 0.6; }
  `;

  /** The path, landmarks and outages to draw (north, east in m; times in s). */
  @property({ attribute: false }) plan?: PlanView;

  override render() {
    const plan = this.plan;
    if (!plan || plan.north.length === 0) return html`<p>No path to draw yet.</p>`;
    const g = planGeometry(plan, W, H, MARGIN);
    const sensors = [...new Set(plan.outages.map((o) => o.sensorId))];
    const colour = (sensorId: string) => seriesColour(sensors.indexOf(sensorId));
    const outageItems = g.outages.map((o) => ({ at: o.path[Math.floor(o.path.length / 2)], text: `${o.sensorId} outage ${o.id}` }));
    const placed = placeOutageLabels(outageItems, [...g.path, ...g.landmarks.map((l) => l.at)], W, H);
    return html`
      <svg viewBox="0 0 ${W} ${H}" role="img" aria-label="Nominal path from above, north up, with outages and landmarks">
        ${g.outages.map((o, i) => svg`<polyline class="outage" data-outage=${o.id} stroke=${colour(o.sensorId)} stroke-width=${Math.max(4, 10 - 3 * i)} points=${polylinePoints(o.path)}></polyline>`)}
        <polyline class="path" points=${polylinePoints(g.path)}></polyline>
        ${this.markers(g)}
        ${this.labels(g)}
        ${placed ? this.outageLabels(placed) : this.outageBadges(outageItems.map((o) => o.at))}
        ${this.scaleAndNorth(g)}
      </svg>
      <ul>
        <li>● start, ■ end</li>
        ${plan.landmarks.length ? html`<li>△ landmark</li>` : nothing}
        ${sensors.map((s) => html`<li><span class="swatch" style=${`background: ${colour(s)}`}></span>driven while ${s} is out</li>`)}
        ${placed ? nothing : outageItems.map((o, i) => html`<li class="numbered">${i + 1}: ${o.text}</li>`)}
      </ul>
    `;
  }

  private markers(g: PlanGeometry) {
    const start = g.path[0], end = g.path[g.path.length - 1];
    return svg`
      <circle class="start" cx=${start.x} cy=${start.y} r="5" fill="var(--sl-accent)"></circle>
      <rect class="end" x=${end.x - 4} y=${end.y - 4} width="8" height="8" fill="var(--sl-ink)"></rect>
      ${g.landmarks.map((l) => svg`
        <g class="landmark" data-landmark=${l.id} transform="translate(${l.at.x.toFixed(1)} ${l.at.y.toFixed(1)})">
          <title>${l.sensorId} landmark ${l.id}</title>
          <path d="M0,-6 L5.5,4 L-5.5,4 Z"></path>
        </g>`)}
    `;
  }

  /** Outage labels in a free margin, each with a leader line to its stretch of track. */
  private outageLabels(placed: PlacedLabel[]) {
    return placed.map((p) => svg`
      <path class="leader" d="M${p.at.x.toFixed(1)},${p.at.y.toFixed(1)} L${(p.label.x + (p.anchor === 'start' ? -3 : 3)).toFixed(1)},${(p.label.y - 4).toFixed(1)}"></path>
      <text class="outage-label" x=${p.label.x.toFixed(1)} y=${p.label.y.toFixed(1)} text-anchor=${p.anchor}>${p.text}</text>`);
  }

  /** Numbers on the track where no margin is wide enough for the labels (the list under the drawing names them). */
  private outageBadges(points: Px[]) {
    return points.map((at, i) => svg`<g class="badge" transform="translate(${(at.x + 9).toFixed(1)} ${(at.y - 9).toFixed(1)})">
      <circle r="6.5"></circle><text y="3.5">${i + 1}</text></g>`);
  }

  private labels(g: PlanGeometry) {
    const anchors = [
      { at: g.path[0], text: 'start' },
      ...g.landmarks.map((l) => ({ at: l.at, text: l.id })),
    ];
    return placeLabels(anchors).map((p, i) => svg`<text x=${p.x.toFixed(1)} y=${p.y.toFixed(1)}>${anchors[i].text}</text>`);
  }

  private scaleAndNorth(g: PlanGeometry) {
    const x0 = 12, y = H - 14, x1 = x0 + g.scaleBar.px;
    return svg`
      <g class="scale-bar">
        <path class="rule" d="M${x0},${y - 4} V${y} H${x1.toFixed(1)} V${y - 4}"></path>
        <text x=${x0} y=${y - 7}>${formatSignificant(g.scaleBar.metres, 3)} m</text>
      </g>
      <g class="north-arrow" transform="translate(${W - 20} 12)">
        <path class="arrowhead" d="M0,0 L5,10 L0,7 L-5,10 Z"></path>
        <path class="rule" d="M0,7 V30"></path>
        <text x="-4" y="43">N</text>
      </g>
    `;
  }
}

declare global {
  interface HTMLElementTagNameMap {
    'sl-plan-view': SlPlanView;
  }
}
