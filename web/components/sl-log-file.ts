import { LitElement, css, html } from 'lit';
import { customElement, property, state } from 'lit/decorators.js';
import { editorStyles } from '../grid/editor-styles';

/** Detail of `sl-log-file`. */
export interface LogFileDetail {
  file: File;
}

/**
 * Where a log comes in: a labelled file input (the keyboard way) inside a
 * zone that also takes a dropped file. It only reports the file; the owner
 * reads it in the log worker.
 *
 * @fires sl-log-file - {@link LogFileDetail} when a file is chosen or dropped
 */
@customElement('sl-log-file')
export class SlLogFile extends LitElement {
  static override styles = [editorStyles, css`
    :host { display: block; }
    .zone { border: 2px dashed var(--sl-rule-strong); border-radius: var(--sl-radius); padding: 14px; background: var(--sl-panel); text-align: center; }
    .zone.over { border-color: var(--sl-accent); background: var(--sl-accent-soft); }
    label { font-weight: 600; }
    .name { font-family: var(--sl-mono); font-size: 12px; }
  `];

  /** Accessible name and visible label of the file input. */
  @property() label = 'Open a log (CSV or TSV)';
  /** Name of the file chosen last, shown under the input. */
  @property() fileName = '';

  @state() private over = false;

  override render() {
    return html`
      <div class="zone ${this.over ? 'over' : ''}" @dragover=${this.dragOver} @dragleave=${() => (this.over = false)} @drop=${this.dropped}>
        <label for="file">${this.label}</label>
        <input id="file" type="file" accept=".csv,.tsv,.txt,.log,text/csv,text/tab-separated-values,text/plain" @change=${this.picked} />
        <div class="hint">or drop the file here. It is read on this computer only, in the background: the page stays usable.</div>
        ${this.fileName ? html`<div class="name">${this.fileName}</div>` : ''}
      </div>
    `;
  }

  private dragOver(e: DragEvent): void {
    e.preventDefault();
    if (e.dataTransfer) e.dataTransfer.dropEffect = 'copy';
    this.over = true;
  }

  private dropped(e: DragEvent): void {
    e.preventDefault();
    this.over = false;
    const file = e.dataTransfer?.files[0];
    if (file) this.report(file);
  }

  private picked(e: Event): void {
    const input = e.target as HTMLInputElement;
    const file = input.files?.[0];
    if (file) this.report(file);
    // Choosing the same file again (after fixing it on disk) must fire `change` again.
    input.value = '';
  }

  private report(file: File): void {
    this.dispatchEvent(new CustomEvent<LogFileDetail>('sl-log-file', { detail: { file }, bubbles: true, composed: true }));
  }
}

declare global {
  interface HTMLElementTagNameMap {
    'sl-log-file': SlLogFile;
  }
}
