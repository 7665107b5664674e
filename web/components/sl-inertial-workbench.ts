import { LitElement, css, html, nothing } from 'lit';
import { customElement, property, state } from 'lit/decorators.js';
import type { AidingKind, AnyBudgetDocument, ViewResult } from '../../src';
import {
  AIDING_KIND_NAMES,
  AIDING_PAGE_SPECS,
  IMU_SENSOR_KIND,
  isInertialDocument,
  INERTIAL_REQUIREMENT_QUANTITIES,
  LEVER_ARM_KINDS,
  inertialLimitDimension,
  uniqueId,
} from '../../src';
import type { RequirementModel } from './sl-requirement-table';
import type { DocumentStore } from '../state/document-store';
import { editorStyles } from '../grid/editor-styles';
import { editInertial, inertialDoc } from '../inertial/inertial-store';
import { tabBarStyles } from '../inertial/quantity-field';
import './sl-aiding-sensor';
import './sl-imu-grid';
import './sl-inertial-mission';
import './sl-requirements-editor';
import './sl-values-editor';

/** What a 3-D requirement may constrain (src/inertial/inertial-quantities.ts) and its limit's dimension. */
const INERTIAL_REQUIREMENTS: RequirementModel = {
  quantities: INERTIAL_REQUIREMENT_QUANTITIES,
  dimensionOf: inertialLimitDimension,
};

type Tab = 'sensors' | 'mission' | 'values' | 'requirements';
const TABS: [Tab, string][] = [
  ['sensors', 'Sensors'],
  ['mission', 'Mission'],
  ['values', 'Named values'],
  ['requirements', 'Requirements'],
];

/**
 * The editing side of the page for a 3-D budget: the IMU's rows and the
 * aiding sensors (adding a sensor offers the 3-D model's kinds only), the
 * 3-D mission, the named values and the requirements. Every change goes
 * through the store, so undo, redo and autosave cover it; a problem that
 * blocks the analysis is shown at the top with its field.
 */
@customElement('sl-inertial-workbench')
export class SlInertialWorkbench extends LitElement {
  static override styles = [
    editorStyles,
    tabBarStyles,
    css`
      :host {
        display: block;
        padding: 0 12px 24px;
        background: var(--sl-paper);
      }
      .model {
        font-size: 12px;
        color: var(--sl-ink-soft);
        margin: 6px 0;
      }
      .alerts {
        margin: 8px 0 0;
        display: grid;
        gap: 4px;
      }
      label.inline select {
        width: auto;
        max-width: 60%;
      }
    `,
  ];

  @property({ attribute: false }) store!: DocumentStore;
  @property({ attribute: false }) view?: ViewResult;
  @state() private tab: Tab = 'sensors';

  override connectedCallback(): void {
    super.connectedCallback();
    this.store?.addEventListener('change', this.changed);
  }

  override disconnectedCallback(): void {
    this.store?.removeEventListener('change', this.changed);
    super.disconnectedCallback();
  }

  // A planar document (undoing the load of a 3-D example) goes to sl-workbench; this one is about to leave the page.
  private readonly changed = () =>
    isInertialDocument(this.store.document as AnyBudgetDocument) ? this.requestUpdate() : undefined;

  override render() {
    const blocked = this.view?.blocked;
    return html`
      <div role="tablist" aria-label="3-D budget parts">
        ${TABS.map(([key, label]) =>
            html`<button role="tab" aria-selected=${String(this.tab === key)}
              @click=${() => (this.tab = key)}>${label}</button>`)}
      </div>
      <p class="model">
        3-D budget (inertial model): an IMU aided by other sensors; position, velocity and attitude in three axes.
      </p>
      <div class="alerts">
        ${blocked ? html`<div class="blocked" role="alert">Cannot compute: ${blocked.message}</div>` : nothing}
        ${this.view?.omitted.length ?
            html`<div class="omitted">
              Left out of the analysis: ${this.view.omitted.map((o) => o.what).join(', ')}
            </div>`
          : nothing}
      </div>
      ${this.panel()}
    `;
  }

  private panel() {
    const doc = inertialDoc(this.store);
    switch (this.tab) {
      case 'mission':
        return html`<sl-inertial-mission .store=${this.store} .view=${this.view}></sl-inertial-mission>`;
      case 'values':
        return html`<sl-values-editor .store=${this.store} .view=${this.view}></sl-values-editor>`;
      case 'requirements':
        return html`<sl-requirements-editor
          .store=${this.store}
          .view=${this.view}
          .model=${INERTIAL_REQUIREMENTS}
        ></sl-requirements-editor>`;
      default:
        return html` ${doc.sensors.map((s, i) =>
            s.kind === IMU_SENSOR_KIND
              ? html`<h3>${s.id}: IMU</h3>
                  <div class="bar">
                    <span class="hint">rate</span>
                    <sl-quantity
                      .store=${this.store}
                      .view=${this.view}
                      path=${`sensors[${i}].rate`}
                      label=${`${s.id} rate`}
                      .dimensions=${['frequency']}
                    ></sl-quantity>
                  </div>
                  <sl-imu-grid .store=${this.store} .view=${this.view} .sensor=${i}></sl-imu-grid>`
              : nothing,
          )}
          <h3>Aiding sensors</h3>
          ${doc.sensors.map((s, i) => (s.kind === IMU_SENSOR_KIND ? nothing : html`<sl-aiding-sensor
                  .store=${this.store} .view=${this.view} .sensor=${i}></sl-aiding-sensor>`))}
          <div class="bar">
            <label class="inline"
              >Add a sensor
              <select aria-label="Add an aiding sensor" @change=${this.addSensor}>
                <option value="">kind…</option>
                ${AIDING_KIND_NAMES.map((k) => html`<option value=${k}>${k}: ${AIDING_PAGE_SPECS[k].label}</option>`)}
              </select></label
            >
          </div>`;
    }
  }

  private addSensor(e: Event): void {
    const select = e.target as HTMLSelectElement;
    const kind = select.value as AidingKind;
    select.value = '';
    const spec = AIDING_PAGE_SPECS[kind];
    if (!spec) return;
    editInertial(this.store, `add a ${kind} sensor`, (d) => {
      const id = uniqueId(
        spec.defaults.id,
        d.sensors.map((s) => s.id),
      );
      const sensor = {
        id,
        kind,
        rate: { value: spec.defaults.rateHz, unit: 'Hz' },
        sources: [
          { id: 'white', kind: 'white-noise', ...spec.defaults.white, provenance: 'added on the page', assumed: true },
        ],
      } as (typeof d.sensors)[number];
      if (LEVER_ARM_KINDS.includes(kind))
        sensor.leverArm = { x: { value: 0, unit: 'm' }, y: { value: 0, unit: 'm' }, z: { value: 0, unit: 'm' } };
      d.sensors.push(sensor);
    });
  }
}

declare global {
  interface HTMLElementTagNameMap {
    'sl-inertial-workbench': SlInertialWorkbench;
  }
}
