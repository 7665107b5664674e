import { LitElement, css, html, nothing } from 'lit';
import { customElement, property, queryAll, state } from 'lit/decorators.js';
import { SENSOR_KINDS, type BudgetDocument, type RSweep } from '../../src/index';
import { formatSignificant } from '../../src';
import { ChartController } from '../charts/chart-controller';
import { rSweepPlot } from '../charts/analysis-charts';
import { AnalysisRunner } from '../compute/analysis-runner';

/**
 * What the R choice costs: one aiding sensor's R in the filter scaled from
 * ×0.1 to ×10 (every other row as tuned), with each requirement's actual
 * worst value and the one the filter believes against the scale (log axis),
 * the truth's R (×1) marked. With the filter otherwise equal to the truth the
 * actual worst is smallest at ×1 (the Kalman filter is the minimum-variance
 * linear filter for its truth: Gelb, Applied Optimal Estimation, 1974, §7.2).
 * Runs in the analysis worker.
 */
@customElement('sl-r-sweep-panel')
export class SlRSweepPanel extends LitElement {
  static override styles = css`
    :host { display: block; }
    form { display: flex; gap: 8px; align-items: center; flex-wrap: wrap; }
    select { font: inherit; }
    figure { margin: 12px 0 0; }
    figcaption { font-size: 12px; font-weight: 600; }
    .plot { position: relative; height: 230px; }
    .best { font-size: 12px; color: var(--sl-ink-soft); margin: 2px 0 0; }
    .error { color: var(--sl-fail); }
    .older { color: var(--sl-warn-ink); background: var(--sl-warn-bg); padding: 3px 8px; border-radius: var(--sl-radius); }
  `;

  /** The open document (the worker evaluates it afresh). */
  @property({ attribute: false }) document?: BudgetDocument;

  @state() private sensorId = '';
  @state() private running = false;
  @state() private progress = '';
  @state() private sweep?: RSweep;
  @state() private error?: string;
  /** The document the shown answer was computed from (a later edit marks it as older). */
  private answeredFor?: BudgetDocument;
  @queryAll('canvas') private canvases!: NodeListOf<HTMLCanvasElement>;
  /** One chart per requirement (for tests: `plots[i].chart`). */
  plots: ChartController[] = [];
  /** The runner (tests may replace it before the first run). */
  runner = new AnalysisRunner();

  override disconnectedCallback(): void {
    this.runner.cancel();
    super.disconnectedCallback();
  }

  override render() {
    const doc = this.document;
    const aiding = (doc?.sensors ?? []).filter((s) => SENSOR_KINDS[s.kind]?.role === 'aiding').map((s) => s.id);
    if (!doc || !(doc.requirements ?? []).length || aiding.length === 0) {
      return html`<p>The R sweep needs a budget with requirements and an aiding sensor.</p>`;
    }
    const chosen = aiding.includes(this.sensorId) ? this.sensorId : aiding[0];
    return html`
      <form @submit=${this.submit}>
        <label for="sensor">Scale the filter's R of</label>
        <select id="sensor" @change=${(e: Event) => (this.sensorId = (e.target as HTMLSelectElement).value)}>
          ${aiding.map((id) => html`<option value=${id} ?selected=${id === chosen}>${id}</option>`)}
        </select>
        <span>from ×0.1 to ×10</span>
        <button type="submit" ?disabled=${this.running}>Sweep</button>
        ${this.running ? html`<button type="button" @click=${() => this.runner.cancel()}>Cancel</button><span role="status">${this.progress}</span>` : nothing}
      </form>
      ${this.error ? html`<p class="error" role="alert">${this.error}</p>` : nothing}
      ${this.sweep && this.answeredFor !== this.document
        ? html`<p class="older" role="status">From the budget before its latest edit: Sweep again to update.</p>` : nothing}
      ${this.sweep ? this.result(this.sweep) : nothing}
    `;
  }

  private result(s: RSweep) {
    return (s.points[0]?.values ?? []).map((r) => html`
      <figure data-requirement=${r.requirementId}>
        <figcaption>${r.requirementId}: worst value against ${s.sensorId}'s R in the filter</figcaption>
        <div class="plot"><canvas role="img" aria-label=${`${r.requirementId}: actual and believed worst value against the R scale, log axis`}></canvas></div>
        <p class="best">Smallest actual worst at ×${formatSignificant(s.bestFactor[r.requirementId], 3)}; the shaded mark is ×1, the truth's R.</p>
      </figure>`);
  }

  override willUpdate(): void {
    // One chart per requirement, made before the render so that adding them schedules no second update.
    const count = this.sweep?.points[0]?.values.length ?? 0;
    while (this.plots.length < count) this.plots.push(new ChartController(this));
  }

  override updated(): void {
    const s = this.sweep;
    if (!s) return;
    [...this.canvases].forEach((c, i) => this.plots[i].draw(c, rSweepPlot(s, i)));
  }

  private async submit(e: Event): Promise<void> {
    e.preventDefault();
    const select = this.renderRoot.querySelector<HTMLSelectElement>('#sensor')!;
    const doc = this.document!;
    this.running = true;
    this.error = undefined;
    try {
      const answer = await this.runner.run({ kind: 'r-sweep', document: doc, sensorId: select.value },
        (done, total) => (this.progress = `point ${done} of ${total}`));
      if (answer.kind === 'r-sweep') {
        this.answeredFor = doc;
        this.sweep = answer.sweep;
      }
    } catch (err) {
      if ((err as Error).message !== 'cancelled') this.error = `Could not sweep R: ${(err as Error).message}`;
    } finally {
      this.running = false;
    }
  }
}

declare global {
  interface HTMLElementTagNameMap {
    'sl-r-sweep-panel': SlRSweepPanel;
  }
}
