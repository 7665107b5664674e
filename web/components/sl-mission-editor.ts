import { LitElement, css, html, nothing } from 'lit';
import { customElement, property } from 'lit/decorators.js';
import type { BudgetDocument } from '../../src';
import type { ViewResult } from '../../src';
import type { DimensionName } from '../../src';
import type { DocumentStore } from '../state/document-store';
import { editorStyles } from '../grid/editor-styles';
import { isWithin } from '../grid/view-lookup';
import type { CellCommitDetail } from './sl-cell';
import './sl-cell';
import './sl-quantity';
import './sl-segment-table';

const POSE_SOURCES = [
  { key: 'initialPosition', label: 'Start position, 1σ per axis', dims: ['length'] as DimensionName[] },
  { key: 'initialHeading', label: 'Start heading, 1σ', dims: ['angle'] as DimensionName[] },
] as const;

/**
 * The "Mission" tab: the start pose, the start-pose uncertainties (error
 * sources of their own, with provenance), the plan view of the path, and
 * the segments. The plan view element (<sl-plan-view>) is defined with the
 * findings; until it is, it renders nothing.
 */
@customElement('sl-mission-editor')
export class SlMissionEditor extends LitElement {
  static override styles = [editorStyles, css`
    :host { display: block; }
    .pose { display: grid; grid-template-columns: repeat(3, minmax(150px, 1fr)); gap: 6px 12px; }
    .field > span { display: block; font-size: 11px; color: var(--sl-ink-soft); margin-bottom: 1px; }
    .sources { display: grid; grid-template-columns: 190px 180px 1fr auto; gap: 4px 8px; align-items: start; }
    .sources .name { font-size: 12px; padding-top: 3px; }
    sl-plan-view { display: block; margin: 8px 0; }
    textarea { border-color: var(--sl-rule); }
  `];

  /** The open document's store; every edit goes through it. */
  @property({ attribute: false }) store!: DocumentStore;
  /** The document shown (the store's current one); a new object re-renders. */
  @property({ attribute: false }) doc?: BudgetDocument;
  /** The latest view: cell errors, the blocking problem, the plan for the plan view. */
  @property({ attribute: false }) view?: ViewResult;

  override render() {
    const m = this.store.document.mission;
    const blocked = this.view?.blocked;
    const own = blocked?.path && isWithin(blocked.path, 'mission') && !isWithin(blocked.path, 'mission.segments') ? blocked.message : undefined;
    const q = (path: string, label: string, dims: DimensionName[]) => html`<label class="field"><span>${label}</span>
      <sl-quantity .store=${this.store} .doc=${this.doc} .view=${this.view} path=${path} label=${label} .dimensions=${dims}></sl-quantity></label>`;
    return html`
      ${own ? html`<div class="blocked" role="alert">${own}</div>` : nothing}
      <h3>Start pose</h3>
      <div class="pose">
        ${q('mission.start.north', 'Start north', ['length'])}
        ${q('mission.start.east', 'Start east', ['length'])}
        ${q('mission.start.heading', 'Start heading (clockwise from north)', ['angle'])}
      </div>
      <h3>Start-pose uncertainty</h3>
      <div class="sources">
        ${POSE_SOURCES.map((p) => html`
          <span class="name">${p.label}<br /><span class="hint">mission.${p.key}</span></span>
          <sl-quantity .store=${this.store} .doc=${this.doc} .view=${this.view} path=${`mission.${p.key}`} label=${p.label} .dimensions=${p.dims}></sl-quantity>
          <sl-cell text .content=${m[p.key].provenance} label=${`${p.label}: provenance`} placeholder="where the number came from"
            @sl-commit=${(e: CustomEvent<CellCommitDetail>) => this.setText(p.key, e)}></sl-cell>
          <label class="inline"><input type="checkbox" .checked=${m[p.key].assumed} aria-label=${`${p.label}: assumed`}
            @change=${(e: Event) => this.setAssumed(p.key, (e.target as HTMLInputElement).checked)} />assumed</label>`)}
      </div>
      <h3>Path</h3>
      <sl-plan-view .plan=${this.view?.plan}></sl-plan-view>
      <sl-segment-table .store=${this.store} .doc=${this.doc} .view=${this.view}></sl-segment-table>
      <label class="field"><span>Note on the route</span>
        <textarea rows="2" aria-label="Note on the route" .value=${m.note ?? ''} @change=${this.noteChanged}></textarea></label>
    `;
  }

  private setText(key: 'initialPosition' | 'initialHeading', e: CustomEvent<CellCommitDetail>): void {
    if (e.detail.changed) this.store.edit(`edit provenance of mission.${key}`, (d) => (d.mission[key].provenance = String(e.detail.content ?? '')));
  }

  private setAssumed(key: 'initialPosition' | 'initialHeading', assumed: boolean): void {
    this.store.edit(`mark mission.${key} ${assumed ? 'assumed' : 'not assumed'}`, (d) => (d.mission[key].assumed = assumed));
  }

  private noteChanged(e: Event): void {
    const text = (e.target as HTMLTextAreaElement).value;
    this.store.edit('edit note on the route', (d) => {
      if (text.trim() === '') delete d.mission.note;
      else d.mission.note = text;
    });
  }
}

declare global {
  interface HTMLElementTagNameMap {
    'sl-mission-editor': SlMissionEditor;
  }
}
