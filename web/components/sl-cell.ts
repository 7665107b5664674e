import { LitElement, css, html, nothing } from 'lit';
import { customElement, property, query, state } from 'lit/decorators.js';
import type { Cell } from '../../src';
import { cellText, formatValue, isFormula, readCellText } from '../../src';

/** Where the active cell goes after a commit: Enter goes down (Shift+Enter up), Tab forward or back, a click elsewhere nowhere. */
export type CellMove = 'down' | 'up' | 'next' | 'previous' | 'none';

/** Detail of `sl-commit`. */
export interface CellCommitDetail {
  /** The new content: a number or formula (undefined when emptied), or the trimmed text in text mode. */
  content: Cell | undefined;
  /** True when it differs from the content the cell was given. */
  changed: boolean;
  move: CellMove;
  /** Call during the event to refuse the value: the cell keeps the typed text and shows `message`. */
  reject(message: string): void;
}

const isPrintable = (e: KeyboardEvent) => e.key.length === 1 && !e.ctrlKey && !e.metaKey && !e.altKey;

/**
 * One editable value: a number or "=" formula (or plain text in text mode),
 * with the formula's evaluated number under it and the cell's error in
 * place, described to assistive technology. Inside a grid (`grid`) it acts
 * like a spreadsheet cell: typing a character or Enter starts an edit,
 * Enter commits and moves down, Tab commits and moves on, Escape cancels;
 * arrow keys are left to the grid while not editing. Text that is not a
 * number or formula is never dropped: it stays in the field with a message.
 *
 * @fires sl-commit - {@link CellCommitDetail}, after Enter, Tab or leaving the field with changes
 * @fires sl-cancel - after Escape restored the content
 */
@customElement('sl-cell')
export class SlCell extends LitElement {
  static override styles = css`
    :host { display: block; min-width: 0; }
    input { box-sizing: border-box; width: 100%; font: 12px var(--sl-mono); color: var(--sl-ink); background: transparent;
      border: 1px solid transparent; border-radius: var(--sl-radius); padding: 2px 3px; }
    input:hover { border-color: var(--sl-rule); }
    input:focus { outline: 2px solid var(--sl-accent); outline-offset: -1px; background: var(--sl-panel); }
    input.editing { background: var(--sl-accent-soft); }
    input.text { font-family: var(--sl-font); }
    input.formula { color: var(--sl-accent); }
    input[aria-invalid='true'] { border-color: var(--sl-fail); background: var(--sl-error-bg); }
    .value { font: 11px var(--sl-mono); color: var(--sl-ink-soft); padding: 0 4px; overflow-wrap: anywhere; }
    .value .whole { color: var(--sl-accent); }
    .message { font-size: 11px; color: var(--sl-fail); padding: 1px 4px; overflow-wrap: anywhere; }
    .sr-only { position: absolute; width: 1px; height: 1px; overflow: hidden; clip: rect(0 0 0 0); white-space: nowrap; }
  `;

  /** The content shown: a number, a formula text starting with "=", plain text in text mode, undefined when empty. */
  @property({ attribute: false }) content?: Cell;
  /** Accessible name of the field ("gyro.arw magnitude"); required. */
  @property() label = '';
  /** Plain text (ids, provenance) instead of a number or formula. */
  @property({ type: Boolean }) text = false;
  /** May be left empty (commits `undefined`); otherwise an empty value is refused. */
  @property({ type: Boolean }) optional = false;
  /** The evaluated number of a formula (from the view), in the cell's own unit. */
  @property({ attribute: false }) evaluated?: number;
  /** The cell's error message from the view; shown in place. */
  @property() error?: string;
  /** Spreadsheet behaviour inside a grid: read-only until an edit starts, arrows and Tab left to the grid. */
  @property({ type: Boolean }) grid = false;
  /** Shows the view's error only to assistive technology (the grid prints it under the row). */
  @property({ type: Boolean }) compact = false;
  /** tabindex of the field (a grid gives 0 to its active cell and -1 to the others). */
  @property({ type: Number }) tab = 0;
  @property() placeholder = '';

  @state() private editing = false;
  @state() private draft = '';
  @state() private problem?: string;
  /** True when a formula is wider than its field: the line under it then shows the whole formula. */
  @state() private cut = false;
  @query('input') private input?: HTMLInputElement;
  private readonly resized = new ResizeObserver(() => this.measureCut());

  override connectedCallback(): void {
    super.connectedCallback();
    this.resized.observe(this);
  }

  override disconnectedCallback(): void {
    this.resized.disconnect();
    super.disconnectedCallback();
  }

  /** True while the user is editing the field. */
  get isEditing(): boolean {
    return this.editing;
  }

