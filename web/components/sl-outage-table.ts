import { LitElement, css, html, nothing } from 'lit';
import { customElement, property } from 'lit/decorators.js';
import type { BudgetDocument, OutageEntry } from '../../src';
import type { ViewResult } from '../../src';
import type { DocumentStore } from '../state/document-store';
import { editorStyles } from '../grid/editor-styles';
import { idProblem, uniqueId } from '../../src';
import { isOmitted, itemProblem } from '../grid/view-lookup';
import type { CellCommitDetail } from './sl-cell';
import './sl-cell';
import './sl-quantity';

/**
 * An aiding sensor's outages: spans of mission time [start, end) in which it
 * gives nothing. A problem that blocks the analysis (an outage outside the
 * mission) is shown on the outage's row.
 */
@customElement('sl-outage-table')
export class SlOutageTable extends LitElement {
  static override styles = [editorStyles, css`:host { display: block; } col.id { width: 24%; } col.act { width: 62px; }`];

  /** The open document's store; every edit goes through it. */
  @property({ attribute: false }) store!: DocumentStore;
  /** The document shown (the store's current one); a new object re-renders. */
  @property({ attribute: false }) doc?: BudgetDocument;
  /** The latest view: cell errors and blocking problems. */
  @property({ attribute: false }) view?: ViewResult;
  /** Index of the sensor whose outages are shown. */
  @property({ type: Number }) sensorIndex = 0;

  override render() {
    const sensor = this.store.document.sensors[this.sensorIndex];
    if (!sensor) return nothing;
    const outages = sensor.outages ?? [];
    return html`
      <table aria-label=${`Outages of ${sensor.id}`}>
        <colgroup><col class="id" /><col /><col /><col class="act" /></colgroup>
        <thead><tr><th scope="col">Id</th><th scope="col">Start</th><th scope="col">End</th><th><span class="sr-only">Actions</span></th></tr></thead>
        <tbody>${outages.map((o, k) => this.renderOutage(sensor.id, o, k))}</tbody>
      </table>
      ${outages.length ? nothing : html`<p class="empty">No outages: the sensor gives data for the whole mission.</p>`}
      <div class="bar"><button @click=${this.add}>Add outage</button></div>
    `;
  }

  private renderOutage(sensorId: string, o: OutageEntry, k: number) {
    const path = `sensors[${this.sensorIndex}].outages[${k}]`;
    const name = `${sensorId} outage ${o.id ?? k + 1}`;
    const blocked = itemProblem(this.view, path);
    const q = (field: 'start' | 'end') => html`<sl-quantity .store=${this.store} .doc=${this.doc} .view=${this.view} path=${`${path}.${field}`}
      label=${`${name} ${field}`} .dimensions=${['time']}></sl-quantity>`;
    return html`
      <tr>
        <td><sl-cell text optional .content=${o.id} label=${`Id of ${name}`} placeholder="(none)" @sl-commit=${(e: CustomEvent<CellCommitDetail>) => this.rename(k, e)}></sl-cell></td>
        <td>${q('start')}</td><td>${q('end')}</td>
        <td><button class="icon" aria-label=${`Remove ${name}`} title="Remove" @click=${() => this.removeOutage(k)}>✕</button></td>
      </tr>
      ${blocked || isOmitted(this.view, path) ? html`<tr><td colspan="4">
        ${blocked ? html`<div class="blocked" role="alert">${blocked}</div>` : html`<div class="omitted">Left out of the analysis until its cells are fixed.</div>`}
      </td></tr>` : nothing}
    `;
  }

  private rename(k: number, e: CustomEvent<CellCommitDetail>): void {
    if (!e.detail.changed) return;
    const id = String(e.detail.content ?? '');
    const problem = id === '' ? undefined : idProblem(id, [], 'outage id');
    if (problem) return e.detail.reject(problem);
    this.store.edit(`rename outage ${k + 1}`, (d) => {
      const o = d.sensors[this.sensorIndex].outages![k];
      if (id === '') delete o.id;
      else o.id = id;
    });
  }

  private add(): void {
    const ids = (this.store.document.sensors[this.sensorIndex].outages ?? []).flatMap((o) => (o.id ? [o.id] : []));
    const outage: OutageEntry = { id: uniqueId('outage', ids), start: { value: 0, unit: 's' }, end: { value: 60, unit: 's' } };
    this.store.edit(`add outage to ${this.store.document.sensors[this.sensorIndex].id}`, (d) => {
      const s = d.sensors[this.sensorIndex];
      s.outages = [...(s.outages ?? []), outage];
    });
  }

  private removeOutage(k: number): void {
    this.store.edit(`remove outage ${k + 1}`, (d) => {
      const s = d.sensors[this.sensorIndex];
      s.outages!.splice(k, 1);
      if (s.outages!.length === 0) delete s.outages;
    });
  }
}

declare global {
  interface HTMLElementTagNameMap {
    'sl-outage-table': SlOutageTable;
  }
}
