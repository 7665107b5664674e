import { LitElement, css, html, nothing } from 'lit';
import { customElement, property, state } from 'lit/decorators.js';
import type { BudgetDocument } from '../../src';
import type { SensorKind } from '../../src';
import type { ViewResult } from '../../src';
import { SENSOR_KINDS, SENSOR_KIND_NAMES } from '../../src';
import type { DocumentStore } from '../state/document-store';
import { editorStyles } from '../grid/editor-styles';
import { sensorIdProblem } from '../../src';
import { keepRowsAsCandidate, presetRows, presetsFor } from '../../src';
import { duplicateSensor, newSensor, renameSensor } from '../grid/row-edits';
import { blockedWithin, errorsWithin } from '../grid/view-lookup';
import type { CellCommitDetail } from './sl-cell';
import './sl-cell';

/**
 * The suite's sensors: pick one to edit, add one of a kind, and rename,
 * duplicate or remove the picked one. Renaming rewrites the formulas that
 * refer to the sensor's rows (`=gyro.arw*2` becomes `=imu.arw*2`).
 *
 * @fires sl-select - { index } when another sensor is picked, added or duplicated
 * @fires sl-note - { message } after a removal or a rename
 */
@customElement('sl-sensor-list')
export class SlSensorList extends LitElement {
  static override styles = [editorStyles, css`
    :host { display: block; }
    nav { display: flex; flex-wrap: wrap; gap: 4px; }
    nav button { display: inline-flex; flex-direction: column; align-items: flex-start; padding: 3px 10px; line-height: 1.2; }
    nav button[aria-current='true'] { background: var(--sl-accent); border-color: var(--sl-accent); color: #fff; }
    nav button small { font-size: 10px; opacity: 0.8; }
    .badge { color: var(--sl-fail); font-weight: 700; }
    nav button[aria-current='true'] .badge { color: #ffd9cc; }
    .add { display: inline-flex; gap: 4px; margin-left: auto; }
    .add select { width: auto; border-color: var(--sl-rule); }
    .picked { display: grid; grid-template-columns: auto 150px auto 1fr auto auto auto; gap: 6px; align-items: center; margin-top: 8px; }
  `];

  /** The open document's store; every edit goes through it. */
  @property({ attribute: false }) store!: DocumentStore;
  /** The document shown (the store's current one); a new object re-renders. */
  @property({ attribute: false }) doc?: BudgetDocument;
  /** The latest view, for error counts per sensor. */
  @property({ attribute: false }) view?: ViewResult;
  /** Index of the picked sensor. */
  @property({ type: Number }) selected = 0;

  @state() private addKind: SensorKind = SENSOR_KIND_NAMES[0];
  /** Grade preset the new sensor's rows start from ('' for none). */
  @state() private addPreset = '';

  override render() {
    const sensors = this.store.document.sensors;
    const picked = sensors[this.selected];
    return html`
      <div class="bar">
        <nav aria-label="Sensors">${sensors.map((s, i) => this.renderSensor(s.id, s.kind, i))}</nav>
        <span class="add">
          <select aria-label="Kind of the new sensor" @change=${(e: Event) => (this.addKind = (e.target as HTMLSelectElement).value as SensorKind)}>
            ${SENSOR_KIND_NAMES.map((k) => html`<option .value=${k} ?selected=${k === this.addKind}>${SENSOR_KINDS[k].label}</option>`)}
          </select>
          ${this.presetPicker()}
          <button @click=${this.add}>Add sensor</button>
        </span>
      </div>
      ${picked ? html`<div class="picked">
        <span class="hint">Sensor id</span>
        <sl-cell text .content=${picked.id} label="Sensor id" @sl-commit=${this.rename}></sl-cell>
        <span class="hint">${SENSOR_KINDS[picked.kind]?.label ?? picked.kind} · ${SENSOR_KINDS[picked.kind]?.role ?? ''}</span>
        <span></span>
        <button @click=${this.keepAsCandidate} title="Keep these rows as a candidate for this sensor; the Sizing tab compares candidates">Keep as candidate</button>
        <button @click=${this.duplicate}>Duplicate</button>
        <button @click=${this.removeSensor}>Remove</button>
      </div>` : html`<p class="empty">No sensors: add one to start the suite.</p>`}
    `;
  }

