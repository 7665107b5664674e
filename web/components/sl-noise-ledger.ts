import { LitElement, css, html, nothing } from 'lit';
import { customElement, property, query, state } from 'lit/decorators.js';
import type { NoiseTrace, TracedEntry } from '../../src';
import { LEDGER_BLOCKS, noiseLedgerMarkdown, valueAndRoot } from '../charts/noise-markdown';

/** Detail of `sl-ledger-copied`. */
export interface LedgerCopiedDetail {
  markdown: string;
  /** False when the browser refused the clipboard and the text was offered for copying by hand. */
  onClipboard: boolean;
}

/**
 * The ledger of the R, Q and P0 the analysis used: each entry with its
 * total (and square root: σ or noise density) and every source's piece,
 * derivation and unit conversions. "Copy as Markdown" puts the ledger on
 * the clipboard; where the browser refuses, the text is shown selected.
 *
 * @fires sl-ledger-copied - after a copy; detail {@link LedgerCopiedDetail}
 */
@customElement('sl-noise-ledger')
export class SlNoiseLedger extends LitElement {
  static override styles = css`
    :host { display: block; font-size: 13px; }
    .actions { display: flex; gap: 10px; align-items: center; }
    button { font: inherit; border: 1px solid var(--sl-accent); background: var(--sl-panel); color: var(--sl-accent); border-radius: var(--sl-radius); padding: 3px 10px; cursor: pointer; }
    .note { font-size: 12px; color: var(--sl-ink-soft); }
    textarea { width: 100%; height: 140px; font-family: var(--sl-mono); font-size: 11px; margin-top: 6px; }
    h3 { font-size: 13px; margin: 14px 0 4px; }
    h3 span { font-weight: 400; color: var(--sl-ink-soft); }
    table { border-collapse: collapse; width: 100%; font-variant-numeric: tabular-nums; }
    th, td { padding: 2px 6px; text-align: left; vertical-align: top; border-bottom: 1px solid var(--sl-rule); }
    tr.piece td { border-bottom: none; }
    tr.how td { padding-left: 22px; font-size: 12px; }
    tr.total td { background: var(--sl-accent-soft); font-weight: 600; }
    .mono { font-family: var(--sl-mono); font-size: 12px; }
    .n { text-align: right; white-space: nowrap; }
    .conv { color: var(--sl-ink-soft); font-size: 12px; }
  `;

  /** The traced R, Q and P0 (values in SI, units as written in each entry). */
  @property({ attribute: false }) noise?: NoiseTrace;
  /** Budget title, for the Markdown heading. */
  @property({ attribute: 'budget-title' }) budgetTitle = '';
  /** The caution carried by every copy. */
  @property() caution = '';

  @state() private note = '';
  @state() private fallback?: string;

  @query('textarea') private textarea?: HTMLTextAreaElement;

  override render() {
    if (!this.noise) return nothing;
    return html`
      <div class="actions">
        <button @click=${this.copy}>Copy as Markdown</button>
        <span class="note" role="status">${this.note}</span>
      </div>
      ${this.fallback !== undefined ? html`<textarea readonly aria-label="Ledger as Markdown" .value=${this.fallback}></textarea>` : nothing}
      ${LEDGER_BLOCKS.map(([key, symbol, meaning]) => html`
        <h3>${symbol} <span>${meaning}</span></h3>
        ${this.noise![key].length ? this.table(this.noise![key]) : html`<p class="note">none</p>`}`)}
    `;
  }

  private table(entries: TracedEntry[]) {
    return html`
      <table>
        <thead><tr><th>Entry / source</th><th class="n">Value</th><th class="n">√ value</th></tr></thead>
        ${entries.map((e) => html`<tbody data-entry=${e.name}>
          <tr class="total"><td>${e.name} (total)</td>${valueAndRoot(e.totalSI, e.unitSI).map((v) => html`<td class="n">${v}</td>`)}</tr>
          ${e.pieces.map((p) => html`
            <tr class="piece"><td class="mono">${p.sourceId}</td>${valueAndRoot(p.valueSI, e.unitSI).map((v) => html`<td class="n">${v}</td>`)}</tr>
            <tr class="how"><td colspan="3">${p.derivation}${p.conversions.map((c) => html`<div class="conv">${c}</div>`)}</td></tr>`)}
        </tbody>`)}
      </table>
    `;
  }

  private async copy(): Promise<void> {
    const markdown = noiseLedgerMarkdown(this.noise!, this.budgetTitle, this.caution);
    let onClipboard = false;
    try {
      if (!navigator.clipboard) throw new Error('no clipboard');
      await navigator.clipboard.writeText(markdown);
      onClipboard = true;
    } catch {
      // Refused (no permission, no focus, insecure page): offer the text instead.
    }
    this.fallback = onClipboard ? undefined : markdown;
    this.note = onClipboard
      ? `Copied ${markdown.split('\n').length} lines of Markdown.`
      : 'The browser did not allow copying; the Markdown is selected below: press Ctrl+C.';
    await this.updateComplete;
    this.textarea?.select();
    this.dispatchEvent(new CustomEvent<LedgerCopiedDetail>('sl-ledger-copied', { detail: { markdown, onClipboard }, bubbles: true, composed: true }));
  }
}

declare global {
  interface HTMLElementTagNameMap {
    'sl-noise-ledger': SlNoiseLedger;
  }
}
