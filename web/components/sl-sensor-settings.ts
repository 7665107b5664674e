import { LitElement, css, html, nothing } from 'lit';
import { customElement, property } from 'lit/decorators.js';
import type { BudgetDocument, SensorEntry } from '../../src/document';
import type { ViewResult } from '../../src/report/view-result';
import type { DimensionName } from '../../src/units';
import { SENSOR_KINDS } from '../../src/sensors/registry';
import type { DocumentStore } from '../state/document-store';
import { editorStyles } from '../grid/editor-styles';
import { blockedWithin } from '../grid/view-lookup';
import './sl-landmark-table';
import './sl-outage-table';
import './sl-quantity';

/**
 * The settings of the picked sensor that are not rows: its rate, and for
 * aiding sensors the outages; for range-bearing sensors also the observables,
 * maximum range, field of view and landmarks.
 */
@customElement('sl-sensor-settings')
export class SlSensorSettings extends LitElement {
  static override styles = [editorStyles, css`
    :host { display: block; }
    .fields { display: grid; grid-template-columns: repeat(auto-fill, minmax(200px, 1fr)); gap: 6px 14px; align-items: start; }
    .field > span { display: block; font-size: 11px; color: var(--sl-ink-soft); margin-bottom: 1px; }
    .tables { display: grid; grid-template-columns: repeat(auto-fit, minmax(420px, 1fr)); gap: 4px 16px; }
    textarea { border-color: var(--sl-rule); }
  `];

  /** The open document's store; every edit goes through it. */
  @property({ attribute: false }) store!: DocumentStore;
  /** The document shown (the store's current one); a new object re-renders. */
  @property({ attribute: false }) doc?: BudgetDocument;
  /** The latest view: cell errors and blocking problems. */
  @property({ attribute: false }) view?: ViewResult;
  /** Index of the sensor shown. */
  @property({ type: Number }) sensorIndex = 0;

  override render() {
    const s = this.store.document.sensors[this.sensorIndex];
    if (!s) return nothing;
    const base = `sensors[${this.sensorIndex}]`;
    const q = (field: string, label: string, dims: readonly DimensionName[], optional = false) => html`<label class="field"><span>${label}</span>
      <sl-quantity .store=${this.store} .doc=${this.doc} .view=${this.view} path=${`${base}.${field}`} label=${`${s.id} ${label.toLowerCase()}`}
        .dimensions=${dims} ?optional=${optional}></sl-quantity></label>`;
    const settings = SENSOR_KINDS[s.kind]?.settings ?? [];
    const own = this.ownProblem(s);
    return html`
      <h3>Settings of ${s.id}</h3>
      ${own ? html`<div class="blocked" role="alert">${own}</div>` : nothing}
      <div class="fields">
        ${q('rate', 'Rate', ['frequency'])}
        ${settings.map((f) => {
          if (f.type === 'quantity') return q(f.field, f.label, f.dimensions, f.optional);
          if (f.type !== 'choice') return nothing;
          return html`<label class="field"><span>${f.label}</span>
            <select aria-label=${`${s.id} ${f.label.toLowerCase()}`} @change=${this.observables}>
              ${f.choices.map((o) => html`<option .value=${o.value} ?selected=${(s[f.field] ?? f.fallback) === o.value}>${o.label}</option>`)}
            </select></label>`;
        })}
      </div>
      <label class="field"><span>Note</span><textarea rows="1" aria-label=${`${s.id} note`} .value=${s.note ?? ''} @change=${this.noteChanged}></textarea></label>
      <div class="tables">
        ${SENSOR_KINDS[s.kind]?.role === 'aiding' ? html`<section><h3>Outages</h3>
          <sl-outage-table .store=${this.store} .doc=${this.doc} .view=${this.view} .sensorIndex=${this.sensorIndex}></sl-outage-table></section>` : nothing}
        ${settings.some((f) => f.type === 'landmarks') ? html`<section><h3>Landmarks</h3>
          <sl-landmark-table .store=${this.store} .doc=${this.doc} .view=${this.view} .sensorIndex=${this.sensorIndex}></sl-landmark-table></section>` : nothing}
      </div>
    `;
  }

  /** A blocking problem on the sensor itself (its rate, range, field of view), not on a row, outage or landmark. */
  private ownProblem(s: SensorEntry): string | undefined {
    const base = `sensors[${this.sensorIndex}]`;
    const path = this.view?.blocked?.path;
    if (!path || /\.(sources|outages|landmarks)\[/.test(path.slice(base.length))) return undefined;
    return blockedWithin(this.view, base) ? `${s.id}: ${this.view!.blocked!.message}` : undefined;
  }

  private observables(e: Event): void {
    const value = (e.target as HTMLSelectElement).value as SensorEntry['observables'];
    this.store.edit(`set observables of ${this.store.document.sensors[this.sensorIndex].id}`, (d) => (d.sensors[this.sensorIndex].observables = value));
  }

  private noteChanged(e: Event): void {
    const text = (e.target as HTMLTextAreaElement).value;
    this.store.edit(`edit note of ${this.store.document.sensors[this.sensorIndex].id}`, (d) => {
      const s = d.sensors[this.sensorIndex];
      if (text.trim() === '') delete s.note;
      else s.note = text;
    });
  }
}

declare global {
  interface HTMLElementTagNameMap {
    'sl-sensor-settings': SlSensorSettings;
  }
}
