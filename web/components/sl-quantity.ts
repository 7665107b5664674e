import { LitElement, css, html } from 'lit';
import { customElement, property } from 'lit/decorators.js';
import type { BudgetDocument, QuantityCell } from '../../src';
import { getAtPath, joinSteps, splitPath } from '../../src';
import type { ViewResult } from '../../src';
import type { DimensionName } from '../../src';
import type { DocumentStore } from '../state/document-store';
import { changeUnit } from '../../src';
import { defaultUnit } from '../../src';
import { cellErrorAt, cellValueAt } from '../grid/view-lookup';
import type { CellCommitDetail } from './sl-cell';
import type { UnitChangeDetail } from './sl-unit-picker';
import './sl-cell';
import './sl-unit-picker';

/**
 * A `{ value, unit }` of the document edited in place: a value cell and a
 * unit picker. Edits go through the store; a unit change converts the
 * value. An optional quantity may be emptied (removing it) or created by
 * typing into its empty cell.
 *
 * @fires sl-note - { message } after a unit change, saying what was converted
 */
@customElement('sl-quantity')
export class SlQuantity extends LitElement {
  static override styles = css`
    :host { display: flex; gap: 2px; align-items: flex-start; min-width: 0; }
    sl-cell { flex: 1 1 auto; min-width: 40px; }
    sl-unit-picker, .unit { flex: 0 0 auto; width: 66px; }
    .unit { font: 12px var(--sl-mono); color: var(--sl-ink-soft); padding: 3px 4px; }
  `;

  /** The open document's store; every edit goes through it. */
  @property({ attribute: false }) store!: DocumentStore;
  /** The document shown (the store's current one); a new object re-renders. */
  @property({ attribute: false }) doc?: BudgetDocument;
  /** The latest view, for the evaluated number and the cell's error. */
  @property({ attribute: false }) view?: ViewResult;
  /** Document path of the `{ value, unit }` object, e.g. `mission.start.north`. */
  @property() path = '';
  /** Accessible name of the value ("Start north"); the picker adds "unit". */
  @property() label = '';
  /** Dimensions the unit may have. */
  @property({ attribute: false }) dimensions: DimensionName[] = [];
  /** May be absent: an empty cell removes it, typing creates it in the first offered unit. */
  @property({ type: Boolean }) optional = false;

  override render() {
    const q = this.quantity();
    const valuePath = `${this.path}.value`;
    return html`
      <sl-cell .content=${q?.value} label=${this.label} ?optional=${this.optional} placeholder=${this.optional ? '—' : ''}
        .evaluated=${cellValueAt(this.view, valuePath)} .error=${cellErrorAt(this.view, valuePath)?.message}
        @sl-commit=${this.committed}></sl-cell>
      ${q
        ? html`<sl-unit-picker .unit=${q.unit} .dimensions=${this.dimensions} label=${`${this.label} unit`} @sl-unit-change=${this.unitPicked}></sl-unit-picker>`
        : html`<span class="unit">${defaultUnit(this.dimensions)}</span>`}
    `;
  }

  private quantity(): QuantityCell | undefined {
    return getAtPath(this.store?.document ?? this.doc, this.path) as QuantityCell | undefined;
  }

  private committed(e: CustomEvent<CellCommitDetail>): void {
    const { content, changed } = e.detail;
    if (!changed) return;
    const q = this.quantity();
    if (q && content !== undefined) return this.store.setCell(`${this.path}.value`, content);
    const steps = splitPath(this.path);
    const key = steps[steps.length - 1];
    const parentPath = joinSteps(steps.slice(0, -1));
    this.store.edit(`${content === undefined ? 'clear' : 'set'} ${this.label}`, (d) => {
      const parent = getAtPath(d, parentPath) as Record<string | number, unknown>;
      if (content === undefined) delete parent[key];
      else parent[key] = { value: content, unit: defaultUnit(this.dimensions) };
    });
  }

  private unitPicked(e: CustomEvent<UnitChangeDetail>): void {
    let message = '';
    this.store.edit(`change unit of ${this.label} to ${e.detail.unit}`, (d) => (message = changeUnit(d, this.path, e.detail.unit)));
    this.dispatchEvent(new CustomEvent('sl-note', { detail: { message: `${this.label}: ${message}` }, bubbles: true, composed: true }));
  }
}

declare global {
  interface HTMLElementTagNameMap {
    'sl-quantity': SlQuantity;
  }
}
