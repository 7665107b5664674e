import { LitElement, html, nothing, type PropertyValues } from 'lit';
import { customElement, property, state } from 'lit/decorators.js';
import type { AllanSensorKind } from '../../src';
import { DIMENSIONS } from '../../src';
import { editorStyles } from '../grid/editor-styles';
import { logFormStyles } from '../logs/log-form-styles';
import { DEFAULT_LOG_UNIT, guessTimeColumn, guessTimeUnit, KIND_LABELS, KINDS, logUnitGroups, usableColumns } from '../logs/log-form-choices';
import type { AllanJobOptions, LogHeader } from '../logs/log-protocol';

/** Detail of `sl-log-run` from the Allan form. */
export interface AllanRunDetail {
  options: AllanJobOptions;
}

/** The time-column select's value meaning "no time column: give a rate". */
const NO_TIME = '';

/**
 * The Allan import's choices, once the header is known: the time column
 * (or a sample rate), the value column, the sensor kind and the unit of the
 * values. The unit list follows the kind (rates, or increments per sample).
 * It checks what it can before the long read and says what is missing.
 *
 * @fires sl-log-run - {@link AllanRunDetail} when the user starts the computation
 */
@customElement('sl-log-allan-form')
export class SlLogAllanForm extends LitElement {
  static override styles = [editorStyles, logFormStyles];

  /** The log's header; a new header resets the choices. */
  @property({ attribute: false }) header?: LogHeader;
  /** True while a job runs: the start button waits. */
  @property({ type: Boolean }) busy = false;

  @state() private timeColumn = NO_TIME;
  @state() private timeUnit = 's';
  @state() private rateText = '';
  @state() private valueColumn = '';
  @state() private kind: AllanSensorKind = 'gyro';
  @state() private unit = DEFAULT_LOG_UNIT.gyro;
  @state() private problem = '';

  protected override willUpdate(changed: PropertyValues<this>): void {
    if (changed.has('header') && this.header) this.guess(this.header);
  }

  override render() {
    if (!this.header) return nothing;
    const columns = usableColumns(this.header.columns);
    return html`
      <div class="grid">
        <label>Time column
          <select id="time-column" .value=${this.timeColumn} @change=${(e: Event) => this.pickTime((e.target as HTMLSelectElement).value)}>
            <option value=${NO_TIME} ?selected=${this.timeColumn === NO_TIME}>none: give the sample rate</option>
            ${columns.map((c) => html`<option .value=${c} ?selected=${c === this.timeColumn}>${c}</option>`)}
          </select></label>
        ${this.timeColumn === NO_TIME
          ? html`<label>Sample rate (Hz)
              <input id="rate" type="text" inputmode="decimal" .value=${this.rateText} @input=${(e: Event) => (this.rateText = (e.target as HTMLInputElement).value)} /></label>`
          : html`<label>Time unit
              <select id="time-unit" .value=${this.timeUnit} @change=${(e: Event) => (this.timeUnit = (e.target as HTMLSelectElement).value)}>
                ${DIMENSIONS.time.picker.map((u) => html`<option .value=${u} ?selected=${u === this.timeUnit}>${u}</option>`)}
              </select></label>`}
        <label>Value column
          <select id="value-column" .value=${this.valueColumn} @change=${(e: Event) => (this.valueColumn = (e.target as HTMLSelectElement).value)}>
            ${columns.map((c) => html`<option .value=${c} ?selected=${c === this.valueColumn}>${c}</option>`)}
          </select></label>
        <label>Sensor kind
          <select id="kind" .value=${this.kind} @change=${(e: Event) => this.pickKind((e.target as HTMLSelectElement).value as AllanSensorKind)}>
            ${KINDS.map((k) => html`<option .value=${k} ?selected=${k === this.kind}>${KIND_LABELS[k]}</option>`)}
          </select></label>
        <label>Unit of the values
          <select id="unit" .value=${this.unit} @change=${(e: Event) => (this.unit = (e.target as HTMLSelectElement).value)}>
            ${logUnitGroups(this.kind).map((g) => html`<optgroup label=${g.label}>${g.units.map((u) => html`<option .value=${u} ?selected=${u === this.unit}>${u}</option>`)}</optgroup>`)}
          </select></label>
      </div>
      ${this.problem ? html`<div class="problem" role="alert">${this.problem}</div>` : nothing}
      <div class="bar"><button id="run" ?disabled=${this.busy} @click=${this.run}>Compute the Allan deviation</button></div>
    `;
  }

  /** First choices from the header: a time-like column, the first other column as the values. */
  private guess(header: LogHeader): void {
    const columns = usableColumns(header.columns);
    this.timeColumn = guessTimeColumn(columns) ?? NO_TIME;
    this.timeUnit = guessTimeUnit(this.timeColumn || undefined);
    this.valueColumn = columns.find((c) => c !== this.timeColumn) ?? columns[0] ?? '';
    this.problem = '';
  }

  private pickTime(column: string): void {
    this.timeColumn = column;
    this.timeUnit = guessTimeUnit(column || undefined);
  }

  private pickKind(kind: AllanSensorKind): void {
    this.kind = kind;
    this.unit = DEFAULT_LOG_UNIT[kind];
  }

  /** The options, or why they are not complete. */
  private options(): AllanJobOptions | string {
    const columns = usableColumns(this.header?.columns ?? []);
    if (columns.length === 0) return 'the header names no column; the log needs a header line such as "time,gyro_z"';
    if (!this.valueColumn || this.valueColumn === this.timeColumn) {
      return columns.length < 2 && this.timeColumn !== NO_TIME
        ? `the log has only the column "${columns[0]}", so there is no value column besides the time: pick "none" for the time column and give the sample rate, or use a log with a value column`
        : 'pick a value column other than the time column';
    }
    const base = { valueColumn: this.valueColumn, unit: this.unit, kind: this.kind };
    if (this.timeColumn !== NO_TIME) return { ...base, timeColumn: this.timeColumn, timeUnit: this.timeUnit };
    const rateHz = Number(this.rateText.trim().replace(',', '.'));
    if (this.rateText.trim() === '' || !(rateHz > 0) || !Number.isFinite(rateHz)) return 'the log has no time column picked: give its sample rate in Hz, a number above 0 (e.g. 100)';
    return { ...base, rateHz };
  }

  private run(): void {
    const options = this.options();
    this.problem = typeof options === 'string' ? options : '';
    if (typeof options === 'string') return;
    this.dispatchEvent(new CustomEvent<AllanRunDetail>('sl-log-run', { detail: { options }, bubbles: true, composed: true }));
  }
}

declare global {
  interface HTMLElementTagNameMap {
    'sl-log-allan-form': SlLogAllanForm;
  }
}
