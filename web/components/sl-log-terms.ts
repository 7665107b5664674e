import { LitElement, css, html, nothing } from 'lit';
import { customElement, property } from 'lit/decorators.js';
import type { NoiseTermRow } from '../../src';
import { formatSignificant } from '../../src';
import { editorStyles } from '../grid/editor-styles';
import type { AllanOutcome } from '../logs/log-protocol';

const value = (x: number) => (Number.isFinite(x) ? formatSignificant(x, 4) : '—');
const spread = (x: number) => (Number.isFinite(x) ? formatSignificant(x, 2) : '—');

/** The flags of a term as words. */
function flags(t: NoiseTermRow): string {
  return [t.extrapolated ? 'extrapolated' : '', t.upperBound ? 'upper bound (slope not seen)' : '', t.atZero ? 'held at zero' : ''].filter(Boolean).join(', ');
}

/**
 * The noise terms read from a log's Allan curve: the IEEE Std 952 slope
 * read-offs and the whole-curve fit, each with value, unit, one standard
 * uncertainty and its flags, then the bias-instability floor as a budget row
 * holds it (floor, τ of the floor, correlation time).
 */
@customElement('sl-log-terms')
export class SlLogTerms extends LitElement {
  static override styles = [editorStyles, css`
    :host { display: block; }
    table { table-layout: auto; }
    td.num { text-align: right; font-family: var(--sl-mono); font-size: 12px; }
    td.flag { color: var(--sl-warn-ink); font-size: 11px; }
    caption { text-align: left; font-size: 12px; font-weight: 600; padding: 4px 0; }
  `];

  /** The computed log. */
  @property({ attribute: false }) outcome?: AllanOutcome;

  override render() {
    const o = this.outcome;
    if (!o) return nothing;
    const a = o.result.analysis;
    const b = a.biasInstability;
    return html`
      <table>
        <caption>Noise terms of ${o.fileName}</caption>
        <thead><tr><th scope="col">term</th><th scope="col">method</th><th scope="col">value</th><th scope="col">± 1σ</th><th scope="col">unit</th><th scope="col">flags</th></tr></thead>
        <tbody>${a.terms.map((t) => html`
          <tr>
            <th scope="row">${t.name}</th>
            <td>${t.method === 'slope' ? `slope read-off${t.readAtTauS !== undefined ? ` at τ = ${formatSignificant(t.readAtTauS, 3)} s` : ''}` : 'whole-curve fit'}</td>
            <td class="num">${t.upperBound ? '≤ ' : ''}${value(t.value)}</td>
            <td class="num">${spread(t.uncertainty)}</td>
            <td>${t.unit}</td>
            <td class="flag">${flags(t)}</td>
          </tr>`)}
        </tbody>
      </table>
      <p class="hint">Bias instability in the slope rows is the flicker coefficient B = floor / 0.664. The budget row takes the floor itself:
        ${b ? html`floor <strong>${value(b.floor)} ± ${spread(b.uncertainty)} ${b.unit}</strong> at τ = ${formatSignificant(b.tauFloorS, 3)} s,
          correlation time T = τ_floor / 1.8926 = <strong>${formatSignificant(b.correlationTimeS, 3)} s</strong>.`
          : html`<strong>no floor is seen</strong> in this curve, so there is no bias-instability row to write.`}
        Fit χ² = ${formatSignificant(a.fitChiSquare, 3)} on ${a.fitDegreesOfFreedom} degrees of freedom; its standard errors are a lower limit of the real uncertainty.</p>
    `;
  }
}

declare global {
  interface HTMLElementTagNameMap {
    'sl-log-terms': SlLogTerms;
  }
}
