import { LitElement, css, html, nothing, type PropertyValues } from 'lit';
import { customElement, property, state } from 'lit/decorators.js';
import type { ViewResult } from '../../src';
import type { DocumentStore } from '../state/document-store';
import { editorStyles } from '../grid/editor-styles';
import { errorsWithin, isWithin } from '../grid/view-lookup';
import type { SlSuiteEditor } from './sl-suite-editor';
import './sl-log-import';
import './sl-mission-editor';
import './sl-requirements-editor';
import './sl-suite-editor';
import './sl-values-editor';

/** The workbench's tabs. */
export type WorkbenchTab = 'suite' | 'mission' | 'values' | 'requirements' | 'logs';

const TABS: { key: WorkbenchTab; label: string; roots: string[] }[] = [
  { key: 'suite', label: 'Suite', roots: ['sensors'] },
  { key: 'mission', label: 'Mission', roots: ['mission'] },
  { key: 'values', label: 'Named values', roots: ['values'] },
  { key: 'requirements', label: 'Requirements', roots: ['requirements', 'checkpoints', 'settings'] },
  { key: 'logs', label: 'Sensor logs', roots: [] },
];

/** The tab that edits the item at a document path. */
function tabOf(path: string): WorkbenchTab {
  return TABS.find((t) => t.roots.some((r) => isWithin(path, r)))?.key ?? 'suite';
}

/**
 * The editing side of the page: tabs for the sensor suite, the mission, the
 * named values, the requirements and the sensor-log import. Every change goes through the store
 * (so undo covers it); the workbench re-renders when the store changes and
 * when a new view arrives. A problem that blocks the analysis is shown at
 * the top with a way to the item, and items left out of the analysis are
 * listed.
 */
@customElement('sl-workbench')
export class SlWorkbench extends LitElement {
  static override styles = [editorStyles, css`
    :host { display: block; padding: 0 12px 24px; background: var(--sl-paper); }
    [role='tablist'] { display: flex; gap: 2px; border-bottom: 2px solid var(--sl-ink); position: sticky; top: 0; background: var(--sl-paper); padding-top: 8px; z-index: 2; }
    [role='tab'] { border: 1px solid var(--sl-rule); border-bottom: none; border-radius: var(--sl-radius) var(--sl-radius) 0 0; padding: 5px 14px; font-size: 13px; background: var(--sl-paper); }
    [role='tab'][aria-selected='true'] { background: var(--sl-ink); color: var(--sl-paper); border-color: var(--sl-ink); }
    [role='tab']:hover { background: var(--sl-accent-soft); color: var(--sl-ink); }
    [role='tab'][aria-selected='true']:hover { background: #2f3a45; color: #ffffff; }
    .badge { color: var(--sl-fail); font-weight: 700; margin-left: 4px; }
    [aria-selected='true'] .badge { color: #ffc2ad; }
    .alerts { margin: 8px 0 0; display: grid; gap: 4px; }
    .omitted ul { margin: 2px 0; padding-left: 18px; }
    .status { min-height: 1.3em; font-size: 12px; color: var(--sl-ink-soft); margin: 4px 0; }
    button.link { border: none; background: none; color: var(--sl-accent); text-decoration: underline; padding: 0 2px; }
  `];

  /** The open document's store; the workbench subscribes to its `change` events while connected. */
  @property({ attribute: false }) store!: DocumentStore;
  /** The latest computed view (may lag the document while a recompute runs). */
  @property({ attribute: false }) view?: ViewResult;

  /** The tab shown. */
  @state() tab: WorkbenchTab = 'suite';
  @state() private note?: string;
  private subscribed?: DocumentStore;
  // A 3-D document is edited by sl-inertial-workbench; this one is about to leave the page and must not render it.
  private readonly storeChanged = () => ((this.store.document as { model?: string }).model === 'inertial' ? undefined : this.requestUpdate());

  override connectedCallback(): void {
    super.connectedCallback();
    this.subscribe();
  }

  override disconnectedCallback(): void {
    this.subscribed?.removeEventListener('change', this.storeChanged);
    this.subscribed = undefined;
    super.disconnectedCallback();
  }

  protected override willUpdate(changed: PropertyValues<this>): void {
    if (changed.has('store') && this.isConnected) this.subscribe();
  }

