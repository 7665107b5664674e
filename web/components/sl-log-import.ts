import { LitElement, css, html, nothing, type PropertyValues } from 'lit';
import { customElement, property, state } from 'lit/decorators.js';
import type { ViewResult } from '../../src';
import { formatSignificant } from '../../src';
import { editorStyles } from '../grid/editor-styles';
import { LogJobController } from '../logs/log-job-controller';
import { StoreListener } from '../logs/store-listener';
import type { AllanJobOptions, AllanOutcome, CalibrationJobOptions, CalibrationOutcome, LogHeader } from '../logs/log-protocol';
import type { DocumentStore } from '../state/document-store';
import type { LogFileDetail } from './sl-log-file';
import './sl-log-allan-chart';
import './sl-log-allan-form';
import './sl-log-calibration';
import './sl-log-calibration-form';
import './sl-log-file';
import './sl-log-progress';
import './sl-log-terms';
import './sl-log-write';

/** The two imports: noise terms from a static log, or offset and scale factor against truth. */
export type LogImportMode = 'allan' | 'calibration';

const seconds = (ms: number) => `${formatSignificant(ms / 1000, 3)} s`;

/**
 * The "Sensor logs" tab: open or drop a CSV/TSV log, pick its columns, and
 * compute in a worker (progress, Cancel) either the Allan deviation with
 * its noise terms or a calibration; then write the results into a sensor of
 * the open document as one undoable edit. Reading a log never changes the
 * document: only the write buttons do. Re-renders when the store changes.
 */
@customElement('sl-log-import')
export class SlLogImport extends LitElement {
  static override styles = [editorStyles, css`
    :host { display: block; }
    .modes { display: flex; gap: 14px; margin: 8px 0; font-size: 13px; }
    .modes label { display: inline-flex; gap: 4px; align-items: center; }
    .header { font-size: 12px; margin: 6px 0; }
    .header code { font-family: var(--sl-mono); }
    .times { font-size: 12px; color: var(--sl-ink-soft); margin: 6px 0; }
  `];

  /** The open document's store; the component subscribes to its `change` events while connected. */
  @property({ attribute: false }) store!: DocumentStore;
  /** The latest computed view (not used by the import itself; kept for parity with the other tabs). */
  @property({ attribute: false }) view?: ViewResult;

  @state() mode: LogImportMode = 'allan';
  /** The log's header, once read. */
  @state() header?: LogHeader;
  /** The last finished Allan computation. */
  @state() allan?: AllanOutcome;
  /** The last finished calibration. */
  @state() calibration?: CalibrationOutcome;
  private file?: File;
  private readonly listener = new StoreListener(this);

  /** The worker's controller (pending / complete / error / cancelled, progress). */
  readonly jobs = new LogJobController(this);

  protected override willUpdate(changed: PropertyValues<this>): void {
    if (changed.has('store')) this.listener.follow(this.store);
  }

  override render() {
    const busy = this.jobs.status === 'pending';
    return html`
      <div class="modes" role="radiogroup" aria-label="What to read from the log">
        ${this.modeOption('allan', 'Noise terms (Allan deviation of a static log)')}
        ${this.modeOption('calibration', 'Calibration (offset and scale factor against known truth)')}
      </div>
      <sl-log-file .fileName=${this.file?.name ?? ''} @sl-log-file=${(e: CustomEvent<LogFileDetail>) => this.open(e.detail.file)}></sl-log-file>
      ${this.header ? html`<div class="header">Columns of <code>${this.header.fileName}</code> (header on line ${this.header.headerLine}):
        ${this.header.columns.map((c, i) => html`${i ? ', ' : ''}<code>${c}</code>`)}</div>` : nothing}
      ${this.mode === 'allan'
        ? html`<sl-log-allan-form .header=${this.header} ?busy=${busy} @sl-log-run=${(e: CustomEvent<{ options: AllanJobOptions }>) => this.runAllan(e.detail.options)}></sl-log-allan-form>`
        : html`<sl-log-calibration-form .header=${this.header} ?busy=${busy} @sl-log-run=${(e: CustomEvent<{ options: CalibrationJobOptions }>) => this.runCalibration(e.detail.options)}></sl-log-calibration-form>`}
      <sl-log-progress .status=${this.jobs.status} .activity=${this.jobs.activity} .progress=${this.jobs.progress} .error=${this.jobs.error ?? ''}
        @sl-log-cancel=${() => this.jobs.cancel()}></sl-log-progress>
      ${this.mode === 'allan' ? this.renderAllan() : this.renderCalibration()}
    `;
  }

  private modeOption(mode: LogImportMode, label: string) {
    return html`<label><input type="radio" name="mode" .value=${mode} .checked=${this.mode === mode} @change=${() => (this.mode = mode)} />${label}</label>`;
  }

  private renderAllan() {
    const o = this.allan;
    if (!o) return nothing;
    return html`
      <div class="times" id="times">${o.samples.toLocaleString('en')} samples at ${formatSignificant(o.rateHz, 6)} Hz (${seconds((1000 * o.samples) / o.rateHz)} of data);
        parse ${seconds(o.parseMs)}, compute ${seconds(o.computeMs)}</div>
      <sl-log-allan-chart .outcome=${o}></sl-log-allan-chart>
      <sl-log-terms .outcome=${o}></sl-log-terms>
      <sl-log-write .store=${this.store} .doc=${this.store?.document} .outcome=${o}></sl-log-write>
    `;
  }

  private renderCalibration() {
    const o = this.calibration;
    if (!o) return nothing;
    return html`
      <div class="times" id="times">parse ${seconds(o.parseMs)}, compute ${seconds(o.computeMs)}</div>
      <sl-log-calibration .store=${this.store} .doc=${this.store?.document} .outcome=${o}></sl-log-calibration>
    `;
  }

  /** Reads the header of `file` (in the worker) and offers its columns. Results of an earlier file are cleared. */
  async open(file: File): Promise<void> {
    this.file = file;
    this.header = undefined;
    this.allan = undefined;
    this.calibration = undefined;
    const header = await this.jobs.run({ type: 'header', file }, 'reading the header');
    if (this.file === file) this.header = header;
  }

  /** Streams the open file through the Allan computation; the result replaces the last one only when it succeeds. */
  async runAllan(options: AllanJobOptions): Promise<void> {
    if (!this.file) return;
    const outcome = await this.jobs.run({ type: 'allan', file: this.file, options }, 'reading the log');
    if (outcome) this.allan = outcome;
  }

  /** Streams the open file through the calibration fit. */
  async runCalibration(options: CalibrationJobOptions): Promise<void> {
    if (!this.file) return;
    const outcome = await this.jobs.run({ type: 'calibration', file: this.file, options }, 'reading the log');
    if (outcome) this.calibration = outcome;
  }
}

declare global {
  interface HTMLElementTagNameMap {
    'sl-log-import': SlLogImport;
  }
}
