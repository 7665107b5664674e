import { LitElement, css, html, nothing } from 'lit';
import { customElement, property, state } from 'lit/decorators.js';
import { num, seconds } from '../charts/findings-text';
import type { CheckpointBudgetEntry, CheckpointEntry } from '../charts/result-shapes';
import { SHARE_QUANTITIES } from '../charts/share-series';

/** Shares below this fraction of the variance are counted, not listed. */
const LISTED_SHARE = 0.0005;

const QUANTITY_WORDS: Record<string, string> = Object.fromEntries(SHARE_QUANTITIES);

/**
 * The error budget at one checkpoint: per quantity the total 1σ, then the
 * sources by share of variance with their own σ, the share in % and a bar.
 * A picker chooses among the budget's checkpoints.
 */
@customElement('sl-checkpoint-table')
export class SlCheckpointTable extends LitElement {
  static override styles = css`
    :host { display: block; font-size: 13px; }
    label { font-size: 12px; color: var(--sl-ink-soft); }
    select { font: inherit; margin-left: 6px; }
    table { border-collapse: collapse; width: 100%; margin-top: 8px; font-variant-numeric: tabular-nums; }
    th, td { padding: 2px 6px; text-align: left; border-bottom: 1px solid var(--sl-rule); }
    td.n, th.n { text-align: right; white-space: nowrap; }
    tbody th, td.total { background: var(--sl-accent-soft); font-weight: 600; }
    td.id { font-family: var(--sl-mono); font-size: 12px; }
    .bar { width: 120px; }
    .bar div { height: 8px; background: var(--sl-accent); border-radius: 2px; }
    .rest td { color: var(--sl-ink-soft); font-style: italic; }
    p { color: var(--sl-ink-soft); }
  `;

  /** The result's checkpoints (σ in each budget's unit, shares 0 to 1). */
  @property({ attribute: false }) checkpoints: CheckpointEntry[] = [];

  /** Id of the shown checkpoint; the first when unset or gone. */
  @state() private chosen?: string;

  override render() {
    if (this.checkpoints.length === 0) {
      return html`<p>This budget has no checkpoints. Add one to the mission to see the budget at that moment.</p>`;
    }
    const cp = this.checkpoints.find((c) => c.id === this.chosen) ?? this.checkpoints[0];
    return html`
      <label>Checkpoint
        <select @change=${this.picked}>
          ${this.checkpoints.map((c) => html`<option value=${c.id} ?selected=${c === cp}>${c.id} (t = ${seconds(c.t_s)})</option>`)}
        </select>
      </label>
      <table>
        <thead><tr><th>Source</th><th class="n">1σ</th><th class="n">% of variance</th><th class="bar">share</th></tr></thead>
        ${cp.budgets.map((b) => this.budget(b))}
      </table>
    `;
  }

  private budget(b: CheckpointBudgetEntry) {
    const listed = b.sources.filter((s) => s.share >= LISTED_SHARE);
    const rest = b.sources.length - listed.length;
    return html`
      <tbody data-quantity=${b.quantity}>
        <tr><th>${QUANTITY_WORDS[b.quantity] ?? b.quantity}: total</th><th class="n">${num(b.sigma)} ${b.unit}</th><th class="n">100 %</th><td class="total"></td></tr>
        ${listed.map((s) => html`
          <tr data-source=${s.id}>
            <td class="id">${s.id}</td>
            <td class="n">${num(s.sigma)} ${b.unit}</td>
            <td class="n">${(100 * s.share).toFixed(1)} %</td>
            <td class="bar"><div style=${`width: ${Math.max(0, Math.min(100, 100 * s.share)).toFixed(1)}%`}></div></td>
          </tr>`)}
        ${rest ? html`<tr class="rest"><td colspan="4">${rest} more ${rest === 1 ? 'source' : 'sources'} below 0.05 % each</td></tr>` : nothing}
      </tbody>
    `;
  }

  private picked(e: Event): void {
    this.chosen = (e.target as HTMLSelectElement).value;
  }
}

declare global {
  interface HTMLElementTagNameMap {
    'sl-checkpoint-table': SlCheckpointTable;
  }
}
