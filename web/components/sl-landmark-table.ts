import { LitElement, css, html, nothing } from 'lit';
import { customElement, property } from 'lit/decorators.js';
import type { BudgetDocument, LandmarkEntry } from '../../src';
import type { ViewResult } from '../../src';
import type { DocumentStore } from '../state/document-store';
import { editorStyles } from '../grid/editor-styles';
import { idProblem, uniqueId } from '../../src';
import { isOmitted, itemProblem } from '../grid/view-lookup';
import type { CellCommitDetail } from './sl-cell';
import './sl-cell';
import './sl-quantity';

/**
 * A range-bearing sensor's known landmarks, in the mission's north/east
 * frame. Ids are unique within the sensor (ignoring letter case).
 */
@customElement('sl-landmark-table')
export class SlLandmarkTable extends LitElement {
  static override styles = [editorStyles, css`:host { display: block; } col.id { width: 24%; } col.act { width: 62px; }`];

  /** The open document's store; every edit goes through it. */
  @property({ attribute: false }) store!: DocumentStore;
  /** The document shown (the store's current one); a new object re-renders. */
  @property({ attribute: false }) doc?: BudgetDocument;
  /** The latest view: cell errors and blocking problems. */
  @property({ attribute: false }) view?: ViewResult;
  /** Index of the sensor whose landmarks are shown. */
  @property({ type: Number }) sensorIndex = 0;

  override render() {
    const sensor = this.store.document.sensors[this.sensorIndex];
    if (!sensor) return nothing;
    const marks = sensor.landmarks ?? [];
    return html`
      <table aria-label=${`Landmarks of ${sensor.id}`}>
        <colgroup><col class="id" /><col /><col /><col class="act" /></colgroup>
        <thead><tr><th scope="col">Id</th><th scope="col">North</th><th scope="col">East</th><th><span class="sr-only">Actions</span></th></tr></thead>
        <tbody>${marks.map((m, k) => this.renderMark(sensor.id, m, k))}</tbody>
      </table>
      ${marks.length ? nothing : html`<p class="empty">No landmarks: the sensor has nothing to measure.</p>`}
      <div class="bar"><button @click=${this.add}>Add landmark</button></div>
    `;
  }

  private renderMark(sensorId: string, m: LandmarkEntry, k: number) {
    const path = `sensors[${this.sensorIndex}].landmarks[${k}]`;
    const name = `${sensorId} landmark ${m.id}`;
    const blocked = itemProblem(this.view, path);
    const q = (field: 'north' | 'east') => html`<sl-quantity .store=${this.store} .doc=${this.doc} .view=${this.view} path=${`${path}.${field}`}
      label=${`${name} ${field}`} .dimensions=${['length']}></sl-quantity>`;
    return html`
      <tr>
        <td><sl-cell text .content=${m.id} label=${`Id of ${name}`} @sl-commit=${(e: CustomEvent<CellCommitDetail>) => this.rename(k, e)}></sl-cell></td>
        <td>${q('north')}</td><td>${q('east')}</td>
        <td><button class="icon" aria-label=${`Remove ${name}`} title="Remove" @click=${() => this.removeLandmark(k)}>✕</button></td>
      </tr>
      ${blocked || isOmitted(this.view, path) ? html`<tr><td colspan="4">
        ${blocked ? html`<div class="blocked" role="alert">${blocked}</div>` : html`<div class="omitted">Left out of the analysis until its cells are fixed.</div>`}
      </td></tr>` : nothing}
    `;
  }

  private rename(k: number, e: CustomEvent<CellCommitDetail>): void {
    if (!e.detail.changed) return;
    const id = String(e.detail.content ?? '');
    const others = (this.store.document.sensors[this.sensorIndex].landmarks ?? []).filter((_, i) => i !== k).map((m) => m.id);
    const problem = idProblem(id, others, 'landmark id');
    if (problem) return e.detail.reject(problem);
    this.store.edit(`rename landmark to ${id}`, (d) => (d.sensors[this.sensorIndex].landmarks![k].id = id));
  }

  private add(): void {
    const ids = (this.store.document.sensors[this.sensorIndex].landmarks ?? []).map((m) => m.id);
    const mark: LandmarkEntry = { id: uniqueId('mark', ids), north: { value: 0, unit: 'm' }, east: { value: 0, unit: 'm' } };
    this.store.edit(`add landmark ${mark.id}`, (d) => {
      const s = d.sensors[this.sensorIndex];
      s.landmarks = [...(s.landmarks ?? []), mark];
    });
  }

  private removeLandmark(k: number): void {
    this.store.edit(`remove landmark ${k + 1}`, (d) => d.sensors[this.sensorIndex].landmarks!.splice(k, 1));
  }
}

declare global {
  interface HTMLElementTagNameMap {
    'sl-landmark-table': SlLandmarkTable;
  }
}
