import { LitElement, css, html, nothing } from 'lit';
import { customElement, property, state } from 'lit/decorators.js';
import type { JsonResult } from '../../src';
import type { ViewResult } from '../../src';
import { calibrationGroups, type CalibrationGroup } from '../charts/calibration-groups';
import { checkpointsOf } from '../charts/result-shapes';
import { hasSigmaChart, type SigmaChartKind } from '../charts/sigma-series';
import './sl-verdicts';
import './sl-filter-design';
import './sl-sigma-chart';
import './sl-plan-view';
import './sl-share-chart';
import './sl-checkpoint-table';
import './sl-calibration-chart';
import './sl-noise-ledger';
import './sl-sizing-panel';
import './sl-compare-panel';
import './sl-monte-carlo-panel';
import './sl-sensitivity-panel';
import './sl-r-sweep-panel';
import type { BudgetDocument } from '../../src/index';

/** The findings' tabs, in order, with their labels. */
export const FINDINGS_TABS = [
  ['time', 'Over time'], ['shares', 'Shares'], ['checkpoint', 'Checkpoint'], ['calibration', 'Calibration'], ['noise', 'R · Q · P0'], ['sizing', 'Sizing'],
  ['montecarlo', 'Monte Carlo'],
  ['assumptions', 'Assumptions'], ['r-sweep', 'R sweep'],
] as const;

/** Key of a findings tab. */
export type FindingsTab = (typeof FINDINGS_TABS)[number][0];

/** Where the latest recompute stands (as the compute controller reports it). */
export type FindingsStatus = 'idle' | 'pending' | 'complete' | 'error';

const SIGMA_CHARTS: SigmaChartKind[] = ['heading', 'position', 'speed'];

/**
 * The results side of the page: verdicts, σ over time and the plan view;
 * shares of variance; the budget at a checkpoint; calibration states; and
 * the R, Q and P0 ledger, one tab each. While `stale`, the last results
 * stay up, dimmed and labelled; a blocked view shows why instead; cell
 * errors make the results partial and the verdicts provisional.
 */
@customElement('sl-findings')
export class SlFindings extends LitElement {
  static override styles = css`
    :host { display: block; background: var(--sl-paper); font-size: 13px; }
    .bar { position: sticky; top: 0; z-index: 2; background: var(--sl-paper); border-bottom: 1px solid var(--sl-rule); padding: 6px 12px 0; }
    [role='tablist'] { display: flex; flex-wrap: wrap; gap: 2px; }
    [role='tab'] { white-space: nowrap; font: inherit; border: 1px solid transparent; border-bottom: none; background: none; padding: 4px 10px; cursor: pointer; color: var(--sl-ink-soft); border-radius: var(--sl-radius) var(--sl-radius) 0 0; }
    [role='tab'][aria-selected='true'] { background: var(--sl-panel); border-color: var(--sl-rule); color: var(--sl-ink); font-weight: 600; margin-bottom: -1px; }
    [role='tab']:hover { background: var(--sl-accent-soft); color: var(--sl-ink); }
    [role='tab'][aria-selected='true']:hover { background: var(--sl-panel); color: var(--sl-ink); text-decoration: underline; }
    .pending { margin: 6px 0; font-size: 12px; color: var(--sl-warn-ink); }
    .stale-label { position: sticky; top: 31px; z-index: 2; font-size: 12px; font-weight: 600; background: var(--sl-warn-bg); color: var(--sl-warn-ink); padding: 3px 12px; border-bottom: 1px solid var(--sl-rule); }
    .results { padding: 10px 12px 24px; }
    :host([data-stale]) .results { opacity: 0.45; filter: grayscale(0.6); }
    [role='tabpanel'] > * + * { margin-top: 14px; }
    .note { padding: 6px 10px; border-radius: var(--sl-radius); margin: 10px 12px 0; }
    .partial { background: var(--sl-warn-bg); color: var(--sl-warn-ink); }
    .failed, .blocked { background: var(--sl-error-bg); color: var(--sl-fail); }
    .blocked code { font-family: var(--sl-mono); }
    .empty { color: var(--sl-ink-soft); padding: 16px 12px; }
    h3 { font-size: 12px; margin-bottom: 2px; }
  `;

