import { expect, fixture, html, waitUntil } from '@open-wc/testing';
import { assumptionSensitivity, computeBudget, evaluateBudgetDocument, sweepFilterR } from '../../../src/index';
import { EXAMPLES } from '../../../web/examples';
import { AnalysisRunner, analysisWorker } from '../../../web/compute/analysis-runner';
import '../../../web/components/sl-sensitivity-panel';
import '../../../web/components/sl-r-sweep-panel';
import type { SlSensitivityPanel } from '../../../web/components/sl-sensitivity-panel';
import type { SlRSweepPanel } from '../../../web/components/sl-r-sweep-panel';

const ORCHARD = 0, WAREHOUSE = 2;

/** A runner whose workers are counted, so a test can tell the work left the page's thread. */
function countingRunner(): { runner: AnalysisRunner; made: () => number } {
  let made = 0;
  return { runner: new AnalysisRunner(() => { made++; return analysisWorker(); }), made: () => made };
}

describe('the sensitivity of the assumptions on the page', () => {
  it('ranks every assumed value and a ticked row in a worker, as the engine does, with a bar per entry (largest first)', async () => {
    const doc = structuredClone(EXAMPLES[WAREHOUSE].document);
    const el = await fixture<SlSensitivityPanel>(html`<sl-sensitivity-panel .document=${doc}></sl-sensitivity-panel>`);
    const { runner, made } = countingRunner();
    el.runner = runner;
    const q = <T extends Element>(s: string) => el.shadowRoot!.querySelector<T>(s)!;
    const extra = [...el.shadowRoot!.querySelectorAll<HTMLInputElement>('input[name=row]')].find((b) => !b.disabled)!;
    extra.click();
    const high = q<HTMLInputElement>('#high');
    high.value = '3';
    high.dispatchEvent(new Event('change'));
    q<HTMLButtonElement>('button[type=submit]').click();
    await waitUntil(() => el.shadowRoot!.querySelector('#sensitivity'), 'no sensitivity table', { timeout: 60_000 });
    expect(made()).to.equal(1);
    const expected = assumptionSensitivity(evaluateBudgetDocument(doc).input!, { rows: [extra.value], range: [0.5, 3] });
    const rows = [...el.shadowRoot!.querySelectorAll('#sensitivity tbody tr')];
    expect(rows.map((r) => `${r.getAttribute('data-target')}|${r.getAttribute('data-requirement')}`))
      .to.deep.equal(expected.map((e) => `${e.target}|${e.requirementId}`));
    expect(rows.map((r) => Number(r.querySelector('[data-value]')!.getAttribute('data-value')))).to.deep.equal(expected.map((e) => e.relativeChange));
    expect(expected.some((e) => e.target === extra.value)).to.equal(true);
    await el.updateComplete;
    const bars = el.barChart!.data.datasets[0].data;
    expect(bars).to.deep.equal(expected.slice(0, 20).map((e) => 100 * e.relativeChange));
    for (let i = 1; i < bars.length; i++) expect(bars[i]).to.be.at.most(bars[i - 1]);
  });

  it('refuses a range that is not 0 < low < high, without running anything', async () => {
    const el = await fixture<SlSensitivityPanel>(html`<sl-sensitivity-panel .document=${structuredClone(EXAMPLES[WAREHOUSE].document)}></sl-sensitivity-panel>`);
    const { runner, made } = countingRunner();
    el.runner = runner;
    const low = el.shadowRoot!.querySelector<HTMLInputElement>('#low')!;
    low.value = '4';
    low.dispatchEvent(new Event('change'));
    el.shadowRoot!.querySelector<HTMLButtonElement>('button[type=submit]')!.click();
    await el.updateComplete;
    expect(el.shadowRoot!.querySelector('[role=alert]')!.textContent).to.contain('0 < low < high');
    expect(made()).to.equal(0);
  });
});

describe('the R sweep on the page', () => {
  it('plots actual and believed worst per requirement against the R scale on a log axis, x1 marked, as the engine computes them', async () => {
    const doc = structuredClone(EXAMPLES[ORCHARD].document);
    const el = await fixture<SlRSweepPanel>(html`<sl-r-sweep-panel .document=${doc}></sl-r-sweep-panel>`);
    const { runner, made } = countingRunner();
    el.runner = runner;
    const select = el.shadowRoot!.querySelector<HTMLSelectElement>('#sensor')!;
    select.value = 'gnss';
    select.dispatchEvent(new Event('change'));
    el.shadowRoot!.querySelector<HTMLButtonElement>('button[type=submit]')!.click();
    await waitUntil(() => el.plots.length > 0 && el.plots.every((p) => p.chart), 'no R-sweep plot', { timeout: 60_000 });
    expect(made()).to.equal(1);
    const input = evaluateBudgetDocument(doc).input!;
    const sweep = sweepFilterR(input, computeBudget(input, { contributions: false }), 'gnss');
    expect(el.plots.length).to.equal(sweep.points[0].values.length);
    el.plots.forEach((p, i) => {
      const chart = p.chart!;
      expect(chart.options.scales!.x!.type).to.equal('logarithmic');
      expect(chart.data.labels).to.deep.equal(sweep.points.map((s) => s.factor));
      expect(chart.data.datasets[0].data).to.deep.equal(sweep.points.map((s) => s.values[i].actualWorst));
      expect(chart.data.datasets[1].data).to.deep.equal(sweep.points.map((s) => s.values[i].believedWorst));
      const band = chart.options.plugins!.slOutageBands!.bands[0];
      expect(band.startS < 1 && band.endS > 1).to.equal(true);
    });
    // Filter otherwise equal to the truth: the smallest actual worst is at x1 (Gelb, Applied Optimal Estimation, 1974, §7.2).
    expect(el.shadowRoot!.querySelector('.best')!.textContent).to.contain('×1;');
    expect(el.shadowRoot!.querySelector('.older')).to.equal(null);
    // An edit after the sweep leaves the plots up, marked as from the budget before it.
    el.document = structuredClone(doc);
    await el.updateComplete;
    expect(el.shadowRoot!.querySelector('.older')!.textContent).to.contain('before its latest edit');
    expect(el.plots.length).to.equal(sweep.points[0].values.length);
  });
});