  private renderSensor(id: string, kind: SensorKind, i: number) {
    const prefix = `sensors[${i}]`;
    const count = errorsWithin(this.view, prefix).length + (blockedWithin(this.view, prefix) ? 1 : 0);
    return html`<button aria-current=${i === this.selected ? 'true' : 'false'} @click=${() => this.select(i)}
      aria-label=${`${id}, ${SENSOR_KINDS[kind]?.label ?? kind}${count ? `, ${count} problem${count > 1 ? 's' : ''}` : ''}`}>
      <span>${id} ${count ? html`<span class="badge" aria-hidden="true">⚠${count}</span>` : nothing}</span>
      <small aria-hidden="true">${SENSOR_KINDS[kind]?.label ?? kind}</small>
    </button>`;
  }

  private select(index: number): void {
    this.dispatchEvent(new CustomEvent('sl-select', { detail: { index }, bubbles: true }));
  }

  private note(message: string): void {
    this.dispatchEvent(new CustomEvent('sl-note', { detail: { message }, bubbles: true, composed: true }));
  }

  /** "Start from" a grade preset (src/presets/grade-presets.ts), offered only for kinds that take every preset row. */
  private presetPicker() {
    const presets = presetsFor(SENSOR_KINDS[this.addKind].rows);
    if (presets.length === 0) return nothing;
    return html`<select aria-label="Rows of the new sensor" title="Start from typical rows of a published grade; every row is marked assumed"
      @change=${(e: Event) => (this.addPreset = (e.target as HTMLSelectElement).value)}>
      <option value="" ?selected=${this.addPreset === ''}>no rows</option>
      ${presets.map((p) => html`<option value=${p.id} ?selected=${p.id === this.addPreset}>${p.label} grade</option>`)}
    </select>`;
  }

  private add(): void {
    const doc = this.store.document;
    const sensor = newSensor(this.addKind, doc.sensors.map((s) => s.id));
    const preset = presetsFor(SENSOR_KINDS[this.addKind].rows).find((p) => p.id === this.addPreset);
    if (preset) sensor.sources = presetRows(preset.id);
    this.store.edit(`add sensor ${sensor.id}`, (d) => d.sensors.push(sensor));
    this.select(doc.sensors.length);
  }

  private rename(e: CustomEvent<CellCommitDetail>): void {
    const id = String(e.detail.content ?? '');
    const old = this.store.document.sensors[this.selected]?.id;
    if (!e.detail.changed || old === undefined) return;
    const problem = sensorIdProblem(id, this.store.document.sensors.filter((_, i) => i !== this.selected).map((s) => s.id));
    if (problem) return e.detail.reject(problem);
    this.store.edit(`rename sensor ${old} to ${id}`, (d) => renameSensor(d, this.selected, id));
    this.note(`Renamed ${old} to ${id}; formulas that used ${old}.… now use ${id}.…`);
  }

  private keepAsCandidate(): void {
    const id = this.store.document.sensors[this.selected].id;
    let kept = '';
    this.store.edit(`keep the rows of ${id} as a candidate`, (d) => (kept = keepRowsAsCandidate(d, id)));
    this.note(`Kept the rows of ${id} as candidate ${kept}; edit the rows and keep again, then compare in the Sizing tab.`);
  }

  private duplicate(): void {
    let index = this.selected;
    this.store.edit(`duplicate sensor ${this.store.document.sensors[this.selected].id}`, (d) => (index = duplicateSensor(d, this.selected)));
    this.select(index);
  }

  private removeSensor(): void {
    const id = this.store.document.sensors[this.selected].id;
    this.store.edit(`remove sensor ${id}`, (d) => d.sensors.splice(this.selected, 1));
    this.select(Math.max(0, this.selected - 1));
    this.note(`Removed sensor ${id}; Undo brings it back. Formulas that used its rows now show an error.`);
  }
}

declare global {
  interface HTMLElementTagNameMap {
    'sl-sensor-list': SlSensorList;
  }
}
