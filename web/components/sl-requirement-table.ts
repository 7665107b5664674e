import { LitElement, css, html, nothing } from 'lit';
import { customElement, property } from 'lit/decorators.js';
import type { BudgetDocument, RequirementEntry } from '../../src';
import type { ConfidenceLevel, QuantityName } from '../../src';
import { limitDimension } from '../../src';
import type { ViewResult } from '../../src';
import { DIMENSIONS, unitDimension, type DimensionName } from '../../src';
import type { DocumentStore } from '../state/document-store';
import { editorStyles } from '../grid/editor-styles';
import { idProblem, uniqueId } from '../../src';
import { isOmitted, itemProblem } from '../grid/view-lookup';
import type { CellCommitDetail } from './sl-cell';
import './sl-cell';
import './sl-quantity';

const QUANTITIES: QuantityName[] = ['horizontal', 'north', 'east', 'along-track', 'cross-track', 'heading', 'speed'];
const LEVELS: ConfidenceLevel[] = ['1sigma', '2sigma', '95%', '50%'];
/** What a requirement may constrain in one error model: its quantities and the dimension of each one's limit. */
export interface RequirementModel {
  quantities: readonly string[];
  dimensionOf(quantity: string): DimensionName;
}

/** The planar model's (the default). */
const PLANAR: RequirementModel = { quantities: QUANTITIES, dimensionOf: (q) => limitDimension(q as QuantityName) };

const HORIZONTAL_LEVEL: Record<ConfidenceLevel, string> = { '1sigma': 'DRMS', '2sigma': '2DRMS', '95%': 'R95', '50%': 'CEP' };

/**
 * The budget's requirements: a quantity at a confidence level must stay at
 * or below a limit, over the whole mission or a window of it. The limit's
 * unit picker offers the quantity's dimension only.
 *
 * @fires sl-note - { message } when a quantity change reset the limit's unit
 */
@customElement('sl-requirement-table')
export class SlRequirementTable extends LitElement {
  static override styles = [editorStyles, css`
    :host { display: block; }
    col.id { width: 17%; } col.q { width: 19%; } col.l { width: 16%; } col.act { width: 40px; }
    tr.window td { border-bottom: 1px solid var(--sl-rule); }
    tr.first td { border-bottom: none; }
    .span { display: grid; grid-template-columns: auto minmax(120px, 1fr) auto minmax(120px, 1fr) auto; gap: 4px 6px; align-items: center; }
  `];

  /** The open document's store; every edit goes through it. */
  @property({ attribute: false }) store!: DocumentStore;
  /** The document shown (the store's current one); a new object re-renders. */
  @property({ attribute: false }) doc?: BudgetDocument;
  /** The latest view: cell errors and blocking problems. */
  @property({ attribute: false }) view?: ViewResult;
  /** Quantities and limit dimensions of the document's model; planar unless given (a 3-D budget passes its own). */
  @property({ attribute: false }) model?: RequirementModel;

  private get requirementModel(): RequirementModel {
    return this.model ?? PLANAR;
  }

  override render() {
    const list = this.store.document.requirements ?? [];
    return html`
      <table aria-label="Requirements">
        <colgroup><col class="id" /><col class="q" /><col class="l" /><col /><col class="act" /></colgroup>
        <thead><tr><th scope="col">Id</th><th scope="col">Quantity</th><th scope="col">Level</th><th scope="col">Limit</th><th><span class="sr-only">Actions</span></th></tr></thead>
        ${list.map((r, k) => this.renderRequirement(r, k))}
      </table>
      ${list.length ? nothing : html`<p class="empty">No requirements: the findings show the budget without verdicts.</p>`}
      <div class="bar"><button @click=${this.add}>Add requirement</button></div>
    `;
  }

