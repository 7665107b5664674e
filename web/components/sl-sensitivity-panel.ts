import { LitElement, css, html, nothing } from 'lit';
import { customElement, property, query, state } from 'lit/decorators.js';
import type { BudgetDocument, SensitivityEntry } from '../../src/index';
import { formatSignificant } from '../../src';
import { Chart } from '../charts/register-charts';
import { sensitivityBars } from '../charts/analysis-charts';
import { AnalysisRunner } from '../compute/analysis-runner';

/** Default scale range (×0.5 to ×2). */
const DEFAULT_RANGE: [number, number] = [0.5, 2];

/**
 * Which assumptions matter: every value marked assumed (and any row the user
 * ticks) scaled over a range one at a time, ranked by the change in each
 * requirement's worst value (relative to its base), as a bar chart (largest
 * first) and a table. Runs in the analysis worker (AnalysisRunner), never on
 * the page's thread; with a filter design the requirements are judged on the
 * actual error.
 */
@customElement('sl-sensitivity-panel')
export class SlSensitivityPanel extends LitElement {
  static override styles = css`
    :host { display: block; }
    form { display: grid; grid-template-columns: max-content 1fr; gap: 6px 10px; align-items: center; }
    fieldset { border: 1px solid var(--sl-rule); border-radius: var(--sl-radius); padding: 4px 8px; display: flex; flex-wrap: wrap; gap: 4px 12px; max-height: 140px; overflow: auto; }
    legend { font-size: 12px; }
    input[type='number'] { width: 6em; font: inherit; }
    .actions { grid-column: 2; display: flex; gap: 8px; align-items: center; }
    .plot { position: relative; margin-top: 10px; }
    table { border-collapse: collapse; margin: 10px 0; font-variant-numeric: tabular-nums; }
    th, td { border-bottom: 1px solid var(--sl-rule); padding: 3px 8px; text-align: left; }
    td.num { text-align: right; }
    .error { color: var(--sl-fail); }
    .older { color: var(--sl-warn-ink); background: var(--sl-warn-bg); padding: 3px 8px; border-radius: var(--sl-radius); }
    .id { font-family: var(--sl-mono); font-size: 12px; }
  `;

  /** The open document (the worker evaluates it afresh). */
  @property({ attribute: false }) document?: BudgetDocument;

  @state() private low = DEFAULT_RANGE[0];
  @state() private high = DEFAULT_RANGE[1];
  /** Rows ticked besides the assumed ones, as sensorId.rowId. */
  @state() private picked = new Set<string>();
  @state() private running = false;
  @state() private progress = '';
  @state() private entries?: SensitivityEntry[];
  @state() private error?: string;
  /** The document the shown answer was computed from (a later edit marks it as older). */
  private answeredFor?: BudgetDocument;
  @query('canvas') private canvas?: HTMLCanvasElement;
  private chart?: Chart<'bar', number[], string>;
  /** The runner (tests may replace it before the first run). */
  runner = new AnalysisRunner();

  override disconnectedCallback(): void {
    this.runner.cancel();
    this.chart?.destroy();
    this.chart = undefined;
    super.disconnectedCallback();
  }

