import { LitElement, css, html, nothing } from 'lit';
import { customElement, property, query } from 'lit/decorators.js';
import { editorStyles } from '../grid/editor-styles';
import type { PasteResult } from '../grid/source-edits';

/**
 * What a paste of rows did: counts of rows added and overwritten, and each
 * line that could not be used with its reason. The unused lines stay in an
 * editable box, so the user can fix them and paste them again; nothing
 * typed is lost.
 *
 * @fires sl-paste-retry - { text } when the user applies the fixed lines
 * @fires sl-dismiss - when the user closes the report
 */
@customElement('sl-paste-report')
export class SlPasteReport extends LitElement {
  static override styles = [editorStyles, css`
    :host { display: block; margin: 8px 0; padding: 6px 8px; border: 1px solid var(--sl-rule); border-left: 3px solid var(--sl-accent); background: var(--sl-panel); }
    :host([has-problems]) { border-left-color: var(--sl-fail); }
    ul { margin: 4px 0; padding-left: 18px; }
    li { font-size: 12px; }
    textarea { font: 12px var(--sl-mono); border-color: var(--sl-rule); min-height: 3.5em; white-space: pre; }
  `];

  /** The paste's outcome. */
  @property({ attribute: false }) result?: PasteResult;

  @query('textarea') private box?: HTMLTextAreaElement;

  override render() {
    const r = this.result;
    if (!r) return nothing;
    return html`
      <div role="status">Pasted: ${r.added} row${r.added === 1 ? '' : 's'} added, ${r.replaced} overwritten (matched by id).</div>
      ${r.problems.length ? html`
        <div role="alert">${r.problems.length} line${r.problems.length === 1 ? ' was' : 's were'} not used:</div>
        <ul>${r.problems.map((p) => html`<li>line ${p.line}: ${p.message}</li>`)}</ul>
        <textarea aria-label="Lines not used; fix them and paste again" rows=${Math.min(6, r.problems.length + 1)}
          .value=${r.problems.map((p) => p.text).join('\n')}></textarea>` : nothing}
      <div class="bar">
        ${r.problems.length ? html`<button @click=${this.retry}>Paste these lines again</button>` : nothing}
        <button @click=${() => this.dispatchEvent(new CustomEvent('sl-dismiss', { bubbles: true }))}>Dismiss</button>
      </div>
    `;
  }

  protected override updated(): void {
    this.toggleAttribute('has-problems', (this.result?.problems.length ?? 0) > 0);
  }

  private retry(): void {
    this.dispatchEvent(new CustomEvent('sl-paste-retry', { detail: { text: this.box?.value ?? '' }, bubbles: true }));
  }
}

declare global {
  interface HTMLElementTagNameMap {
    'sl-paste-report': SlPasteReport;
  }
}
