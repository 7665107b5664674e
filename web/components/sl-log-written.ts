import { LitElement, css, html, nothing } from 'lit';
import { customElement, property } from 'lit/decorators.js';
import { editorStyles } from '../grid/editor-styles';
import type { WrittenRow } from '../../src';

/**
 * What a write into the grid did: each row added or overwritten, with the
 * new value (and the old one), and anything to check. Undo reverts the
 * whole write in one step.
 */
@customElement('sl-log-written')
export class SlLogWritten extends LitElement {
  static override styles = [editorStyles, css`
    :host { display: block; margin: 8px 0; padding: 6px 8px; border: 1px solid var(--sl-rule); border-left: 3px solid var(--sl-accent); background: var(--sl-panel); }
    ul { margin: 4px 0; padding-left: 18px; }
    li { font-size: 12px; }
    .id { font-family: var(--sl-mono); }
    .warn { color: var(--sl-warn-ink); }
  `];

  /** The rows written; nothing shows before a write. */
  @property({ attribute: false }) rows?: WrittenRow[];

  override render() {
    const rows = this.rows;
    if (!rows) return nothing;
    return html`
      <div role="status">Written into the grid as one step (Undo reverts it):</div>
      <ul>${rows.map((r) => html`
        <li><span class="id">${r.fullId}</span> ${r.action}: ${r.label} = ${r.value}${r.previous ? html` (was ${r.previous})` : nothing}
          ${r.warnings.map((w) => html`<div class="warn">${w}</div>`)}</li>`)}
      </ul>
    `;
  }
}

declare global {
  interface HTMLElementTagNameMap {
    'sl-log-written': SlLogWritten;
  }
}
