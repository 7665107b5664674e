import { expect } from '@open-wc/testing';
import { allanPercentageError } from '../../../src/allan/percentage-error';
import type { SlLogAllanChart } from '../../../web/components/sl-log-allan-chart';
import { chooseFile, deepQuery, logImport, runAndWait, settle, whiteNoiseLog } from './helpers';

// White noise of per-sample sigma σ at rate f has angle random walk N = σ/√f
// (IEEE Std 952-1997 Annex C; docs/checks.md §2): 0.05 deg/s at 100 Hz gives
// 0.005 deg/√s = 0.3 deg/√h (√h = 60 √s).
const SIGMA_DEG_S = 0.05, RATE_HZ = 100, DURATION_S = 200;
const EXPECTED_ARW = (SIGMA_DEG_S / Math.sqrt(RATE_HZ)) * 60;

describe('the Allan import of a sensor log', () => {
  it('reads a white-noise log in the worker and finds the angle random walk σ/√f within three percentage errors', async () => {
    const { el, store, original } = await logImport();
    await chooseFile(el, whiteNoiseLog('white-100hz.csv', SIGMA_DEG_S, RATE_HZ, DURATION_S));
    expect(el.header?.columns).to.deep.equal(['time', 'gyro_z']);
    await runAndWait(el);
    expect(el.jobs.status).to.equal('complete');
    const arw = el.allan!.result.analysis.terms.find((t) => t.id === 'random-walk' && t.method === 'slope')!;
    expect(arw.unit).to.equal('deg/√h');
    // The read-off is at τ = 1 s (m = 100 samples): δ = 1/√(2(N/m − 1)) = 5.0 % (IEEE Std 952 percentage
    // error, src/allan/percentage-error.ts); a line fitted over the −½ region scatters less than one point,
    // so 3δ is a safe bound, and the sample σ's own scatter (1/√(2N) = 0.5 %) is well inside it.
    const delta = allanPercentageError(RATE_HZ * DURATION_S, RATE_HZ);
    expect(Math.abs(arw.value / EXPECTED_ARW - 1)).to.be.below(3 * delta);
    expect(store.document).to.deep.equal(original);
    expect(store.canUndo).to.equal(false);
  });

  it('shows the times, the log-log chart with band, fitted terms and sum, the terms table and the bounds note', async () => {
    const { el } = await logImport();
    await chooseFile(el, whiteNoiseLog('white.csv', SIGMA_DEG_S, RATE_HZ, 60));
    await runAndWait(el);
    expect(deepQuery(el, '#times').textContent).to.match(/6,000 samples at 100 Hz.*parse \S+ s, compute \S+ s/s);
    const chart = deepQuery<SlLogAllanChart>(el, 'sl-log-allan-chart');
    await settle(chart);
    const c = chart.charts.chart!;
    expect(c.options.scales!.x!.type).to.equal('logarithmic');
    expect(c.options.scales!.y!.type).to.equal('logarithmic');
    expect(c.options.animation).to.equal(false);
    const labels = c.data.datasets.map((d) => d.label);
    expect(labels).to.include.members(['IEEE Std 952 band σ(1 ± δ)', 'overlapping Allan deviation', 'sum of fitted terms', 'angle random walk (fit)']);
    expect(chart.shadowRoot!.textContent).to.match(/understate/);
    const rows = [...deepQuery(el, 'sl-log-terms').shadowRoot!.querySelectorAll('tbody tr')];
    expect(rows).to.have.length(10);
    expect(rows.map((r) => r.textContent)).to.satisfy((t: string[]) => t.some((x) => /upper bound/.test(x!)));
    expect(deepQuery(el, 'sl-log-terms').shadowRoot!.textContent).to.match(/no floor is seen/);
  });

  it('takes a dropped file as well as a chosen one', async () => {
    const { el } = await logImport();
    const data = new DataTransfer();
    data.items.add(whiteNoiseLog('dropped.tsv', SIGMA_DEG_S, RATE_HZ, 10));
    deepQuery(el, '.zone').dispatchEvent(new DragEvent('drop', { dataTransfer: data, bubbles: true, cancelable: true }));
    await settle(el);
    const start = performance.now();
    while (el.jobs.status === 'pending' && performance.now() - start < 10000) await new Promise((r) => setTimeout(r, 20));
    expect(el.header?.fileName).to.equal('dropped.tsv');
  });
});
