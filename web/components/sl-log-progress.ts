import { LitElement, css, html, nothing } from 'lit';
import { customElement, property } from 'lit/decorators.js';
import { editorStyles } from '../grid/editor-styles';
import type { LogJobStatus } from '../logs/log-job-controller';
import type { LogProgress } from '../logs/log-protocol';

/** Bytes as "12.3 MB". */
function sizeText(bytes: number): string {
  if (bytes < 1e3) return `${bytes} B`;
  const [unit, scale] = bytes < 1e6 ? ['kB', 1e3] : bytes < 1e9 ? ['MB', 1e6] : ['GB', 1e9];
  return `${(bytes / (scale as number)).toFixed(1)} ${unit}`;
}

/**
 * How far the log worker has got: a progress bar with the lines and bytes
 * read, a Cancel button while it runs, and the message of a failed job.
 *
 * @fires sl-log-cancel - when the user cancels the running job
 */
@customElement('sl-log-progress')
export class SlLogProgress extends LitElement {
  static override styles = [editorStyles, css`
    :host { display: block; margin: 6px 0; }
    progress { width: 260px; vertical-align: middle; }
    .line { font-size: 12px; }
    .failed { margin-top: 4px; }
  `];

  @property() status: LogJobStatus = 'idle';
  /** What the job is doing ("reading the log", "computing"). */
  @property() activity = '';
  @property({ attribute: false }) progress?: LogProgress;
  /** The failed job's message (it names the line and column of a bad cell). */
  @property() error = '';

  override render() {
    if (this.status === 'error') return html`<div class="blocked failed" role="alert"><strong>The log was not used:</strong> ${this.error}. Nothing in the budget changed.</div>`;
    if (this.status === 'cancelled') return html`<div class="hint" role="status">Cancelled; nothing in the budget changed.</div>`;
    if (this.status !== 'pending') return nothing;
    const p = this.progress;
    const percent = p && p.totalBytes > 0 ? Math.round((100 * p.bytesRead) / p.totalBytes) : 0;
    return html`
      <div class="bar line" role="status" aria-live="polite">
        <progress max="100" .value=${percent} aria-label="Share of the log read"></progress>
        <span>${this.activity}${p ? html`: about ${p.linesRead.toLocaleString('en')} lines read, ${sizeText(p.bytesRead)} of ${sizeText(p.totalBytes)} (${percent} %)` : '…'}</span>
        <button id="cancel" @click=${() => this.dispatchEvent(new CustomEvent('sl-log-cancel', { bubbles: true, composed: true }))}>Cancel</button>
      </div>
    `;
  }
}

declare global {
  interface HTMLElementTagNameMap {
    'sl-log-progress': SlLogProgress;
  }
}
