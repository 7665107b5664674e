import { LitElement, css, html, nothing } from 'lit';
import { customElement, property } from 'lit/decorators.js';
import type { BudgetDocument, CheckpointEntry } from '../../src';
import type { ViewResult } from '../../src';
import type { DocumentStore } from '../state/document-store';
import { editorStyles } from '../grid/editor-styles';
import { idProblem, uniqueId } from '../../src';
import { itemProblem } from '../grid/view-lookup';
import type { CellCommitDetail } from './sl-cell';
import './sl-cell';
import './sl-quantity';

/**
 * The named mission times at which the report prints the budget table
 * (it always does at the mission's end too): an id and a time each.
 */
@customElement('sl-checkpoint-list')
export class SlCheckpointList extends LitElement {
  static override styles = [editorStyles, css`:host { display: block; } col.id { width: 30%; } col.act { width: 40px; }`];

  /** The open document's store; every edit goes through it. */
  @property({ attribute: false }) store!: DocumentStore;
  /** The document shown (the store's current one); a new object re-renders. */
  @property({ attribute: false }) doc?: BudgetDocument;
  /** The latest view: cell errors and blocking problems. */
  @property({ attribute: false }) view?: ViewResult;

  override render() {
    const list = this.store.document.checkpoints ?? [];
    return html`
      <table aria-label="Checkpoints">
        <colgroup><col class="id" /><col /><col class="act" /></colgroup>
        <thead><tr><th scope="col">Id</th><th scope="col">Mission time</th><th><span class="sr-only">Actions</span></th></tr></thead>
        <tbody>${list.map((c, k) => this.renderCheckpoint(c, k))}</tbody>
      </table>
      ${list.length ? nothing : html`<p class="empty">No checkpoints: the report shows the budget at the mission's end.</p>`}
      <div class="bar"><button @click=${this.add}>Add checkpoint</button></div>
    `;
  }

  private renderCheckpoint(c: CheckpointEntry, k: number) {
    const blocked = itemProblem(this.view, `checkpoints[${k}]`);
    return html`<tr>
      <td><sl-cell text .content=${c.id} label=${`Id of checkpoint ${c.id}`} @sl-commit=${(e: CustomEvent<CellCommitDetail>) => this.rename(k, e)}></sl-cell></td>
      <td><sl-quantity .store=${this.store} .doc=${this.doc} .view=${this.view} path=${`checkpoints[${k}].time`} label=${`${c.id} time`} .dimensions=${['time']}></sl-quantity>
        ${blocked ? html`<div class="blocked" role="alert">${blocked}</div>` : nothing}</td>
      <td><button class="icon" aria-label=${`Remove checkpoint ${c.id}`} title="Remove" @click=${() => this.removeCheckpoint(k)}>✕</button></td>
    </tr>`;
  }

  private rename(k: number, e: CustomEvent<CellCommitDetail>): void {
    if (!e.detail.changed) return;
    const id = String(e.detail.content ?? '');
    const problem = idProblem(id, (this.store.document.checkpoints ?? []).filter((_, i) => i !== k).map((c) => c.id), 'checkpoint id');
    if (problem) return e.detail.reject(problem);
    this.store.edit(`rename checkpoint to ${id}`, (d) => (d.checkpoints![k].id = id));
  }

  private add(): void {
    const id = uniqueId('checkpoint', (this.store.document.checkpoints ?? []).map((c) => c.id));
    this.store.edit(`add checkpoint ${id}`, (d) => (d.checkpoints = [...(d.checkpoints ?? []), { id, time: { value: 60, unit: 's' } }]));
  }

  private removeCheckpoint(k: number): void {
    this.store.edit(`remove checkpoint ${this.store.document.checkpoints![k].id}`, (d) => {
      d.checkpoints!.splice(k, 1);
      if (d.checkpoints!.length === 0) delete d.checkpoints;
    });
  }
}

declare global {
  interface HTMLElementTagNameMap {
    'sl-checkpoint-list': SlCheckpointList;
  }
}