  /** The latest results (or why there are none); undefined before the first compute. */
  @property({ attribute: false }) view?: ViewResult;
  /** True while the shown view is older than the document: results stay up, dimmed and labelled. Reflected as `data-stale`. */
  @property({ type: Boolean, reflect: true, attribute: 'data-stale' }) stale = false;
  /** Where the latest recompute stands. */
  @property() status: FindingsStatus = 'idle';
  /** The open document, for sizing (which runs its own computations). */
  @property({ attribute: false }) document?: BudgetDocument;

  @state() private tab: FindingsTab = 'time';
  /** Tabs opened so far: kept on the page (hidden) so their pickers and charts survive switching. */
  @state() private opened = new Set<FindingsTab>(['time']);
  private groups?: { result: JsonResult; groups: CalibrationGroup[] };
  /** The last view with per-source contributions, shown (marked) on the share tabs while a totals-only view is newer. */
  private lastFull?: ViewResult;

  override willUpdate(): void {
    if (this.view?.result && !this.view.contributionsPending) this.lastFull = this.view;
  }

  override render() {
    return html`
      <div class="bar">
        <div role="tablist" aria-label="Findings" @keydown=${this.tabKey}>
          ${FINDINGS_TABS.map(([key, label]) => html`
            <button role="tab" id=${`tab-${key}`} data-tab=${key} aria-selected=${String(key === this.tab)} tabindex=${key === this.tab ? 0 : -1}
              aria-controls=${`panel-${key}`} @click=${() => this.show(key)}>${label}</button>`)}
        </div>
      </div>
      ${this.stale ? html`<div class="stale-label" role="status">stale — recomputing: these results are from before the latest edit</div>` : nothing}
      ${this.status === 'error' && this.view ? html`<div class="note failed" role="alert">The last recompute failed; these results are from the run before it.</div>` : nothing}
      ${this.body()}
    `;
  }

  private body() {
    const view = this.view;
    if (!view) {
      const why = this.status === 'pending' ? 'Computing…' : this.status === 'error' ? 'The computation failed; the status line says why.' : 'No results yet.';
      return html`<p class="empty">${why}</p>`;
    }
    if (view.blocked) {
      return html`<div class="note blocked" role="alert"><strong>Nothing could be computed:</strong> ${view.blocked.message}
        ${view.blocked.path ? html`<div>at <code>${view.blocked.path}</code></div>` : nothing}</div>`;
    }
    if (!view.result) return html`<p class="empty">No results.</p>`;
    return html`${this.partialNote(view)}${this.warningsNote(view)}<div class="results" aria-busy=${String(this.stale)}>${FINDINGS_TABS.map(([key]) => this.panel(key, view))}</div>`;
  }

  private partialNote(view: ViewResult) {
    const errors = view.cellErrors.length, left = view.omitted.map((o) => o.what);
    if (errors === 0 && left.length === 0) return nothing;
    const cells = `${errors} ${errors === 1 ? 'cell has an error' : 'cells have errors'}`;
    return html`<div class="note partial" role="alert"><strong>Partial:</strong> ${cells}${left.length ? `; these items are left out: ${left.join(', ')}` : ''}.
      The verdicts are provisional until the cells are fixed.</div>`;
  }

  /** Rows the analysis ran with but models optimistically (a coarse LSB), from the result's status. */
  private warningsNote(view: ViewResult) {
    const warnings = view.result?.status.warnings ?? [];
    if (warnings.length === 0) return nothing;
    return html`<div class="note partial" role="status"><strong>Modelling warning:</strong>
      ${warnings.map((w) => html`<div><code>${w.source}</code>: ${w.message}</div>`)}</div>`;
  }

