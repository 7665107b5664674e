import { LitElement, css, html, nothing } from 'lit';
import { customElement, property, state } from 'lit/decorators.js';
import { unsafeSVG } from 'lit/directives/unsafe-svg.js';
import { CAUTION, renderLineChartSvg, simulationVerdict, type BudgetDocument } from '../../src/index';
import { MonteCarloRunner, workerCount, type MonteCarloStudy } from '../monte-carlo/monte-carlo-runner';
import { neesChart, rmsChart } from '../monte-carlo/monte-carlo-charts';

/** Most runs the page offers (the command line shards beyond that). */
const MAX_PAGE_RUNS = 100_000;

/**
 * The Monte Carlo check on the page: seeded runs of the truth and an extended
 * Kalman filter in several web workers (one per core the browser reports),
 * with progress and cancel; then the verdict, each warning, the RMS of every
 * quantity against the budget's σ with the 95 % band of the RMS of N runs,
 * and each NEES group's average with its two-sided 95 % bounds (Bar-Shalom,
 * Li and Kirubarajan 2001, §5.4.2). The same seed gives the numbers
 * `sigma-ledger simulate` prints. Charts are the report's SVG line chart.
 */
@customElement('sl-monte-carlo-panel')
export class SlMonteCarloPanel extends LitElement {
  static override styles = css`
    :host { display: block; }
    form { display: flex; flex-wrap: wrap; gap: 6px 12px; align-items: center; }
    input[type='number'] { width: 8em; font: inherit; }
    progress { width: 180px; }
    .verdict { font-weight: 600; }
    .verdict.warn { color: var(--sl-fail); }
    .caution { background: var(--sl-warn-bg); color: var(--sl-warn-ink); font-size: 12px; padding: 4px 8px; border-radius: var(--sl-radius); }
    .charts { display: grid; grid-template-columns: repeat(auto-fill, minmax(340px, 1fr)); gap: 10px; }
    .chart svg { width: 100%; height: auto; }
    .error { color: var(--sl-fail); }
    ul.flags { margin: 4px 0; padding-left: 18px; }
  `;

  /** The open document (the workers evaluate it afresh). */
  @property({ attribute: false }) document?: BudgetDocument;

  @state() private runs = 200;
  @state() private seed = 1;
  @state() private running = false;
  @state() private done = 0;
  @state() private total = 0;
  @state() private study?: MonteCarloStudy;
  @state() private error?: string;
  private readonly runner = new MonteCarloRunner();

  override disconnectedCallback(): void {
    this.runner.cancel();
    super.disconnectedCallback();
  }

  override render() {
    if (!this.document) return html`<p>Open a budget to check it by simulation.</p>`;
    return html`
      <p>Checks the linearised budget by simulation: every error process drawn, the vehicle on the nominal path, an
        extended Kalman filter linearised about its own estimate. The same seed gives the numbers of
        <code>sigma-ledger simulate FILE --runs N --seed S</code>.</p>
      <form @submit=${this.submit}>
        <label>Runs <input id="runs" type="number" min="1" max=${MAX_PAGE_RUNS} step="1" .value=${String(this.runs)}
          @change=${(e: Event) => (this.runs = Number((e.target as HTMLInputElement).value))} /></label>
        <label>Seed <input id="seed" type="number" min="0" max="4294967295" step="1" .value=${String(this.seed)}
          @change=${(e: Event) => (this.seed = Number((e.target as HTMLInputElement).value))} /></label>
        <button type="submit" id="start" ?disabled=${this.running}>Simulate</button>
        ${this.running ? html`
          <button type="button" id="cancel" @click=${() => this.runner.cancel()}>Cancel</button>
          <progress max=${this.total} .value=${this.done} aria-label="Runs done"></progress>
          <span role="status">${this.done} of ${this.total} runs, ${workerCount(this.total)} workers</span>` : nothing}
      </form>
      ${this.error ? html`<p class="error" role="alert">${this.error}</p>` : nothing}
      ${this.study ? this.result(this.study) : nothing}
      <p class="caution" role="note"><strong>Caution:</strong> ${CAUTION}</p>
    `;
  }

  private result(study: MonteCarloStudy) {
    const svg = (chart: Parameters<typeof renderLineChartSvg>[0], id: string) => html`<div class="chart">${unsafeSVG(renderLineChartSvg(chart, id))}</div>`;
    return html`
      <p class="verdict ${study.flags.length ? 'warn' : ''}" id="verdict">${simulationVerdict(study.stats, study.flags)}</p>
      ${study.flags.length ? html`<ul class="flags" id="flags">${study.flags.map((f) => html`<li>${f.text}</li>`)}</ul>` : nothing}
      <h3>RMS error against the budget's σ (seed ${study.seed})</h3>
      <div class="charts" id="rms-charts">${study.stats.quantities.map((q) => svg(rmsChart(study, q), `mc-rms-${q.id}`))}</div>
      <h3>Average NEES with its 95 % bounds</h3>
      <div class="charts" id="nees-charts">${study.stats.nees.filter((g) => g.dof.some((d) => d > 0)).map((g) => svg(neesChart(study, g), `mc-nees-${g.id}`))}</div>
    `;
  }

  private async submit(e: Event): Promise<void> {
    e.preventDefault();
    if (!this.document) return;
    if (!Number.isInteger(this.runs) || this.runs < 1 || this.runs > MAX_PAGE_RUNS) {
      this.error = `Runs must be a whole number from 1 to ${MAX_PAGE_RUNS}.`;
      return;
    }
    if (!Number.isInteger(this.seed) || this.seed < 0 || this.seed > 2 ** 32 - 1) {
      this.error = 'The seed must be a whole number from 0 to 4294967295.';
      return;
    }
    this.running = true;
    this.error = undefined;
    this.done = 0;
    this.total = this.runs;
    try {
      this.study = await this.runner.run(this.document, this.seed, this.runs, (done, total) => {
        this.done = done;
        this.total = total;
      });
    } catch (err) {
      const message = err instanceof Error ? err.message : String(err);
      this.error = message === 'cancelled' ? 'Cancelled; the last finished study stays below.' : message;
    } finally {
      this.running = false;
    }
  }
}

declare global {
  interface HTMLElementTagNameMap {
    'sl-monte-carlo-panel': SlMonteCarloPanel;
  }
}
