import { LitElement, css, html, nothing } from 'lit';
import { customElement, property } from 'lit/decorators.js';
import type { ViewResult } from '../../src';
import { uniqueId } from '../../src';
import type { DocumentStore } from '../state/document-store';
import { editorStyles } from '../grid/editor-styles';
import { itemProblem } from '../grid/view-lookup';
import { editInertial, inertialDoc } from '../inertial/inertial-store';
import { quantityField } from '../inertial/quantity-field';
import './sl-quantity';

/** Attitude rules of the 3-D path (budgets/FORMAT.md, "3-D budgets", Mission), with what each means. */
const ATTITUDE_RULES: [rule: 'level' | 'banked' | 'ground', text: string][] = [
  ['level', 'level: pitch and roll zero (a multirotor)'],
  ['banked', 'banked: pitch from the climb, roll from the turn (fixed wing)'],
  ['ground', 'ground: pitch from the slope, roll zero (a vehicle)'],
];

/** The four start uncertainties: document key, label, dimension, whether it has a vertical cell. */
const START_SIGMAS = [
  ['initialPosition', 'position', 'length', true],
  ['initialVelocity', 'velocity', 'speed', true],
  ['initialTilt', 'tilt (about north, east)', 'angle', false],
  ['initialHeading', 'heading', 'angle', false],
] as const;

/**
 * The 3-D mission: the start (north, east, heading, latitude, height), the
 * attitude rule, the four start uncertainties (1σ; position and velocity
 * with a horizontal and a vertical cell) and the legs with their vertical
 * speed (up positive).
 */
@customElement('sl-inertial-mission')
export class SlInertialMission extends LitElement {
  static override styles = [
    editorStyles,
    css`
      :host {
        display: block;
      }
      h3 span.unit-symbol {
        text-transform: none;
      }
      .start {
        display: grid;
        grid-template-columns: repeat(5, 1fr);
        gap: 4px 8px;
      }
      .start label,
      .sigmas label {
        font-size: 11px;
        color: var(--sl-ink-soft);
        display: block;
      }
      .sigmas td:first-child {
        width: 28%;
      }
      col.seg-id {
        width: 13%;
      }
      col.del {
        width: 30px;
      }
    `,
  ];

  @property({ attribute: false }) store!: DocumentStore;
  @property({ attribute: false }) view?: ViewResult;

  override render() {
    const m = inertialDoc(this.store).mission;
    const q = (path: string, label: string, dims: string[], optional = false) =>
      quantityField(this.store, this.view, path, label, dims, optional);
    const startCells = [
      ['north', 'length'],
      ['east', 'length'],
      ['heading', 'angle'],
      ['latitude', 'angle'],
      ['height', 'length'],
    ] as const;
    return html`
      <h3>Start</h3>
      <div class="start">
        ${startCells.map(([k, dim]) =>
            html`<div><label>${k}</label>${q(`mission.start.${k}`, `Start ${k}`, [dim])}</div>`)}
      </div>
      <div class="bar">
        <label class="inline"
          >attitude
          <select aria-label="Attitude rule" @change=${this.setRule}>
            ${ATTITUDE_RULES.map(([r, text]) =>
                html`<option value=${r} ?selected=${r === m.attitudeRule}>${text}</option>`)}
          </select></label
        >
      </div>
      <h3>Start uncertainty <span class="unit-symbol">(1σ)</span></h3>
      <table class="sigmas" aria-label="Start uncertainty">
        <thead>
          <tr>
            <th>source</th>
            <th>horizontal (per axis)</th>
            <th>vertical</th>
          </tr>
        </thead>
        <tbody>
          ${START_SIGMAS.map(
            ([key, label, dim, vertical]) =>
              html` <tr>
                <td>${label}</td>
                <td>${q(`mission.${key}`, `Initial ${label}`, [dim])}</td>
                <td>${vertical ? q(`mission.${key}.vertical`, `Initial ${label} vertical`, [dim]) : nothing}</td>
              </tr>`,
          )}
        </tbody>
      </table>
      <h3>Legs</h3>
      <table aria-label="Legs">
        <colgroup>
          <col class="seg-id" />
          <col />
          <col />
          <col />
          <col />
          <col />
          <col class="del" />
        </colgroup>
        <thead>
          <tr>
            <th>leg</th>
            <th>duration</th>
            <th>speed</th>
            <th>speed at end</th>
            <th>turn rate</th>
            <th>vertical speed (up)</th>
            <th><span class="sr-only">delete</span></th>
          </tr>
        </thead>
        <tbody>
          ${m.segments.map((s, i) => {
            const p = `mission.segments[${i}]`;
            const name = s.id ?? `leg ${i + 1}`;
            const problem = itemProblem(this.view, p);
            return html` <tr>
                <td>${name}</td>
                <td>${q(`${p}.duration`, `${name} duration`, ['time'])}</td>
                <td>${q(`${p}.speed`, `${name} speed`, ['speed'])}</td>
                <td>${q(`${p}.speedEnd`, `${name} speed at end`, ['speed'], true)}</td>
                <td>${q(`${p}.turnRate`, `${name} turn rate`, ['angular-rate'])}</td>
                <td>${q(`${p}.verticalSpeed`, `${name} vertical speed`, ['speed'], true)}</td>
                <td>
                  <button
                    class="icon"
                    aria-label=${`Delete ${name}`}
                    ?disabled=${m.segments.length < 2}
                    @click=${() => this.removeLeg(i)}
                  >
                    ×
                  </button>
                </td>
              </tr>
              ${
                problem
                  ? html`<tr>
                      <td colspan="7"><span class="problem" role="alert">${problem}</span></td>
                    </tr>`
                  : nothing
              }`;
          })}
        </tbody>
      </table>
      <div class="bar"><button @click=${this.addLeg}>Add leg</button></div>
    `;
  }

  private setRule(e: Event): void {
    const rule = (e.target as HTMLSelectElement).value as 'level' | 'banked' | 'ground';
    editInertial(this.store, `set attitude rule to ${rule}`, (d) => (d.mission.attitudeRule = rule));
  }

  private addLeg(): void {
    editInertial(this.store, 'add a leg', (d) => {
      const segs = d.mission.segments;
      segs.push({
        id: uniqueId(
          'leg',
          segs.map((s) => s.id ?? ''),
        ),
        duration: { value: 10, unit: 's' },
        speed: { value: 0, unit: 'm/s' },
        turnRate: { value: 0, unit: 'deg/s' },
      });
    });
  }

  private removeLeg(i: number): void {
    editInertial(this.store, `delete leg ${i + 1}`, (d) => d.mission.segments.splice(i, 1));
  }
}

declare global {
  interface HTMLElementTagNameMap {
    'sl-inertial-mission': SlInertialMission;
  }
}
