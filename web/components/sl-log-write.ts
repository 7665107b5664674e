import { LitElement, css, html, nothing, type PropertyValues } from 'lit';
import { customElement, property, state } from 'lit/decorators.js';
import type { BudgetDocument } from '../../src';
import { editorStyles } from '../grid/editor-styles';
import { allanCandidates, type TermCandidate, type TermMethod, type WritableTermId } from '../../src';
import { sameSourceRows, type WrittenRow } from '../../src';
import { ALLAN_TARGET_KIND, sensorsOfKind, type TargetSensor } from '../../src';
import type { AllanOutcome } from '../logs/log-protocol';
import { isoDate } from '../../src';
import { writeIntoSensor } from '../logs/write-to-store';
import type { DocumentStore } from '../state/document-store';
import './sl-log-written';

/**
 * "Write into the grid" for an Allan analysis: pick a sensor of the
 * matching kind in the open document and the terms to write; the rows are
 * created or overwritten in one undoable edit, each with its provenance
 * (file, date, sample count, method). Terms the sensor cannot take are shown
 * with the reason; upper bounds start unticked.
 *
 * @fires sl-note - { message } after a write, summing up what changed
 */
@customElement('sl-log-write')
export class SlLogWrite extends LitElement {
  static override styles = [editorStyles, css`
    :host { display: block; margin-top: 10px; }
    fieldset { border: 1px solid var(--sl-rule); border-radius: var(--sl-radius); background: var(--sl-panel); margin: 6px 0; }
    legend { font-size: 12px; font-weight: 600; }
    .term { display: grid; grid-template-columns: auto 1fr; gap: 2px 6px; align-items: start; margin: 3px 0; }
    .term .why { grid-column: 2; font-size: 11px; color: var(--sl-ink-soft); }
    .term .caution { grid-column: 2; font-size: 11px; color: var(--sl-warn-ink); }
    label.field { display: inline-grid; gap: 2px; font-size: 11px; color: var(--sl-ink-soft); margin-right: 12px; }
    select { border-color: var(--sl-rule); background: var(--sl-panel); width: auto; }
  `];

  /** The open document's store; the write is one `store.edit`. */
  @property({ attribute: false }) store!: DocumentStore;
  /** The store's current document (passed so a change re-renders the choices). */
  @property({ attribute: false }) doc?: BudgetDocument;
  /** The computed log whose terms may be written. */
  @property({ attribute: false }) outcome?: AllanOutcome;

  @state() private sensorIndex = -1;
  @state() private method: TermMethod = 'slope';
  /** Ticks the user changed; the rest follow the defaults. */
  @state() private ticks = new Map<WritableTermId, boolean>();
  @state() private written?: WrittenRow[];
  @state() private problem = '';

  protected override willUpdate(changed: PropertyValues<this>): void {
    if (changed.has('outcome')) {
      this.ticks = new Map();
      this.written = undefined;
      this.problem = '';
    }
  }

  override render() {
    const o = this.outcome;
    if (!o || !this.store) return nothing;
    const kind = ALLAN_TARGET_KIND[o.result.kind];
    if (!kind) return html`<p class="hint" role="note">No sensor of a budget takes ${o.result.kind} terms (the planar model has a yaw gyro and a speed sensor for dead reckoning); the terms above are for reading only.</p>`;
    const targets = sensorsOfKind(this.store.document, kind);
    if (targets.length === 0) return html`<p class="hint" role="note">This budget has no ${kind} sensor. Add one on the Suite tab, then come back to write these terms into it.</p>`;
    const target = this.target(targets);
    const candidates = this.candidates(target);
    return html`
      <h3>Write into the grid</h3>
      <div>
        <label class="field">Sensor
          <select id="target" @change=${(e: Event) => (this.sensorIndex = Number((e.target as HTMLSelectElement).value))}>
            ${targets.map((t) => html`<option .value=${String(t.index)} ?selected=${t.index === target.index}>${t.id} (${t.kind})</option>`)}
          </select></label>
        <label class="field">Sloped terms from
          <select id="method" @change=${(e: Event) => (this.method = (e.target as HTMLSelectElement).value as TermMethod)}>
            <option value="slope" ?selected=${this.method === 'slope'}>slope read-offs</option>
            <option value="fit" ?selected=${this.method === 'fit'}>whole-curve fit</option>
          </select></label>
      </div>
      <fieldset><legend>Terms to write into ${target.id}</legend>${candidates.map((c) => this.renderTerm(c, target))}</fieldset>
      ${this.problem ? html`<div class="problem" role="alert">${this.problem}</div>` : nothing}
      <div class="bar"><button id="write" @click=${() => this.write(target, candidates)}>Write into ${target.id}</button>
        <span class="hint">One step: Undo reverts every row written.</span></div>
      ${this.written ? html`<sl-log-written .rows=${this.written}></sl-log-written>` : nothing}
    `;
  }

  private renderTerm(c: TermCandidate, target: TargetSensor) {
    const id = `term-${c.id}`;
    if (!c.plan) return html`<div class="term"><input type="checkbox" id=${id} disabled /><label for=${id}>${c.label}</label><span class="why">not written: ${c.refusal}</span></div>`;
    const existing = sameSourceRows(this.store.document.sensors[target.index], c.plan);
    const where = existing.length ? `overwrites ${target.id}.${this.store.document.sensors[target.index].sources[existing[0]].id}` : 'adds a new row';
    return html`<div class="term">
      <input type="checkbox" id=${id} .checked=${this.ticked(c)} @change=${(e: Event) => this.tick(c.id, (e.target as HTMLInputElement).checked)} />
      <label for=${id}>${c.label} → ${c.plan.kind} row: ${c.plan.fields.value} ${c.plan.fields.unit}${c.plan.fields.correlationTime ? `, T = ${c.plan.fields.correlationTime.value} s` : ''} (${where})</label>
      ${c.caution ? html`<span class="caution">${c.caution}</span>` : nothing}
    </div>`;
  }

  private target(targets: TargetSensor[]): TargetSensor {
    return targets.find((t) => t.index === this.sensorIndex) ?? targets[0];
  }

  private candidates(target: TargetSensor): TermCandidate[] {
    const o = this.outcome!;
    return allanCandidates(o, this.method, target.kind, { fileName: o.fileName, date: isoDate(new Date()), samples: o.samples });
  }

  private ticked(c: TermCandidate): boolean {
    return this.ticks.get(c.id) ?? (c.plan !== undefined && c.caution === undefined);
  }

  private tick(id: WritableTermId, on: boolean): void {
    this.ticks = new Map(this.ticks).set(id, on);
  }

  private write(target: TargetSensor, candidates: TermCandidate[]): void {
    const plans = candidates.filter((c) => c.plan && this.ticked(c)).map((c) => c.plan!);
    this.problem = plans.length ? '' : 'tick at least one term to write';
    if (!plans.length) return;
    const { rows, note } = writeIntoSensor(this.store, target.index, plans, `${plans.length} noise term${plans.length > 1 ? 's' : ''}`, this.outcome!.fileName);
    this.written = rows;
    this.dispatchEvent(new CustomEvent('sl-note', { detail: { message: note }, bubbles: true, composed: true }));
  }
}

declare global {
  interface HTMLElementTagNameMap {
    'sl-log-write': SlLogWrite;
  }
}
