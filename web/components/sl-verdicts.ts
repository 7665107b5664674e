import { LitElement, css, html, nothing, svg } from 'lit';
import { customElement, property } from 'lit/decorators.js';
import type { JsonResult } from '../../src';
import { levelText, num, outageSentence, quantityText, seconds } from '../charts/findings-text';
import { requirementsOf, type RequirementEntry } from '../charts/result-shapes';

const PASS_ICON = svg`<path d="M3 8.5 L6.5 12 L13 4.5" fill="none" stroke="currentColor" stroke-width="2.2"/>`;
const FAIL_ICON = svg`<path d="M4 4 L12 12 M12 4 L4 12" fill="none" stroke="currentColor" stroke-width="2.2"/>`;

/**
 * The verdicts: each requirement with Pass or Fail (a word and an icon,
 * not colour alone), its worst value and margin, and for each outage a
 * sentence saying how long the requirement holds. Marked provisional when
 * some cells have errors; numerical problems of the run are listed.
 */
@customElement('sl-verdicts')
export class SlVerdicts extends LitElement {
  static override styles = css`
    :host { display: block; font-size: 13px; }
    h2 { font-size: 14px; margin: 0 0 6px; }
    h2 span { font-weight: 400; color: var(--sl-ink-soft); }
    ul { list-style: none; margin: 0; padding: 0; }
    li.verdict { border: 1px solid var(--sl-rule); border-left-width: 4px; border-radius: var(--sl-radius); padding: 5px 8px; margin-bottom: 6px; background: var(--sl-panel); }
    li[data-verdict='pass'] { border-left-color: var(--sl-pass); }
    li[data-verdict='fail'] { border-left-color: var(--sl-fail); }
    .head { display: flex; gap: 6px; align-items: center; flex-wrap: wrap; }
    .word { display: inline-flex; align-items: center; gap: 3px; font-weight: 700; }
    [data-verdict='pass'] .word { color: var(--sl-pass); }
    [data-verdict='fail'] .word { color: var(--sl-fail); }
    .word svg { width: 16px; height: 16px; }
    .id { font-family: var(--sl-mono); font-size: 12px; }
    .numbers { color: var(--sl-ink-soft); font-variant-numeric: tabular-nums; margin-top: 2px; }
    .provisional { font-size: 11px; background: var(--sl-warn-bg); color: var(--sl-warn-ink); border-radius: 3px; padding: 0 5px; }
    ul.outages { margin-top: 3px; padding-left: 14px; list-style: disc; color: var(--sl-ink); }
    .health { background: var(--sl-warn-bg); color: var(--sl-warn-ink); padding: 5px 8px; border-radius: var(--sl-radius); margin-top: 6px; }
    p { color: var(--sl-ink-soft); margin: 0; }
  `;

  /** The results whose requirements are judged. */
  @property({ attribute: false }) result?: JsonResult;
  /** Mark every verdict provisional (some cells have errors, some items were left out). */
  @property({ type: Boolean }) provisional = false;

  override render() {
    if (!this.result) return nothing;
    const reqs = requirementsOf(this.result);
    const held = reqs.filter((r) => r.verdict === 'pass').length;
    const issues = this.result.status.issues;
    return html`
      <h2>Requirements <span>${reqs.length ? `${held} of ${reqs.length} hold` : ''}</span>
        ${this.provisional ? html`<span class="provisional">provisional</span>` : nothing}</h2>
      ${reqs.length ? html`<ul>${reqs.map((r) => this.verdict(r))}</ul>` : html`<p>No requirements given: add one to get verdicts.</p>`}
      ${issues.length ? html`<div class="health" role="alert">Numerical problems in the covariance run, so the numbers may be wrong:
        ${issues.map((i) => html`<div>${i.kind} at ${seconds(i.tS)}: ${i.detail}</div>`)}</div>` : nothing}
    `;
  }

  private verdict(r: RequirementEntry) {
    const pass = r.verdict === 'pass';
    return html`
      <li class="verdict" data-verdict=${r.verdict} data-requirement=${r.id}>
        <div class="head">
          <span class="word"><svg viewBox="0 0 16 16" aria-hidden="true">${pass ? PASS_ICON : FAIL_ICON}</svg>${pass ? 'Pass' : 'Fail'}</span>
          ${this.provisional ? html`<span class="provisional">provisional</span>` : nothing}
          <span class="id">${r.id}</span>
          <span>${quantityText(r.quantity)} (${levelText(r.level)}) ≤ ${num(r.limit)} ${r.unit} from ${seconds(r.window_s[0])} to ${seconds(r.window_s[1])}</span>
        </div>
        <div class="numbers">worst ${num(r.worst)} ${r.unit} at ${seconds(r.worst_t_s)} · margin ${num(r.margin)} ${r.unit}${pass ? '' : ' (over the limit)'}</div>
        ${r.outages.length ? html`<ul class="outages">${r.outages.map((o) => html`<li data-outage=${o.outage}>${outageSentence(r, o)}</li>`)}</ul>` : nothing}
      </li>
    `;
  }
}

declare global {
  interface HTMLElementTagNameMap {
    'sl-verdicts': SlVerdicts;
  }
}