  override render() {
    const doc = this.document;
    if (!doc || !(doc.requirements ?? []).length) return html`<p>The sensitivity needs a budget with requirements.</p>`;
    const rows = doc.sensors.flatMap((s) => s.sources.map((r) => ({ id: `${s.id}.${r.id}`, assumed: r.assumed === true })));
    return html`
      <form @submit=${this.submit}>
        <label for="low">Scale from ×</label>
        <span><input id="low" type="number" step="any" min="0" .value=${String(this.low)} @change=${(e: Event) => (this.low = Number((e.target as HTMLInputElement).value))} />
          <label for="high"> to ×</label><input id="high" type="number" step="any" min="0" .value=${String(this.high)}
            @change=${(e: Event) => (this.high = Number((e.target as HTMLInputElement).value))} /></span>
        <span>Values varied</span>
        <fieldset><legend>every assumed value (ticked, greyed) and the rows you tick</legend>${rows.map((r) => html`
          <label><input type="checkbox" name="row" value=${r.id} ?disabled=${r.assumed} .checked=${r.assumed || this.picked.has(r.id)} @change=${this.toggle} />
            <span class="id">${r.id}</span></label>`)}</fieldset>
        <div class="actions">
          <button type="submit" ?disabled=${this.running}>Vary</button>
          ${this.running ? html`<button type="button" @click=${() => this.runner.cancel()}>Cancel</button><span role="status">${this.progress}</span>` : nothing}
        </div>
      </form>
      ${this.error ? html`<p class="error" role="alert">${this.error}</p>` : nothing}
      ${this.entries && this.answeredFor !== this.document
        ? html`<p class="older" role="status">From the budget before its latest edit: Vary again to update.</p>` : nothing}
      ${this.entries ? this.result(this.entries) : nothing}
    `;
  }

  private result(entries: SensitivityEntry[]) {
    if (entries.length === 0) return html`<p id="none">No value is marked assumed and no row is ticked: nothing was varied.</p>`;
    const height = 40 + 20 * Math.min(entries.length, 20);
    return html`
      <div class="plot" style=${`height:${height}px`}><canvas role="img" aria-label="Largest change in each requirement's worst value, largest first"></canvas></div>
      <table id="sensitivity"><thead><tr><th>Value</th><th>Requirement</th><th>Base worst</th><th>At low</th><th>At high</th><th>Largest change</th><th>Relative</th></tr></thead><tbody>
        ${entries.map((e) => html`<tr data-target=${e.target} data-requirement=${e.requirementId}>
          <td class="id">${e.target}${e.assumed ? '' : ' (ticked)'}</td><td class="id">${e.requirementId}</td>
          <td class="num">${n(e.baseWorst)} ${e.unit}</td><td class="num">${n(e.byScale[0].worst)} ${e.unit}</td>
          <td class="num">${n(e.byScale[e.byScale.length - 1].worst)} ${e.unit}</td><td class="num">${n(e.change)} ${e.unit}</td>
          <td class="num" data-value=${e.relativeChange}>${(100 * e.relativeChange).toFixed(1)} %</td></tr>`)}
      </tbody></table>`;
  }

  override updated(): void {
    if (!this.entries?.length || !this.canvas) return;
    if (this.chart?.canvas !== this.canvas) {
      this.chart?.destroy();
      this.chart = new Chart(this.canvas, sensitivityBars(this.entries));
    }
  }

  /** The bar chart, once drawn (for tests). */
  get barChart(): Chart<'bar', number[], string> | undefined {
    return this.chart;
  }

  private toggle(e: Event): void {
    const box = e.target as HTMLInputElement;
    const next = new Set(this.picked);
    if (box.checked) next.add(box.value); else next.delete(box.value);
    this.picked = next;
  }

  private async submit(e: Event): Promise<void> {
    e.preventDefault();
    if (!(this.low > 0) || !(this.high > this.low) || !Number.isFinite(this.high)) {
      this.error = `The range must be two scales with 0 < low < high, e.g. 0.5 to 2; got ${this.low} to ${this.high}.`;
      return;
    }
    const doc = this.document!;
    this.running = true;
    this.error = undefined;
    try {
      const answer = await this.runner.run(
        { kind: 'sensitivity', document: doc, rows: [...this.picked], range: [this.low, this.high] },
        (done, total) => (this.progress = `run ${done} of ${total}`),
      );
      if (answer.kind === 'sensitivity') {
        this.answeredFor = doc;
        this.chart?.destroy();
        this.chart = undefined;
        this.entries = answer.entries;
      }
    } catch (err) {
      if ((err as Error).message !== 'cancelled') this.error = `Could not vary the assumptions: ${(err as Error).message}`;
    } finally {
      this.running = false;
    }
  }
}

const n = (x: number) => formatSignificant(x, 4);

declare global {
  interface HTMLElementTagNameMap {
    'sl-sensitivity-panel': SlSensitivityPanel;
  }
}
