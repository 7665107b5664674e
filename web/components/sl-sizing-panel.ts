import { LitElement, css, html, nothing } from 'lit';
import { customElement, property, state } from 'lit/decorators.js';
import { unsafeSVG } from 'lit/directives/unsafe-svg.js';
import { formatToTolerance, renderLineChartSvg, type BudgetDocument } from '../../src/index';
import { formatSignificant } from '../../src';
import type { OutageAnswer, RowAnswer, SizeJob } from '../sizing/sizing-protocol';
import { SizingRunner } from '../sizing/sizing-runner';
import { sizingChart } from '../sizing/sizing-charts';

/** Points on the swept curve. */
const SWEEP_POINTS = 13;

/**
 * Sizing: pick requirements and either a row (the largest allowable value of
 * its magnitude for each requirement, the binding one named, and the worst
 * value against the swept magnitude) or an aiding sensor's outage (the
 * longest outage that still holds each requirement, and the worst value
 * against its length). Runs in a worker of its own (SizingRunner); the chart
 * is the report's SVG line chart, so page and report draw sizing alike.
 */
@customElement('sl-sizing-panel')
export class SlSizingPanel extends LitElement {
  static override styles = css`
    :host { display: block; }
    form { display: grid; grid-template-columns: max-content 1fr; gap: 6px 10px; align-items: center; }
    fieldset { border: 1px solid var(--sl-rule); border-radius: var(--sl-radius); padding: 4px 8px; display: flex; flex-wrap: wrap; gap: 4px 12px; }
    legend { font-size: 12px; }
    select { font: inherit; max-width: 100%; }
    .actions { grid-column: 2; display: flex; gap: 8px; align-items: center; }
    table { border-collapse: collapse; margin: 10px 0; font-variant-numeric: tabular-nums; }
    th, td { border-bottom: 1px solid var(--sl-rule); padding: 3px 8px; text-align: left; }
    td.num { text-align: right; }
    .binding { font-weight: 600; }
    .chart svg { width: 100%; height: auto; max-width: 720px; }
    .error { color: var(--sl-fail); }
  `;

  /** The open document (the worker evaluates it afresh). */
  @property({ attribute: false }) document?: BudgetDocument;
  /** Requirement ids the budget has, in order. */
  @property({ attribute: false }) requirementIds: string[] = [];

  @state() private mode: 'row' | 'outage' = 'row';
  @state() private rowId = '';
  @state() private outage = '';
  /** Requirements ticked; undefined until the user ticks one (then the first requirement is ticked). */
  @state() private chosen?: Set<string>;
  @state() private running = false;
  @state() private progress = '';
  @state() private answer?: RowAnswer | OutageAnswer;
  @state() private error?: string;
  private readonly runner = new SizingRunner();

  override disconnectedCallback(): void {
    this.runner.cancel();
    super.disconnectedCallback();
  }

  override render() {
    const doc = this.document;
    if (!doc || this.requirementIds.length === 0) return html`<p>Sizing needs a budget with requirements.</p>`;
    const rows = doc.sensors.flatMap((s) => s.sources.map((r) => `${s.id}.${r.id}`));
    const outages = doc.sensors.flatMap((s) => (s.outages ?? []).map((o, i) => ({ key: `${s.id}#${i}`, label: `${s.id}: ${o.id ?? `outage ${i + 1}`}` })));
    return html`
      <form @submit=${this.submit}>
        <label for="mode">Size</label>
        <select id="mode" @change=${(e: Event) => (this.mode = (e.target as HTMLSelectElement).value as 'row' | 'outage')}>
          <option value="row" ?selected=${this.mode === 'row'}>a row's largest allowable value</option>
          <option value="outage" ?selected=${this.mode === 'outage'} ?disabled=${outages.length === 0}>the longest outage of an aiding sensor</option>
        </select>
        ${this.mode === 'row'
          ? html`<label for="row">Row</label><select id="row" @change=${(e: Event) => (this.rowId = (e.target as HTMLSelectElement).value)}>
              ${rows.map((r) => html`<option value=${r} ?selected=${r === this.currentRow(rows)}>${r}</option>`)}</select>`
          : html`<label for="outage">Outage</label><select id="outage" @change=${(e: Event) => (this.outage = (e.target as HTMLSelectElement).value)}>
              ${outages.map((o) => html`<option value=${o.key} ?selected=${o.key === this.currentOutage(outages)}>${o.label}</option>`)}</select>`}
        <span>Requirements</span>
        <fieldset><legend>hold all of</legend>${this.requirementIds.map((id) => html`
          <label><input type="checkbox" name="requirement" value=${id} .checked=${this.isChosen(id)} @change=${this.toggle} /> ${id}</label>`)}</fieldset>
        <div class="actions">
          <button type="submit" ?disabled=${this.running}>Size</button>
          ${this.running ? html`<button type="button" @click=${() => this.runner.cancel()}>Cancel</button><span role="status">${this.progress}</span>` : nothing}
        </div>
      </form>
      ${this.error ? html`<p class="error" role="alert">${this.error}</p>` : nothing}
      ${this.answer ? this.result(this.answer) : nothing}
    `;
  }

