import { LitElement, css, html, nothing } from 'lit';
import { customElement, property } from 'lit/decorators.js';
import type { BudgetDocument, SegmentEntry } from '../../src';
import type { ViewResult } from '../../src';
import type { DimensionName } from '../../src';
import type { DocumentStore } from '../state/document-store';
import { editorStyles } from '../grid/editor-styles';
import { idProblem, uniqueId } from '../../src';
import { moveItem } from '../grid/row-edits';
import { isOmitted, itemProblem } from '../grid/view-lookup';
import type { CellCommitDetail } from './sl-cell';
import './sl-cell';
import './sl-quantity';

const FIELDS: { key: 'duration' | 'speed' | 'speedEnd' | 'turnRate'; label: string; dims: DimensionName[]; optional?: boolean }[] = [
  { key: 'duration', label: 'Duration', dims: ['time'] },
  { key: 'speed', label: 'Speed', dims: ['speed'] },
  { key: 'speedEnd', label: 'Speed at end', dims: ['speed'], optional: true },
  { key: 'turnRate', label: 'Turn rate', dims: ['angular-rate'] },
];

/**
 * The legs of the nominal path, flown in order: duration, speed, an
 * optional end speed (a linear ramp) and turn rate (positive turns
 * clockwise seen from above). A mission keeps at least one leg.
 */
@customElement('sl-segment-table')
export class SlSegmentTable extends LitElement {
  static override styles = [editorStyles, css`:host { display: block; } col.id { width: 11%; } col.act { width: 76px; } td.act { white-space: nowrap; }`];

  /** The open document's store; every edit goes through it. */
  @property({ attribute: false }) store!: DocumentStore;
  /** The document shown (the store's current one); a new object re-renders. */
  @property({ attribute: false }) doc?: BudgetDocument;
  /** The latest view: cell errors and blocking problems. */
  @property({ attribute: false }) view?: ViewResult;

  override render() {
    const segments = this.store.document.mission.segments;
    return html`
      <table aria-label="Segments of the mission">
        <colgroup><col class="id" />${FIELDS.map(() => html`<col />`)}<col class="act" /></colgroup>
        <thead><tr><th scope="col">Id</th>${FIELDS.map((f) => html`<th scope="col">${f.label}</th>`)}<th><span class="sr-only">Actions</span></th></tr></thead>
        <tbody>${segments.map((s, k) => this.renderSegment(s, k, segments.length))}</tbody>
      </table>
      <div class="bar"><button @click=${this.add}>Add segment</button><span class="hint">An empty "speed at end" keeps the speed constant.</span></div>
    `;
  }

  private renderSegment(s: SegmentEntry, k: number, count: number) {
    const path = `mission.segments[${k}]`;
    const name = `segment ${s.id ?? k + 1}`;
    const blocked = itemProblem(this.view, path);
    return html`
      <tr>
        <td><sl-cell text optional .content=${s.id} label=${`Id of ${name}`} placeholder=${String(k + 1)} @sl-commit=${(e: CustomEvent<CellCommitDetail>) => this.rename(k, e)}></sl-cell></td>
        ${FIELDS.map((f) => html`<td><sl-quantity .store=${this.store} .doc=${this.doc} .view=${this.view} path=${`${path}.${f.key}`}
          label=${`${name} ${f.label.toLowerCase()}`} .dimensions=${f.dims} ?optional=${!!f.optional}></sl-quantity></td>`)}
        <td class="act">
          <button class="icon" aria-label=${`Move ${name} up`} title="Move up" ?disabled=${k === 0} @click=${() => this.move(k, -1)}>↑</button>
          <button class="icon" aria-label=${`Move ${name} down`} title="Move down" ?disabled=${k === count - 1} @click=${() => this.move(k, 1)}>↓</button>
          <button class="icon" aria-label=${`Remove ${name}`} title=${count === 1 ? 'A mission needs one segment' : 'Remove'} ?disabled=${count === 1} @click=${() => this.removeSegment(k)}>✕</button>
        </td>
      </tr>
      ${blocked || isOmitted(this.view, path) ? html`<tr><td colspan=${FIELDS.length + 2}>
        ${blocked ? html`<div class="blocked" role="alert">${blocked}</div>` : html`<div class="omitted">Left out of the analysis until its cells are fixed.</div>`}
      </td></tr>` : nothing}
    `;
  }

  private rename(k: number, e: CustomEvent<CellCommitDetail>): void {
    if (!e.detail.changed) return;
    const id = String(e.detail.content ?? '');
    const problem = id === '' ? undefined : idProblem(id, [], 'segment id');
    if (problem) return e.detail.reject(problem);
    this.store.edit(`rename segment ${k + 1}`, (d) => {
      const s = d.mission.segments[k];
      if (id === '') delete s.id;
      else s.id = id;
    });
  }

  private add(): void {
    const segments = this.store.document.mission.segments;
    const last = segments[segments.length - 1];
    const segment: SegmentEntry = {
      id: uniqueId('leg', segments.flatMap((s) => (s.id ? [s.id] : []))),
      duration: { value: 60, unit: 's' },
      speed: last ? structuredClone(last.speedEnd ?? last.speed) : { value: 1, unit: 'm/s' },
      turnRate: { value: 0, unit: 'deg/s' },
    };
    this.store.edit(`add segment ${segment.id}`, (d) => d.mission.segments.push(segment));
  }

  private move(k: number, delta: number): void {
    this.store.edit(`move segment ${k + 1} ${delta < 0 ? 'up' : 'down'}`, (d) => moveItem(d.mission.segments, k, delta));
  }

  private removeSegment(k: number): void {
    this.store.edit(`remove segment ${k + 1}`, (d) => d.mission.segments.splice(k, 1));
  }
}

declare global {
  interface HTMLElementTagNameMap {
    'sl-segment-table': SlSegmentTable;
  }
}
