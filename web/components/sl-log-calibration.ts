import { LitElement, css, html, nothing, type PropertyValues } from 'lit';
import { customElement, property, state } from 'lit/decorators.js';
import type { BudgetDocument } from '../../src';
import { formatSignificant, unitDimension } from '../../src';
import { editorStyles } from '../grid/editor-styles';
import { calibrationCandidates, whitenessClause, type CalibrationCandidate } from '../../src';
import type { WrittenRow } from '../../src';
import { CALIBRATION_TARGET_KIND, sensorsOfKind, type TargetSensor } from '../../src';
import type { CalibrationOutcome } from '../logs/log-protocol';
import { isoDate } from '../../src';
import { writeIntoSensor } from '../logs/write-to-store';
import type { DocumentStore } from '../state/document-store';
import './sl-log-written';

const f4 = (x: number) => formatSignificant(x, 4);
const f2 = (x: number) => formatSignificant(x, 2);

/**
 * A calibration's result (offset and scale factor with standard deviations,
 * their correlation, the residual whiteness verdict) and "write into the
 * grid": the offset's standard deviation becomes the turn-on-bias row's 1σ
 * and the scale factor's the scale-factor row's, in one undoable edit, with
 * the estimates in the provenance. The page says why.
 *
 * @fires sl-note - { message } after a write, summing up what changed
 */
@customElement('sl-log-calibration')
export class SlLogCalibration extends LitElement {
  static override styles = [editorStyles, css`
    :host { display: block; }
    h3 code { text-transform: none; font-family: var(--sl-mono); }
    dl { display: grid; grid-template-columns: max-content 1fr; gap: 2px 12px; margin: 6px 0; font-size: 12px; }
    dt { color: var(--sl-ink-soft); }
    dd { margin: 0; font-family: var(--sl-mono); }
    .verdict.bad { color: var(--sl-fail); font-weight: 600; }
    .why { max-width: 75ch; font-size: 12px; }
    label.field { display: inline-grid; gap: 2px; font-size: 11px; color: var(--sl-ink-soft); }
    select { border-color: var(--sl-rule); background: var(--sl-panel); width: auto; }
  `];

  /** The open document's store; the write is one `store.edit`. */
  @property({ attribute: false }) store!: DocumentStore;
  /** The store's current document (passed so a change re-renders the choices). */
  @property({ attribute: false }) doc?: BudgetDocument;
  @property({ attribute: false }) outcome?: CalibrationOutcome;

  @state() private sensorIndex = -1;
  @state() private written?: WrittenRow[];

  protected override willUpdate(changed: PropertyValues<this>): void {
    if (changed.has('outcome')) this.written = undefined;
  }

  override render() {
    const o = this.outcome;
    if (!o) return nothing;
    const r = o.report;
    return html`
      <h3>Calibration of <code>${o.fileName}</code>: ${o.samples.toLocaleString('en')} samples</h3>
      <dl>
        <dt>offset b</dt><dd>${f4(r.offset.value)} ± ${f2(r.offset.uncertainty)} ${r.offset.unit}</dd>
        <dt>scale factor s</dt><dd>${f4(r.scaleFactor.value)} ± ${f2(r.scaleFactor.uncertainty)} ppm</dd>
        <dt>correlation of b and s</dt><dd>${f2(r.correlation)}</dd>
        <dt>residual standard deviation</dt><dd>${f4(r.residualStd)} ${r.offset.unit}</dd>
        <dt>residual whiteness</dt><dd class="verdict ${r.whiteness && !r.whiteness.white ? 'bad' : ''}">${whitenessClause(r)}</dd>
      </dl>
      <p class="why">What goes into the budget: after calibration the navigation software subtracts b and divides out (1 + s), so
        the offset and scale factor themselves are no longer errors. What remains is how well they are known: their standard
        deviations. So the turn-on-bias row gets σ_b and the scale-factor row gets σ_s as its 1σ, and b and s are kept in the
        row's provenance. One run says nothing about how the offset changes from one power-up to the next: if the sensor is not
        calibrated at every start, the datasheet's turn-on repeatability belongs in the row instead.</p>
      ${this.renderWrite(o)}
    `;
  }

  private renderWrite(o: CalibrationOutcome) {
    if (!this.store) return nothing;
    const kind = CALIBRATION_TARGET_KIND[unitDimension(o.unit) ?? 'ratio'];
    if (!kind) return html`<p class="hint" role="note">No sensor of a budget takes a calibration in ${o.unit}; the result is for reading only.</p>`;
    const targets = sensorsOfKind(this.store.document, kind);
    if (targets.length === 0) return html`<p class="hint" role="note">This budget has no ${kind} sensor to write into; add one on the Suite tab.</p>`;
    const target = targets.find((t) => t.index === this.sensorIndex) ?? targets[0];
    const candidates = calibrationCandidates(o.report, target.kind, { fileName: o.fileName, date: isoDate(new Date()), samples: o.samples });
    const usable = candidates.filter((c) => c.plan);
    return html`
      <h3>Write into the grid</h3>
      <label class="field">Sensor
        <select id="target" @change=${(e: Event) => (this.sensorIndex = Number((e.target as HTMLSelectElement).value))}>
          ${targets.map((t) => html`<option .value=${String(t.index)} ?selected=${t.index === target.index}>${t.id} (${t.kind})</option>`)}
        </select></label>
      <ul>${candidates.map((c) => html`<li>${c.label}: ${c.plan ? `${c.plan.fields.value} ${c.plan.fields.unit}` : html`<span class="hint">not written: ${c.refusal}</span>`}</li>`)}</ul>
      <div class="bar"><button id="write" ?disabled=${usable.length === 0} @click=${() => this.write(target, usable)}>Write into ${target.id}</button>
        <span class="hint">One step: Undo reverts it.</span></div>
      ${this.written ? html`<sl-log-written .rows=${this.written}></sl-log-written>` : nothing}
    `;
  }

  private write(target: TargetSensor, usable: CalibrationCandidate[]): void {
    const plans = usable.map((c) => c.plan!);
    const { rows, note } = writeIntoSensor(this.store, target.index, plans, 'the calibration', this.outcome!.fileName);
    this.written = rows;
    this.dispatchEvent(new CustomEvent('sl-note', { detail: { message: note }, bubbles: true, composed: true }));
  }
}

declare global {
  interface HTMLElementTagNameMap {
    'sl-log-calibration': SlLogCalibration;
  }
}
