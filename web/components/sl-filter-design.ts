import { LitElement, css, html, nothing } from 'lit';
import { customElement, property } from 'lit/decorators.js';
import type { FilterDesignJson } from '../../src';
import { num } from '../charts/findings-text';

/**
 * The filter as tuned against the truth: each quantity's believed and actual
 * sigma with a plain verdict, the requirements judged on the actual error
 * (a word, not colour alone) and the normalised innovation variance per
 * aiding sensor. Shown only when rows carry a filter design (`tuning`).
 */
@customElement('sl-filter-design')
export class SlFilterDesign extends LitElement {
  static override styles = css`
    :host { display: block; font-size: 13px; margin: 10px 0; }
    h2 { font-size: 14px; margin: 0 0 6px; }
    p { color: var(--sl-ink-soft); margin: 0 0 6px; }
    ul { margin: 0 0 8px; padding-left: 16px; }
    li { margin-bottom: 3px; }
    .word { font-weight: 700; }
    [data-verdict='pass'] .word { color: var(--sl-pass); }
    [data-verdict='fail'] .word { color: var(--sl-fail); }
    .id { font-family: var(--sl-mono); font-size: 12px; }
  `;

  /** The `filterDesign` part of the result; nothing is shown without it. */
  @property({ attribute: false }) design?: FilterDesignJson;

  override render() {
    const d = this.design;
    if (!d) return nothing;
    return html`
      <h2>Filter as tuned versus truth</h2>
      <p>Believed: the filter's own covariance. Actual: the truth run with the filter's gains. Rows tuned differently:
        ${Object.keys(d.tuning).map((id, i) => html`${i ? ', ' : ''}<span class="id">${id}</span>`)}.</p>
      <ul class="confidence">${d.confidence.map((c) => html`<li data-quantity=${c.quantity}>${c.quantity}: ${c.verdict}</li>`)}</ul>
      <ul class="actual">${d.actual.requirements.map((r, i) => html`
        <li data-verdict=${r.verdict} data-requirement=${r.id}><span class="word">${r.verdict === 'pass' ? 'Pass' : 'Fail'}</span>
          on the actual error: <span class="id">${r.id}</span> worst ${num(r.worst)} ${r.unit}
          (the filter believes ${num(d.believed.requirements[i].worst)} ${r.unit}), limit ${num(r.limit)} ${r.unit}</li>`)}</ul>
      ${d.innovations.length ? html`<p>Normalised innovation variance (1 = consistent, above 1 = overconfident):
        ${d.innovations.map((r, i) => html`${i ? '; ' : ''}${r.sensor} mean ${num(r.mean)}, largest ${num(r.max)}`)}</p>` : nothing}
    `;
  }
}

declare global {
  interface HTMLElementTagNameMap {
    'sl-filter-design': SlFilterDesign;
  }
}