  private renderRequirement(r: RequirementEntry, k: number) {
    const path = `requirements[${k}]`;
    const blocked = itemProblem(this.view, path);
    const select = (what: 'quantity' | 'level', options: string[], label: (o: string) => string) => html`
      <select aria-label=${`${r.id} ${what}`} @change=${(e: Event) => this.pick(k, what, (e.target as HTMLSelectElement).value)}>
        ${options.map((o) => html`<option .value=${o} ?selected=${o === r[what]}>${label(o)}</option>`)}</select>`;
    return html`<tbody>
      <tr class="first">
        <td><sl-cell text .content=${r.id} label=${`Id of requirement ${r.id}`} @sl-commit=${(e: CustomEvent<CellCommitDetail>) => this.rename(k, e)}></sl-cell></td>
        <td>${select('quantity', [...this.requirementModel.quantities], (o) => o)}</td>
        <td>${select('level', LEVELS, (o) => (r.quantity === 'horizontal' ? `${o} (${HORIZONTAL_LEVEL[o as ConfidenceLevel]})` : o))}</td>
        <td><sl-quantity .store=${this.store} .doc=${this.doc} .view=${this.view} path=${`${path}.limit`} label=${`${r.id} limit`}
          .dimensions=${[this.requirementModel.dimensionOf(r.quantity)]}></sl-quantity></td>
        <td><button class="icon" aria-label=${`Remove requirement ${r.id}`} title="Remove" @click=${() => this.removeRequirement(k)}>✕</button></td>
      </tr>
      <tr class="window"><td></td><td colspan="4">${this.renderWindow(r, k)}</td></tr>
      ${blocked || isOmitted(this.view, path) ? html`<tr><td colspan="5">
        ${blocked ? html`<div class="blocked" role="alert">${blocked}</div>` : html`<div class="omitted">Left out of the analysis until its cells are fixed.</div>`}
      </td></tr>` : nothing}
    </tbody>`;
  }

  private renderWindow(r: RequirementEntry, k: number) {
    if (!r.window) return html`<span class="hint">Applies over the whole mission.</span> <button @click=${() => this.setWindow(k, true)}>Limit to a window</button>`;
    const q = (end: 'start' | 'end') => html`<sl-quantity .store=${this.store} .doc=${this.doc} .view=${this.view}
      path=${`requirements[${k}].window.${end}`} label=${`${r.id} window ${end}`} .dimensions=${['time']}></sl-quantity>`;
    return html`<div class="span"><span class="hint">Window from</span>${q('start')}<span class="hint">to</span>${q('end')}
      <button @click=${() => this.setWindow(k, false)}>Whole mission</button></div>`;
  }

  private rename(k: number, e: CustomEvent<CellCommitDetail>): void {
    if (!e.detail.changed) return;
    const id = String(e.detail.content ?? '');
    const problem = idProblem(id, (this.store.document.requirements ?? []).filter((_, i) => i !== k).map((r) => r.id), 'requirement id');
    if (problem) return e.detail.reject(problem);
    this.store.edit(`rename requirement to ${id}`, (d) => (d.requirements![k].id = id));
  }

  private pick(k: number, what: 'quantity' | 'level', value: string): void {
    let message = '';
    this.store.edit(`set ${what} of requirement ${this.store.document.requirements![k].id}`, (d) => {
      const r = d.requirements![k];
      if (what === 'level') return void (r.level = value as ConfidenceLevel);
      r.quantity = value as QuantityName;
      const dim = this.requirementModel.dimensionOf(r.quantity);
      if (unitDimension(r.limit.unit) !== dim) {
        message = `The limit of ${r.id} is now ${DIMENSIONS[dim].label}: its unit was set to ${DIMENSIONS[dim].picker[0]} and its number kept; check it.`;
        r.limit.unit = DIMENSIONS[dim].picker[0];
      }
    });
    if (message) this.dispatchEvent(new CustomEvent('sl-note', { detail: { message }, bubbles: true, composed: true }));
  }

  private setWindow(k: number, on: boolean): void {
    this.store.edit(`${on ? 'add' : 'remove'} window of requirement ${this.store.document.requirements![k].id}`, (d) => {
      if (on) d.requirements![k].window = { start: { value: 0, unit: 's' }, end: { value: 60, unit: 's' } };
      else delete d.requirements![k].window;
    });
  }

  private add(): void {
    const id = uniqueId('req', (this.store.document.requirements ?? []).map((r) => r.id));
    const r: RequirementEntry = { id, quantity: 'horizontal', level: '95%', limit: { value: 5, unit: 'm' } };
    this.store.edit(`add requirement ${id}`, (d) => (d.requirements = [...(d.requirements ?? []), r]));
  }

  private removeRequirement(k: number): void {
    this.store.edit(`remove requirement ${this.store.document.requirements![k].id}`, (d) => {
      d.requirements!.splice(k, 1);
      if (d.requirements!.length === 0) delete d.requirements;
    });
  }
}

declare global {
  interface HTMLElementTagNameMap {
    'sl-requirement-table': SlRequirementTable;
  }
}
