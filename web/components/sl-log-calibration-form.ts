import { LitElement, html, nothing, type PropertyValues } from 'lit';
import { customElement, property, state } from 'lit/decorators.js';
import { editorStyles } from '../grid/editor-styles';
import { logFormStyles } from '../logs/log-form-styles';
import { calibrationUnitGroups, usableColumns } from '../logs/log-form-choices';
import type { CalibrationJobOptions, LogHeader } from '../logs/log-protocol';

/** Detail of `sl-log-run` from the calibration form. */
export interface CalibrationRunDetail {
  options: CalibrationJobOptions;
}

/**
 * The calibration import's choices: which column is the sensor's output,
 * which is the known truth (a turntable's set rate, a surveyed speed), and
 * the unit both are in.
 *
 * @fires sl-log-run - {@link CalibrationRunDetail} when the user starts the fit
 */
@customElement('sl-log-calibration-form')
export class SlLogCalibrationForm extends LitElement {
  static override styles = [editorStyles, logFormStyles];

  /** The log's header; a new header resets the choices. */
  @property({ attribute: false }) header?: LogHeader;
  /** True while a job runs: the start button waits. */
  @property({ type: Boolean }) busy = false;

  @state() private measured = '';
  @state() private truth = '';
  @state() private unit = 'deg/s';
  @state() private problem = '';

  protected override willUpdate(changed: PropertyValues<this>): void {
    if (!changed.has('header') || !this.header) return;
    const columns = usableColumns(this.header.columns);
    this.truth = columns.find((c) => /true|truth|ref|set|table/i.test(c)) ?? columns[1] ?? '';
    this.measured = columns.find((c) => c !== this.truth && !/^t(ime)?$/i.test(c)) ?? columns[0] ?? '';
    this.problem = '';
  }

  override render() {
    if (!this.header) return nothing;
    const columns = usableColumns(this.header.columns);
    const select = (id: string, value: string, set: (v: string) => void) => html`
      <select id=${id} .value=${value} @change=${(e: Event) => set((e.target as HTMLSelectElement).value)}>
        ${columns.map((c) => html`<option .value=${c} ?selected=${c === value}>${c}</option>`)}
      </select>`;
    return html`
      <div class="grid">
        <label>Measured column (sensor output)${select('measured-column', this.measured, (v) => (this.measured = v))}</label>
        <label>Truth column (known value)${select('truth-column', this.truth, (v) => (this.truth = v))}</label>
        <label>Unit of both columns
          <select id="calibration-unit" .value=${this.unit} @change=${(e: Event) => (this.unit = (e.target as HTMLSelectElement).value)}>
            ${calibrationUnitGroups().map((g) => html`<optgroup label=${g.label}>${g.units.map((u) => html`<option .value=${u} ?selected=${u === this.unit}>${u}</option>`)}</optgroup>`)}
          </select></label>
      </div>
      <div class="hint">Model: measured = (1 + s)·truth + b, fitted by least squares; log the sensor at two or more different known values.</div>
      ${this.problem ? html`<div class="problem" role="alert">${this.problem}</div>` : nothing}
      <div class="bar"><button id="run" ?disabled=${this.busy} @click=${this.run}>Fit offset and scale factor</button></div>
    `;
  }

  private run(): void {
    const columns = usableColumns(this.header?.columns ?? []);
    if (columns.length < 2) this.problem = `the log has ${columns.length === 1 ? `only the column "${columns[0]}"` : 'no named column'}; a calibration needs a measured column and a truth column`;
    else if (this.measured === this.truth) this.problem = 'pick different columns for the measured values and the truth';
    else this.problem = '';
    if (this.problem) return;
    const options: CalibrationJobOptions = { measuredColumn: this.measured, truthColumn: this.truth, unit: this.unit };
    this.dispatchEvent(new CustomEvent<CalibrationRunDetail>('sl-log-run', { detail: { options }, bubbles: true, composed: true }));
  }
}

declare global {
  interface HTMLElementTagNameMap {
    'sl-log-calibration-form': SlLogCalibrationForm;
  }
}
