import { LitElement, css, html, nothing, type PropertyValues } from 'lit';
import { customElement, property, state } from 'lit/decorators.js';
import type { BudgetDocument } from '../../src';
import type { ViewResult } from '../../src';
import type { DocumentStore } from '../state/document-store';
import { editorStyles } from '../grid/editor-styles';
import './sl-sensor-list';
import './sl-sensor-settings';
import './sl-source-grid';

/**
 * The "Suite" tab: the sensor list, the picked sensor's grid of error
 * sources, and its settings (rate, outages, landmarks) under the grid.
 */
@customElement('sl-suite-editor')
export class SlSuiteEditor extends LitElement {
  static override styles = [editorStyles, css`:host { display: block; } sl-source-grid { margin-top: 6px; }`];

  /** The open document's store; every edit goes through it. */
  @property({ attribute: false }) store!: DocumentStore;
  /** The document shown (the store's current one); a new object re-renders. */
  @property({ attribute: false }) doc?: BudgetDocument;
  /** The latest view: evaluated numbers, errors, items left out. */
  @property({ attribute: false }) view?: ViewResult;

  /** Index of the sensor being edited. */
  @state() selected = 0;

  protected override willUpdate(_changed: PropertyValues<this>): void {
    const count = this.store.document.sensors.length;
    if (this.selected >= count) this.selected = Math.max(0, count - 1);
  }

  override render() {
    const s = this.store.document.sensors[this.selected];
    return html`
      <sl-sensor-list .store=${this.store} .doc=${this.doc} .view=${this.view} .selected=${this.selected}
        @sl-select=${(e: CustomEvent<{ index: number }>) => (this.selected = e.detail.index)}></sl-sensor-list>
      ${s ? html`
        <h3>Error sources of ${s.id}</h3>
        <sl-source-grid .store=${this.store} .doc=${this.doc} .view=${this.view} .sensorIndex=${this.selected}></sl-source-grid>
        <sl-sensor-settings .store=${this.store} .doc=${this.doc} .view=${this.view} .sensorIndex=${this.selected}></sl-sensor-settings>` : nothing}
    `;
  }
}

declare global {
  interface HTMLElementTagNameMap {
    'sl-suite-editor': SlSuiteEditor;
  }
}
