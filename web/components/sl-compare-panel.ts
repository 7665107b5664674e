import { LitElement, css, html, nothing } from 'lit';
import { customElement, property, state } from 'lit/decorators.js';
import { unsafeSVG } from 'lit/directives/unsafe-svg.js';
import {
  candidateCharts,
  cheapestText,
  comparisonTable,
  renderLineChartSvg,
  type BudgetDocument,
  type CandidateComparison,
} from '../../src/index';
import { SizingRunner } from '../sizing/sizing-runner';

/**
 * Candidates compared: each candidate of the document's `candidates` in
 * place of its sensor's rows, against the same mission and requirements
 * (src/compare/). Candidates side by side in a table (price, verdicts,
 * margins, times to exceed), the cheapest that passes, and each
 * requirement's curve per candidate on one chart. Runs in the sizing worker
 * (one full covariance run per candidate), with progress.
 */
@customElement('sl-compare-panel')
export class SlComparePanel extends LitElement {
  static override styles = css`
    :host {
      display: block;
    }
    h3 {
      font-size: 13px;
      margin: 12px 0 4px;
    }
    .scroll {
      overflow-x: auto;
      max-width: 100%;
    }
    table {
      border-collapse: collapse;
      margin: 6px 0;
      font-size: 12px;
      font-variant-numeric: tabular-nums;
    }
    th,
    td {
      border-bottom: 1px solid var(--sl-rule);
      padding: 3px 6px;
      text-align: right;
      white-space: nowrap;
    }
    th:first-child,
    td:first-child {
      text-align: left;
      white-space: normal;
      min-width: 11em;
      max-width: 17em;
    }
    h4 {
      font-size: 12px;
      margin: 10px 0 2px;
    }
    td.fail {
      color: var(--sl-fail);
      font-weight: 600;
    }
    td.pass {
      color: var(--sl-pass);
    }
    th.best {
      background: var(--sl-accent-soft);
    }
    .chart svg {
      width: 100%;
      height: auto;
      max-width: 720px;
    }
    .error {
      color: var(--sl-fail);
    }
    .hint {
      color: var(--sl-ink-soft);
    }
    code {
      font-family: var(--sl-mono);
    }
  `;

  /** The open document (the worker evaluates every candidate afresh). */
  @property({ attribute: false }) document?: BudgetDocument;

  @state() private running = false;
  @state() private progress = '';
  @state() private comparison?: CandidateComparison;
  @state() private error?: string;
  private readonly runner = new SizingRunner();

  override disconnectedCallback(): void {
    this.runner.cancel();
    super.disconnectedCallback();
  }

  override render() {
    const slots = this.document?.candidates ?? [];
    if (slots.length === 0) {
      return html`<p class="hint">
        No candidates in this budget. To compare parts, keep a sensor's rows as a candidate (in the sensor list) or add
        a <code>candidates</code> list to the file; each candidate's rows replace its sensor's rows for one run.
      </p>`;
    }
    const count = slots.reduce((n, s) => n + s.options.length, 0);
    return html`
      <p>
        <button @click=${this.run} ?disabled=${this.running}>
          Compare ${count} candidate${count === 1 ? '' : 's'}
        </button>
        ${this.running
          ? html`<button @click=${() => this.runner.cancel()}>Cancel</button>
              <span role="status">${this.progress}</span>`
          : nothing}
      </p>
      ${this.error ? html`<p class="error" role="alert">${this.error}</p>` : nothing}
      ${this.comparison ? this.comparison.slots.map((slot) => this.slotView(slot)) : nothing}
    `;
  }

  private slotView(slot: CandidateComparison['slots'][number]) {
    const table = comparisonTable(slot);
    const cls = (text: string) =>
      text === 'FAIL' || text === 'no' || text === 'PARTIAL' || text === 'BLOCKED'
        ? 'fail'
        : text === 'PASS' || text === 'yes'
          ? 'pass'
          : '';
    return html`
      <h3>Candidates for ${slot.sensorId}${slot.note ? html` <span class="hint">(${slot.note})</span>` : nothing}</h3>
      <div class="scroll">
        <table id=${`compare-${slot.sensorId}`}>
          <thead>
            <tr>
              <th></th>
              ${table.candidates.map(
                (c) => html`<th scope="col" class=${c === slot.cheapestPassing ? 'best' : ''}>${c}</th>`,
              )}
            </tr>
          </thead>
          <tbody>
            ${table.rows.map(
              (r) =>
                html`<tr>
                  <td>${r.label}</td>
                  ${r.cells.map((c) => html`<td class=${cls(c)}>${c}</td>`)}
                </tr>`,
            )}
          </tbody>
        </table>
      </div>
      <p id=${`cheapest-${slot.sensorId}`}>${cheapestText(slot)}</p>
      ${slot.outcomes.flatMap((o) => o.problems.map((p) => html`<p class="error">${o.candidateId}: ${p}</p>`))}
      ${candidateCharts(slot).map(
        (chart, i) =>
          html`<h4>${chart.title}</h4>
            <div class="chart">${unsafeSVG(renderLineChartSvg(chart, `compare-${slot.sensorId}-${i}`))}</div>`,
      )}
    `;
  }

  private async run(): Promise<void> {
    if (!this.document) return;
    this.running = true;
    this.error = undefined;
    try {
      this.comparison = (
        await this.runner.run(
          { kind: 'compare', document: this.document },
          (done, total) => (this.progress = `candidate ${done} of ${total} done`),
        )
      ).comparison;
    } catch (err) {
      if ((err as Error).message !== 'cancelled') this.error = `Could not compare: ${(err as Error).message}`;
    } finally {
      this.running = false;
    }
  }
}

declare global {
  interface HTMLElementTagNameMap {
    'sl-compare-panel': SlComparePanel;
  }
}
