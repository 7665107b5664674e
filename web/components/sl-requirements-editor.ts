import { LitElement, css, html, nothing } from 'lit';
import { customElement, property } from 'lit/decorators.js';
import type { BudgetDocument } from '../../src';
import type { ViewResult } from '../../src';
import type { DocumentStore } from '../state/document-store';
import { editorStyles } from '../grid/editor-styles';
import { blockedWithin } from '../grid/view-lookup';
import { LEVELS } from '../../src';
import type { ConfidenceLevel } from '../../src';
import './sl-checkpoint-list';
import './sl-quantity';
import './sl-requirement-table';
import type { RequirementModel } from './sl-requirement-table';

/**
 * The "Requirements" tab: the limits the budget must meet, the checkpoints
 * at which the report prints the budget, and the analysis time step.
 */
@customElement('sl-requirements-editor')
export class SlRequirementsEditor extends LitElement {
  static override styles = [editorStyles, css`
    :host { display: block; }
    .step { display: grid; grid-template-columns: auto 200px 1fr; gap: 8px; align-items: center; }
    .step select { font: inherit; justify-self: start; }
  `];

  /** The open document's store; every edit goes through it. */
  @property({ attribute: false }) store!: DocumentStore;
  /** The document shown (the store's current one); a new object re-renders. */
  @property({ attribute: false }) doc?: BudgetDocument;
  /** The latest view: cell errors and blocking problems. */
  @property({ attribute: false }) view?: ViewResult;
  /** The quantities a requirement may name and the dimension of each limit (a 3-D budget passes its own). */
  @property({ attribute: false }) model?: RequirementModel;

  override render() {
    const stepProblem = blockedWithin(this.view, 'settings');
    return html`
      <h3>Requirements</h3>
      <sl-requirement-table .store=${this.store} .doc=${this.doc} .view=${this.view} .model=${this.model}></sl-requirement-table>
      <h3>Checkpoints</h3>
      <sl-checkpoint-list .store=${this.store} .doc=${this.doc} .view=${this.view}></sl-checkpoint-list>
      <h3>Analysis</h3>
      <div class="step">
        <span>Time step</span>
        <sl-quantity .store=${this.store} .doc=${this.doc} .view=${this.view} path="settings.step" label="Analysis time step" .dimensions=${['time']}></sl-quantity>
        <span class="hint">of the covariance analysis and of every output series</span>
        <span>Table level</span>
        <select aria-label="Level of the budget tables" @change=${this.levelChanged}>
          ${LEVELS.map((l) => html`<option .value=${l} ?selected=${l === (this.store.document.settings.level ?? '1sigma')}>${LEVEL_WORDS[l]}</option>`)}
        </select>
        <span class="hint">at which the command line's budget tables show each source (series and charts stay 1σ)</span>
      </div>
      ${stepProblem ? html`<div class="blocked" role="alert">${stepProblem}</div>` : nothing}
    `;
  }

  private levelChanged(e: Event): void {
    const level = (e.target as HTMLSelectElement).value as ConfidenceLevel;
    this.store.edit(`set the table level to ${level}`, (d) => {
      if (level === '1sigma') delete d.settings.level;
      else d.settings.level = level;
    });
  }
}

const LEVEL_WORDS: Record<ConfidenceLevel, string> = { '1sigma': '1σ', '2sigma': '2σ', '95%': '95 %', '50%': '50 %' };

declare global {
  interface HTMLElementTagNameMap {
    'sl-requirements-editor': SlRequirementsEditor;
  }
}