  private panel(key: FindingsTab, view: ViewResult) {
    if (!this.opened.has(key)) return nothing;
    return html`<section role="tabpanel" id=${`panel-${key}`} aria-labelledby=${`tab-${key}`} ?hidden=${key !== this.tab}>${this.content(key, view)}</section>`;
  }

  private content(key: FindingsTab, view: ViewResult) {
    const result = view.result!;
    const outages = view.plan?.outages ?? [];
    switch (key) {
      case 'time':
        return html`
          <sl-verdicts .result=${result} ?provisional=${view.cellErrors.length > 0 || view.omitted.length > 0}></sl-verdicts>
          ${result.filterDesign ? html`<sl-filter-design .design=${result.filterDesign}></sl-filter-design>` : nothing}
          ${SIGMA_CHARTS.filter((k) => hasSigmaChart(view, k)).map((k) => html`<sl-sigma-chart kind=${k} .view=${view}></sl-sigma-chart>`)}
          <div><h3>Path from above</h3><sl-plan-view .plan=${view.plan}></sl-plan-view></div>`;
      case 'shares':
      case 'checkpoint': {
        // Shares come a moment after the totals; until then the last ones stay up, marked.
        const full = view.contributionsPending ? this.lastFull?.result : result;
        if (!full) return html`<p class="empty">Working out each source's share…</p>`;
        const pending = view.contributionsPending ? html`<p class="pending" role="status">Updating each source's share…</p>` : nothing;
        return key === 'shares'
          ? html`${pending}<sl-share-chart .result=${full} .outages=${outages}></sl-share-chart>`
          : html`${pending}<sl-checkpoint-table .checkpoints=${checkpointsOf(full)}></sl-checkpoint-table>`;
      }
      case 'calibration': {
        const groups = this.groupsOf(result);
        if (!groups.length) return html`<p class="empty">This budget estimates no calibration states.</p>`;
        return groups.map((g) => html`<sl-calibration-chart .t=${result.series.t_s} .group=${g} .outages=${outages}></sl-calibration-chart>`);
      }
      case 'noise':
        return html`<sl-noise-ledger .noise=${result.noise} budget-title=${view.title} caution=${view.caution}></sl-noise-ledger>`;
      case 'sizing':
        return html`<sl-sizing-panel .document=${this.document} .requirementIds=${result.requirements.map((r) => r.id)}></sl-sizing-panel>
          <h3>Candidates compared</h3><sl-compare-panel .document=${this.document}></sl-compare-panel>`;
      case 'montecarlo':
        return html`<sl-monte-carlo-panel .document=${this.document}></sl-monte-carlo-panel>`;
      case 'assumptions':
        return html`<sl-sensitivity-panel .document=${this.document}></sl-sensitivity-panel>`;
      case 'r-sweep':
        return html`<sl-r-sweep-panel .document=${this.document}></sl-r-sweep-panel>`;
    }
  }

  /** Calibration groups of `result`, computed once per result so a re-render alone redraws no chart. */
  private groupsOf(result: JsonResult): CalibrationGroup[] {
    if (this.groups?.result !== result) this.groups = { result, groups: calibrationGroups(result) };
    return this.groups.groups;
  }

  private show(key: FindingsTab): void {
    this.tab = key;
    if (!this.opened.has(key)) this.opened = new Set([...this.opened, key]);
  }

  private tabKey(e: KeyboardEvent): void {
    const step = e.key === 'ArrowRight' ? 1 : e.key === 'ArrowLeft' ? -1 : 0;
    if (!step) return;
    const keys = FINDINGS_TABS.map(([k]) => k);
    const next = keys[(keys.indexOf(this.tab) + step + keys.length) % keys.length];
    this.show(next);
    void this.updateComplete.then(() => this.renderRoot.querySelector<HTMLElement>(`#tab-${next}`)?.focus());
  }
}

declare global {
  interface HTMLElementTagNameMap {
    'sl-findings': SlFindings;
  }
}
