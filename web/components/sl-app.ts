import { LitElement, css, html, nothing } from 'lit';
import { customElement, state } from 'lit/decorators.js';
import { SigmaLedgerError } from '../../src';
import { CAUTION, isInertialDocument, type AnyBudgetDocument } from '../../src';
import { DocumentStore } from '../state/document-store';
import { Autosave } from '../state/autosave';
import { downloadBudget, offerDownload, readBudgetFile } from '../state/file-io';
import { makeReviewReport, reportFileName } from '../report/make-report';
import { ComputeController } from '../compute/compute-controller';
import { EXAMPLES } from '../examples';
import './sl-workbench';
import './sl-findings';
import './sl-inertial-workbench';
import './sl-inertial-findings';

/**
 * The page: a header with the document's file actions, undo/redo and the
 * compute status; the workbench (editors) on the left and the findings
 * (charts, tables, ledger) on the right; the caution always visible.
 * Owns the document store, its autosave and the compute controller.
 */
@customElement('sl-app')
export class SlApp extends LitElement {
  static override styles = css`
    :host { display: flex; flex-direction: column; height: 100vh; min-width: 1024px; }
    header { display: flex; align-items: center; gap: 12px; padding: 6px 14px; background: var(--sl-ink); color: #f6f4ee; }
    .brand { font-weight: 700; letter-spacing: 0.02em; font-size: 15px; }
    .brand span { font-weight: 400; opacity: 0.75; margin-left: 6px; }
    .title { flex: 1; font-size: 14px; opacity: 0.95; white-space: nowrap; overflow: hidden; text-overflow: ellipsis; }
    header button, header select, header label.file {
      font: inherit; font-size: 13px; background: transparent; color: inherit; border: 1px solid #6b7580;
      border-radius: var(--sl-radius); padding: 3px 10px; cursor: pointer;
    }
    header button:disabled { opacity: 0.4; cursor: default; }
    header select { background: var(--sl-ink); max-width: 200px; }
    label.file input { display: none; }
    .status { min-width: 170px; text-align: right; font-size: 12px; font-variant-numeric: tabular-nums; }
    .status[data-state='pending'] { color: #ffd38a; }
    .status[data-state='error'] { color: #ffb59e; }
    .caution { background: var(--sl-warn-bg); color: var(--sl-warn-ink); font-size: 12px; padding: 4px 14px; border-bottom: 1px solid var(--sl-rule); }
    .banner { background: var(--sl-error-bg); color: var(--sl-fail); padding: 6px 14px; font-size: 13px; display: flex; gap: 8px; }
    .banner button { margin-left: auto; }
    main { flex: 1; display: grid; grid-template-columns: minmax(0, 11fr) minmax(0, 9fr); min-height: 0; }
    sl-workbench, sl-findings, sl-inertial-workbench, sl-inertial-findings { min-height: 0; overflow: auto; }
    /* Below about 1180 px the editors need more than 11/20 of the width for the error-source grid's nine columns. */
    @media (max-width: 1180px) { main { grid-template-columns: minmax(0, 3fr) minmax(0, 2fr); } }
    sl-workbench, sl-inertial-workbench { border-right: 1px solid var(--sl-rule); }
  `;

  /** The open document; public so tests can reach it. */
  readonly store = new DocumentStore(EXAMPLES[0].document, EXAMPLES[0].fileName);
  readonly autosave = new Autosave();
  readonly compute = new ComputeController(this);

  @state() private message?: string;
  @state() private ready = false;
  /** True while the report worker builds a report. */
  @state() private reporting = false;

  override connectedCallback(): void {
    super.connectedCallback();
    this.store.addEventListener('change', () => {
      this.compute.request(this.store.document);
      this.requestUpdate();
    });
    this.addEventListener('dragover', (e) => e.preventDefault());
    this.addEventListener('drop', (e) => this.dropped(e));
    window.addEventListener('keydown', this.keydown);
    this.autosave.addEventListener('status', () => this.requestUpdate());
    void this.restore();
  }

  override disconnectedCallback(): void {
    window.removeEventListener('keydown', this.keydown);
    super.disconnectedCallback();
  }

