import { LitElement, css, html, nothing } from 'lit';
import { customElement, property } from 'lit/decorators.js';
import { tuningModels, type SensorEntry, type SourceRow, type ViewResult } from '../../src/index';
import type { TuningModel } from '../../src';
import type { DocumentStore } from '../state/document-store';
import type { CellCommitDetail } from './sl-cell';
import { cellErrorAt, cellValueAt } from '../grid/view-lookup';
import { readInflation, setTuning } from '../grid/tuning-edits';
import './sl-cell';

/**
 * The "filter as tuned" line under one error-source row: the value the
 * filter is tuned with (empty: as the row), whether the filter leaves the row
 * out, a filter-only inflation of its variances, and the state model where
 * the row's kind has a choice (a state the filter does not carry as the truth
 * has it). The row itself stays the truth (docs/suboptimal-filter.md). Every
 * change is one store edit, so undo and autosave cover it.
 */
@customElement('sl-tuning-line')
export class SlTuningLine extends LitElement {
  static override styles = css`
    :host { display: flex; flex-wrap: wrap; align-items: center; gap: 4px 12px; font-size: 12px; color: var(--sl-ink-soft); }
    .head { font-weight: 600; color: var(--sl-ink); }
    label { display: flex; align-items: center; gap: 4px; }
    sl-cell { width: 9em; }
    sl-cell.inflation { width: 5em; }
    select { font: inherit; font-size: 12px; }
    .unit { font-family: var(--sl-mono); }
  `;

  @property({ attribute: false }) store!: DocumentStore;
  @property({ attribute: false }) sensor!: SensorEntry;
  @property({ type: Number }) sensorIndex = 0;
  @property({ type: Number }) rowIndex = 0;
  @property({ attribute: false }) view?: ViewResult;

  override render() {
    const row: SourceRow | undefined = this.sensor?.sources[this.rowIndex];
    if (!row) return nothing;
    const t = row.tuning ?? {};
    const name = `${this.sensor.id}.${row.id}`;
    const path = `sensors[${this.sensorIndex}].sources[${this.rowIndex}].tuning`;
    const models = tuningModels(row.kind);
    return html`
      <span class="head">Filter as tuned:</span>
      <label>value <sl-cell optional compact .content=${t.value?.value} label=${`${name} value the filter is tuned with`} placeholder="as the row"
        .evaluated=${cellValueAt(this.view, `${path}.value.value`)} .error=${cellErrorAt(this.view, `${path}.value.value`)?.message}
        @sl-commit=${this.valueCommitted}></sl-cell><span class="unit">${t.value?.unit ?? row.unit}</span></label>
      <label><input type="checkbox" aria-label=${`${name} left out of the filter`} .checked=${t.leftOut === true}
        @change=${(e: Event) => setTuning(this.store, this.sensorIndex, this.rowIndex, { field: 'leftOut', on: (e.target as HTMLInputElement).checked })} />left out</label>
      <label>inflation × <sl-cell class="inflation" optional compact text .content=${t.inflation === undefined ? undefined : String(t.inflation)}
        label=${`${name} filter-only inflation of its variances`} placeholder="1" @sl-commit=${this.inflationCommitted}></sl-cell></label>
      ${models.length ? html`<label>state <select aria-label=${`${name} state model in the filter`} @change=${this.modelPicked}>
        <option value="" ?selected=${t.model === undefined}>as the row</option>
        ${models.map((m) => html`<option value=${m.value} ?selected=${t.model === m.value}>${m.label}</option>`)}
      </select></label>` : nothing}
    `;
  }

  private valueCommitted(e: CustomEvent<CellCommitDetail>): void {
    if (!e.detail.changed) return;
    setTuning(this.store, this.sensorIndex, this.rowIndex, { field: 'value', content: e.detail.content });
  }

  private inflationCommitted(e: CustomEvent<CellCommitDetail>): void {
    if (!e.detail.changed) return;
    const read = readInflation(String(e.detail.content ?? ''));
    if ('problem' in read) {
      // The cell keeps what was typed and says why; nothing the user typed is lost.
      e.detail.reject(read.problem);
      return;
    }
    setTuning(this.store, this.sensorIndex, this.rowIndex, { field: 'inflation', factor: read.factor });
  }

  private modelPicked(e: Event): void {
    const v = (e.target as HTMLSelectElement).value;
    setTuning(this.store, this.sensorIndex, this.rowIndex, { field: 'model', model: v === '' ? undefined : (v as TuningModel) });
  }
}

declare global {
  interface HTMLElementTagNameMap {
    'sl-tuning-line': SlTuningLine;
  }
}