  private result(a: RowAnswer | OutageAnswer) {
    const chart = html`<div class="chart">${unsafeSVG(renderLineChartSvg(sizingChart(a), 'sizing'))}</div>`;
    if (a.kind === 'row') {
      return html`
        <p id="binding">${a.binding ? html`Binding: <strong>${a.binding}</strong> allows the least ${a.rowId}.` : `No requirement bounds ${a.rowId} in the range tried.`}</p>
        <table id="sized"><thead><tr><th>Requirement</th><th>Largest allowable ${a.rowId}</th></tr></thead><tbody>
          ${a.sized.map((s) => html`<tr class=${s.requirementId === a.binding ? 'binding' : ''}><td>${s.requirementId}</td><td class="num">${sizedText(s, a.unit)}</td></tr>`)}
        </tbody></table>${chart}`;
    }
    return html`
      <table id="longest"><thead><tr><th>Requirement</th><th>Longest ${a.sensorId} ${a.outageId} that holds</th></tr></thead><tbody>
        ${a.limits.map((l) => html`<tr><td>${l.requirementId}</td><td class="num">${l.failsWithout ? 'fails even without the outage' : l.holdsToEnd ? `holds to the mission's end (${formatSignificant(l.longestS, 4)} s)` : `${formatToTolerance(l.longestS, l.toleranceS).value} s ± ${formatToTolerance(l.longestS, l.toleranceS).tolerance}`}</td></tr>`)}
      </tbody></table>${chart}`;
  }

  private currentRow(rows: string[]): string {
    return rows.includes(this.rowId) ? this.rowId : rows[0] ?? '';
  }

  private currentOutage(outages: { key: string }[]): string {
    return outages.some((o) => o.key === this.outage) ? this.outage : outages[0]?.key ?? '';
  }

  private isChosen(id: string): boolean {
    return this.chosen === undefined ? id === this.requirementIds[0] : this.chosen.has(id);
  }

  private toggle(e: Event): void {
    const box = e.target as HTMLInputElement;
    const next = new Set(this.requirementIds.filter((id) => this.isChosen(id)));
    if (box.checked) next.add(box.value); else next.delete(box.value);
    this.chosen = next;
  }

  private async submit(e: Event): Promise<void> {
    e.preventDefault();
    const doc = this.document!;
    const requirementIds = this.requirementIds.filter((id) => this.isChosen(id));
    if (requirementIds.length === 0) { this.error = 'Pick at least one requirement.'; return; }
    const job: SizeJob = this.mode === 'row'
      ? { kind: 'row', document: doc, rowId: this.currentRow(doc.sensors.flatMap((s) => s.sources.map((r) => `${s.id}.${r.id}`))), requirementIds, points: SWEEP_POINTS }
      : this.outageJob(doc, requirementIds);
    this.running = true;
    this.error = undefined;
    try {
      this.answer = await this.runner.run(job, (done, total) => (this.progress = `run ${done} of about ${total}`));
    } catch (err) {
      if ((err as Error).message !== 'cancelled') this.error = `Could not size: ${(err as Error).message}`;
    } finally {
      this.running = false;
    }
  }

  private outageJob(doc: BudgetDocument, requirementIds: string[]): SizeJob {
    const outages = doc.sensors.flatMap((s) => (s.outages ?? []).map((_, i) => ({ key: `${s.id}#${i}` })));
    const [sensorId, index] = this.currentOutage(outages).split('#');
    return { kind: 'outage', document: doc, sensorId, outageIndex: Number(index), requirementIds, points: SWEEP_POINTS };
  }
}

function sizedText(s: RowAnswer['sized'][number], unit: string): string {
  if (s.outcome === 'never-passes') return 'fails even at zero';
  const t = formatToTolerance(s.largestPassing, s.tolerance);
  return s.outcome === 'always-passes' ? `above ${formatSignificant(s.largestPassing, 4)} ${unit} (no limit found)` : `${t.value} ${unit} ± ${t.tolerance}`;
}

declare global {
  interface HTMLElementTagNameMap {
    'sl-sizing-panel': SlSizingPanel;
  }
}