  override render() {
    const c = this.compute;
    return html`
      <header>
        <div class="brand">Sigma Ledger<span>error budgets</span></div>
        <div class="title" title=${this.store.fileName}>${this.store.document.title} · ${this.store.fileName}</div>
        <label class="file" title="Open a budget file (or drop one on the page)">Open…<input type="file" accept=".json,application/json" @change=${this.opened} /></label>
        <button @click=${this.save} title="Save the budget as JSON (the same file the command line reads)">Save</button>
        <button id="report" ?disabled=${this.reporting || this.is3d} @click=${this.downloadReport}
          title=${this.is3d ? 'The design-review report covers planar budgets only so far; save the 3-D budget and run it with sigma-ledger run'
            : 'Download the design-review report: one HTML file to open, print or file (the same as sigma-ledger report)'}>${this.reporting ? 'Making report…' : 'Report'}</button>
        <select aria-label="Load an example budget" @change=${this.loadExample}>
          <option value="">Examples…</option>
          ${EXAMPLES.map((e, i) => html`<option value=${i} data-file=${e.fileName}>${e.document.title}</option>`)}
        </select>
        <button ?disabled=${!this.store.canUndo} title=${`Undo ${this.store.undoLabel ?? ''} (Ctrl+Z)`} @click=${() => this.store.undo()}>Undo</button>
        <button ?disabled=${!this.store.canRedo} title=${`Redo ${this.store.redoLabel ?? ''} (Ctrl+Shift+Z)`} @click=${() => this.store.redo()}>Redo</button>
        <div class="status" data-state=${c.status} role="status" aria-live="polite">${this.statusText()}</div>
      </header>
      <div class="caution" role="note"><strong>Caution:</strong> ${CAUTION}</div>
      ${this.autosave.failure ? html`<div class="banner save-failed" role="alert"><strong>Your edits are not being saved in this browser:</strong>
        ${this.autosave.failure}. A reload would lose them; keep a copy of the current budget:
        <button @click=${this.save}>Download the current budget</button></div>` : nothing}
      ${this.message ? html`<div class="banner" role="alert">${this.message}<button @click=${() => (this.message = undefined)}>Dismiss</button></div>` : nothing}
      <main>${this.is3d ? html`
        <sl-inertial-workbench .store=${this.store} .view=${c.view}></sl-inertial-workbench>
        <sl-inertial-findings .view=${c.view} .stale=${c.stale}></sl-inertial-findings>` : html`
        <sl-workbench .store=${this.store} .view=${c.view}></sl-workbench>
        <sl-findings .view=${c.view} .stale=${c.stale} .status=${c.status} .document=${this.store.document}></sl-findings>`}
      </main>
    `;
  }

  /** True while the open document is a 3-D budget (its own editors and findings). */
  private get is3d(): boolean {
    return isInertialDocument(this.store.document as AnyBudgetDocument);
  }

  private statusText(): string {
    const c = this.compute;
    if (!this.ready) return 'restoring…';
    if (c.status === 'pending' && !c.stale && c.view?.contributionsPending) return 'totals up to date · shares updating…';
    if (c.status === 'pending') return c.view ? 'computing… (results shown are stale)' : 'computing…';
    if (c.status === 'error') return `engine error: ${c.error}`;
    if (c.view?.blocked) return 'cannot compute: see the workbench';
    return c.view ? `up to date · ${c.elapsedMs.toFixed(0)} ms` : '';
  }

  private async restore(): Promise<void> {
    const saved = await this.autosave.load();
    if (saved) this.store.restore(saved);
    if (this.autosave.restoreNote) this.message = this.autosave.restoreNote;
    this.autosave.attach(this.store);
    this.ready = true;
    this.compute.request(this.store.document, true);
  }

  private readonly keydown = (e: KeyboardEvent) => {
    if (!(e.ctrlKey || e.metaKey)) return;
    const inText = (e.composedPath()[0] as HTMLElement | undefined)?.matches?.('input, textarea, [contenteditable]');
    if (inText) return; // the field's own undo applies while typing
    const key = e.key.toLowerCase();
    if (key === 'z' && !e.shiftKey) this.store.undo();
    else if ((key === 'z' && e.shiftKey) || key === 'y') this.store.redo();
    else return;
    e.preventDefault();
  };

  private async open(file: File): Promise<void> {
    try {
      const { document, notes } = await readBudgetFile(file);
      this.store.replace(document, file.name);
      this.message = notes.length ? notes.join(' ') : undefined;
    } catch (e) {
      if (!(e instanceof SigmaLedgerError)) throw e;
      this.message = `Could not open ${file.name}: ${e.message}. Your current budget is unchanged.`;
    }
  }

  private opened(e: Event): void {
    const input = e.target as HTMLInputElement;
    const file = input.files?.[0];
    input.value = '';
    if (file) void this.open(file);
  }

  private dropped(e: DragEvent): void {
    e.preventDefault();
    const file = e.dataTransfer?.files?.[0];
    if (file) void this.open(file);
  }

  private save(): void {
    downloadBudget(this.store.document, this.store.fileName);
  }

  private async downloadReport(): Promise<void> {
    this.reporting = true;
    const { document, fileName } = this.store;
    try {
      offerDownload(await makeReviewReport(document, fileName, 'html'), reportFileName(fileName, 'html'), 'text/html');
    } catch (e) {
      this.message = `Could not make the report: ${(e as Error).message}`;
    } finally {
      this.reporting = false;
    }
  }

  private loadExample(e: Event): void {
    const select = e.target as HTMLSelectElement;
    const example = EXAMPLES[Number(select.value)];
    select.value = '';
    if (!example) return;
    // Loading is undoable, but say so before replacing edited work.
    if (this.store.canUndo && !window.confirm(`Replace "${this.store.document.title}" (${this.store.fileName}) with the example "${example.document.title}"? Undo brings your budget back.`)) return;
    this.store.replace(example.document, example.fileName, `load example ${example.fileName}`);
  }
}

declare global {
  interface HTMLElementTagNameMap {
    'sl-app': SlApp;
  }
}