  override render() {
    const shown = cellText(this.content);
    const message = this.problem ?? this.error;
    const hidden = this.compact && !this.problem;
    const showValue = !this.editing && isFormula(this.content) && this.evaluated !== undefined && !this.error;
    const describedBy = [showValue ? 'value' : '', message ? 'message' : ''].join(' ').trim();
    const cls = [this.editing ? 'editing' : '', this.text ? 'text' : '', isFormula(shown) ? 'formula' : ''].join(' ');
    return html`
      <input type="text" class=${cls} spellcheck="false" autocomplete="off" aria-label=${this.label} placeholder=${this.placeholder} title=${shown}
        .value=${this.editing ? this.draft : shown} ?readonly=${this.grid && !this.editing} tabindex=${this.tab}
        aria-invalid=${message ? 'true' : 'false'} aria-describedby=${describedBy || nothing}
        @keydown=${this.keydown} @input=${this.typed} @blur=${this.left} @dblclick=${() => this.grid && !this.editing && this.startEditing()} />
      ${showValue ? html`<div id="value" class="value" title="evaluated value">${this.cut ? html`<span class="whole">${shown}</span> ` : nothing}= ${formatValue(this.evaluated!)}</div>` : nothing}
      ${message ? html`<div id="message" class=${hidden ? 'sr-only' : 'message'} role=${this.problem ? 'alert' : nothing}>${message}</div>` : nothing}
    `;
  }

  protected override updated(): void {
    // The field shows the content whenever no edit is running, also after an edit the owner did not apply.
    const input = this.input;
    const shown = cellText(this.content);
    if (input && !this.editing && input.value !== shown) input.value = shown;
    this.measureCut();
  }

  private measureCut(): void {
    const input = this.input;
    const cut = !!input && !this.editing && isFormula(this.content) && input.scrollWidth > input.clientWidth + 1;
    if (cut !== this.cut) this.cut = cut;
  }

  /** Focuses the field (grids call this to move the active cell). */
  override focus(options?: FocusOptions): void {
    this.input?.focus(options);
  }

  /** Starts an edit with `initial` (a typed character) or the current content, the caret at the end. */
  startEditing(initial?: string): void {
    this.draft = initial ?? cellText(this.content);
    this.editing = true;
    this.problem = undefined;
    const input = this.input;
    if (!input) return;
    input.readOnly = false; // at once, so the next keystroke lands in the field before the re-render
    input.value = this.draft;
    input.focus();
    input.setSelectionRange(this.draft.length, this.draft.length);
  }

  private keydown(e: KeyboardEvent): void {
    if (this.editing) {
      e.stopPropagation(); // while editing, every key belongs to the field
      if (e.key === 'Enter' && !e.isComposing) {
        e.preventDefault();
        this.commit(e.shiftKey ? 'up' : 'down');
      } else if (e.key === 'Tab') {
        if (this.grid) e.preventDefault();
        this.commit(e.shiftKey ? 'previous' : 'next');
      } else if (e.key === 'Escape') {
        e.preventDefault();
        this.cancel();
      }
      return;
    }
    if (!this.grid) return;
    if (e.key === 'Enter' || e.key === 'F2' || isPrintable(e)) {
      e.preventDefault();
      e.stopPropagation();
      this.startEditing(isPrintable(e) ? e.key : undefined);
    }
  }

  private typed(e: Event): void {
    this.draft = (e.target as HTMLInputElement).value;
    this.editing = true;
  }

  private left(): void {
    if (this.editing) this.commit('none');
  }

  private cancel(): void {
    this.editing = false;
    this.problem = undefined;
    this.dispatchEvent(new CustomEvent('sl-cancel', { bubbles: true }));
  }

  private commit(move: CellMove): void {
    let content: Cell | undefined = this.draft.trim();
    if (!this.text) {
      const reading = readCellText(this.draft);
      if (!reading.ok) return this.refuse(reading.message, move);
      content = reading.content;
      if (content === undefined && !this.optional) return this.refuse('this cell needs a value; Escape brings back the old one', move);
    }
    let refusal: string | undefined;
    const before = this.text ? (this.content ?? '') : this.content;
    const detail: CellCommitDetail = { content, changed: content !== before, move, reject: (m) => (refusal = m) };
    this.editing = false; // before dispatching, so a focus change during the event cannot commit twice
    this.dispatchEvent(new CustomEvent<CellCommitDetail>('sl-commit', { detail, bubbles: true }));
    if (refusal !== undefined) this.refuse(refusal, move);
    else this.problem = undefined;
  }

  /** Keeps the typed text in the field with `message`; focus returns to it unless the user left by clicking elsewhere. */
  private refuse(message: string, move: CellMove): void {
    this.editing = true;
    this.problem = message;
    if (move !== 'none') this.input?.focus();
  }
}

declare global {
  interface HTMLElementTagNameMap {
    'sl-cell': SlCell;
  }
}