  override render() {
    if (!this.store) return nothing;
    return html`
      <div role="tablist" aria-label="Workbench" @keydown=${this.tabKeys}>${TABS.map((t) => this.renderTab(t))}</div>
      ${this.renderAlerts()}
      <div class="status" role="status" aria-live="polite">${this.note ?? ''}</div>
      <div role="tabpanel" id="panel" aria-labelledby=${`tab-${this.tab}`} @sl-note=${(e: CustomEvent<{ message: string }>) => (this.note = e.detail.message)}>
        ${this.renderPanel()}
      </div>
    `;
  }

  private renderTab(t: (typeof TABS)[number]) {
    const count = t.roots.reduce((n, r) => n + errorsWithin(this.view, r).length, 0);
    const selected = t.key === this.tab;
    return html`<button role="tab" id=${`tab-${t.key}`} aria-selected=${selected ? 'true' : 'false'} aria-controls="panel" tabindex=${selected ? 0 : -1}
      @click=${() => this.show(t.key)}>${t.label}${count ? html`<span class="badge" title=${`${count} cell error${count > 1 ? 's' : ''}`}>⚠${count}</span>` : nothing}</button>`;
  }

  private renderAlerts() {
    const blocked = this.view?.blocked;
    const omitted = this.view?.omitted ?? [];
    if (!blocked && omitted.length === 0) return nothing;
    return html`<div class="alerts">
      ${blocked ? html`<div class="blocked" role="alert"><strong>Cannot compute:</strong> ${blocked.message}
        ${blocked.path ? html`<button class="link" @click=${() => this.show(tabOf(blocked.path!), blocked.path)}>show ${blocked.path}</button>` : nothing}</div>` : nothing}
      ${omitted.length ? html`<div class="omitted"><strong>Left out of the analysis</strong> (a cell they need has an error):
        <ul>${omitted.map((o) => html`<li>${o.what} is left out of the analysis
          <button class="link" @click=${() => this.show(tabOf(o.path), o.path)}>show</button></li>`)}</ul></div>` : nothing}
    </div>`;
  }

  private renderPanel() {
    const p = { store: this.store, doc: this.store.document, view: this.view };
    switch (this.tab) {
      case 'suite': return html`<sl-suite-editor .store=${p.store} .doc=${p.doc} .view=${p.view}></sl-suite-editor>`;
      case 'mission': return html`<sl-mission-editor .store=${p.store} .doc=${p.doc} .view=${p.view}></sl-mission-editor>`;
      case 'values': return html`<sl-values-editor .store=${p.store} .doc=${p.doc} .view=${p.view}></sl-values-editor>`;
      case 'requirements': return html`<sl-requirements-editor .store=${p.store} .doc=${p.doc} .view=${p.view}></sl-requirements-editor>`;
      case 'logs': return html`<sl-log-import .store=${p.store} .view=${p.view}></sl-log-import>`;
    }
  }

  /** Shows a tab and, for a path inside a sensor, picks that sensor. */
  async show(tab: WorkbenchTab, path?: string): Promise<void> {
    this.tab = tab;
    const sensor = path ? /^sensors\[(\d+)\]/.exec(path) : null;
    if (!sensor) return;
    await this.updateComplete;
    const suite = this.renderRoot.querySelector('sl-suite-editor') as SlSuiteEditor | null;
    if (suite) suite.selected = Number(sensor[1]);
  }

  private subscribe(): void {
    if (this.subscribed === this.store) return;
    this.subscribed?.removeEventListener('change', this.storeChanged);
    this.subscribed = this.store;
    this.store?.addEventListener('change', this.storeChanged);
  }

  private tabKeys(e: KeyboardEvent): void {
    const i = TABS.findIndex((t) => t.key === this.tab);
    const next = { ArrowRight: i + 1, ArrowLeft: i - 1, Home: 0, End: TABS.length - 1 }[e.key];
    if (next === undefined) return;
    e.preventDefault();
    const tab = TABS[(next + TABS.length) % TABS.length].key;
    this.tab = tab;
    void this.updateComplete.then(() => (this.renderRoot.querySelector(`#tab-${tab}`) as HTMLElement | null)?.focus());
  }
}

declare global {
  interface HTMLElementTagNameMap {
    'sl-workbench': SlWorkbench;
  }
}
