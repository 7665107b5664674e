import { LitElement, css, html, nothing } from 'lit';
import { customElement, property } from 'lit/decorators.js';
import type { BudgetDocument, NamedValue } from '../../src';
import type { ViewResult } from '../../src';
import type { DocumentStore } from '../state/document-store';
import { changeUnit } from '../../src';
import { editorStyles } from '../grid/editor-styles';
import { uniqueId, valueNameProblem } from '../../src';
import { renameValueReferences } from '../../src';
import { ALL_UNITS } from '../../src';
import { cellErrorAt, cellValueAt } from '../grid/view-lookup';
import type { CellCommitDetail } from './sl-cell';
import './sl-cell';

/** `values` with key `from` renamed to `to`, keeping the order. */
function renameKey(values: Record<string, NamedValue>, from: string, to: string): Record<string, NamedValue> {
  return Object.fromEntries(Object.entries(values).map(([k, v]) => [k === from ? to : k, v]));
}

/**
 * The "Named values" tab: numbers formulas use by name (`=cruiseSpeed/2`).
 * A reference yields the number in the value's own unit, so a unit change
 * converts the value and wraps references in CONVERTUNIT; a rename rewrites
 * every formula that uses the name.
 *
 * @fires sl-note - { message } after a rename or a unit change
 */
@customElement('sl-values-editor')
export class SlValuesEditor extends LitElement {
  static override styles = [editorStyles, css`
    :host { display: block; }
    col.name { width: 24%; } col.value { width: 24%; } col.unit { width: 15%; } col.act { width: 40px; }
    input.unit { font-family: var(--sl-mono); }
  `];

  /** The open document's store; every edit goes through it. */
  @property({ attribute: false }) store!: DocumentStore;
  /** The document shown (the store's current one); a new object re-renders. */
  @property({ attribute: false }) doc?: BudgetDocument;
  /** The latest view, for evaluated numbers and cell errors. */
  @property({ attribute: false }) view?: ViewResult;

  override render() {
    const entries = Object.entries(this.store.document.values ?? {});
    return html`
      <p class="hint">Formulas anywhere in the budget use these by name; a reference gives the number in the value's own unit.</p>
      <datalist id="units">${ALL_UNITS.map((u) => html`<option value=${u}></option>`)}</datalist>
      <table aria-label="Named values">
        <colgroup><col class="name" /><col class="value" /><col class="unit" /><col /><col class="act" /></colgroup>
        <thead><tr><th scope="col">Name</th><th scope="col">Value</th><th scope="col">Unit</th><th scope="col">Note</th><th><span class="sr-only">Actions</span></th></tr></thead>
        <tbody>${entries.map(([name, v]) => this.renderValue(name, v))}</tbody>
      </table>
      ${entries.length ? nothing : html`<p class="empty">No named values yet.</p>`}
      <div class="bar"><button @click=${this.add}>Add named value</button></div>
    `;
  }

  private renderValue(name: string, v: NamedValue) {
    const path = `values.${name}.value`;
    return html`<tr>
      <td><sl-cell text .content=${name} label=${`Name of ${name}`} @sl-commit=${(e: CustomEvent<CellCommitDetail>) => this.rename(name, e)}></sl-cell></td>
      <td><sl-cell .content=${v.value} label=${`${name} value`} .evaluated=${cellValueAt(this.view, path)} .error=${cellErrorAt(this.view, path)?.message}
        @sl-commit=${(e: CustomEvent<CellCommitDetail>) => e.detail.changed && this.store.setCell(path, e.detail.content!)}></sl-cell></td>
      <td><input type="text" class="unit" list="units" aria-label=${`${name} unit`} .value=${v.unit} @change=${(e: Event) => this.unitChanged(name, e)} /></td>
      <td><input type="text" aria-label=${`${name} note`} .value=${v.note ?? ''} @change=${(e: Event) => this.noteChanged(name, e)} /></td>
      <td><button class="icon" aria-label=${`Remove ${name}`} title="Remove" @click=${() => this.removeValue(name)}>✕</button></td>
    </tr>`;
  }

  private note(message: string): void {
    this.dispatchEvent(new CustomEvent('sl-note', { detail: { message }, bubbles: true, composed: true }));
  }

  private rename(name: string, e: CustomEvent<CellCommitDetail>): void {
    const next = String(e.detail.content ?? '');
    if (!e.detail.changed) return;
    const problem = valueNameProblem(next, Object.keys(this.store.document.values ?? {}).filter((k) => k !== name));
    if (problem) return e.detail.reject(problem);
    let count = 0;
    this.store.edit(`rename ${name} to ${next}`, (d) => {
      count = renameValueReferences(d, name, next);
      d.values = renameKey(d.values!, name, next);
    });
    this.note(`Renamed ${name} to ${next}${count ? `; ${count} formula${count > 1 ? 's' : ''} updated` : ''}.`);
  }

  private unitChanged(name: string, e: Event): void {
    const input = e.target as HTMLInputElement;
    const unit = input.value.trim();
    if (unit === '' || unit === this.store.document.values?.[name]?.unit) {
      input.value = this.store.document.values?.[name]?.unit ?? '';
      return;
    }
    let message = '';
    this.store.edit(`change unit of ${name} to ${unit}`, (d) => (message = changeUnit(d, `values.${name}`, unit)));
    this.note(`${name}: ${message}`);
  }

  private noteChanged(name: string, e: Event): void {
    const text = (e.target as HTMLInputElement).value;
    this.store.edit(`edit note of ${name}`, (d) => {
      if (text.trim() === '') delete d.values![name].note;
      else d.values![name].note = text;
    });
  }

  private add(): void {
    const name = uniqueId('value', Object.keys(this.store.document.values ?? {}));
    this.store.edit(`add named value ${name}`, (d) => (d.values = { ...(d.values ?? {}), [name]: { value: 0, unit: '1' } }));
  }

  private removeValue(name: string): void {
    this.store.edit(`remove named value ${name}`, (d) => {
      delete d.values![name];
      if (Object.keys(d.values!).length === 0) delete d.values;
    });
    this.note(`Removed ${name}; formulas that used it now show an error until you undo or change them.`);
  }
}

declare global {
  interface HTMLElementTagNameMap {
    'sl-values-editor': SlValuesEditor;
  }
}
