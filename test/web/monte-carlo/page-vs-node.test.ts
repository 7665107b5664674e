import { expect, fixture, html, waitUntil } from '@open-wc/testing';
import { parseBudgetDocument, simulationJson, type BudgetDocument } from '../../../src/index';
import { MonteCarloRunner, workerCount } from '../../../web/monte-carlo/monte-carlo-runner';
import '../../../web/components/sl-monte-carlo-panel';
import type { SlMonteCarloPanel } from '../../../web/components/sl-monte-carlo-panel';

/** A file of the repository, as the test server serves it. */
async function repoText(path: string): Promise<string> {
  const r = await fetch(`/${path}`);
  if (!r.ok) throw new Error(`cannot fetch ${path}: ${r.status}`);
  return r.text();
}

async function linearGnss(): Promise<BudgetDocument> {
  return parseBudgetDocument(await repoText('test/fixtures/simulation/linear-gnss.json'), 'linear-gnss.json').document;
}

describe('the Monte Carlo check on the page', () => {
  it('gives, in 3 web workers, the numbers sigma-ledger simulate prints in Node for the same seed (130 runs; simulated sums bit for bit)', async () => {
    // The reference is the command line's output, recomputed in Node by test/simulation/page-reference.test.ts.
    const reference = JSON.parse(await repoText('test/fixtures/simulation/linear-gnss-seed-3-runs-130.json'));
    let last = 0;
    const study = await new MonteCarloRunner().run(await linearGnss(), 3, 130, (done) => (last = done), 3);
    expect(last).to.equal(130);
    const page = JSON.parse(JSON.stringify(simulationJson({ budget: { file: '', sha256: reference.budget.sha256 }, seed: 3, runs: 130 }, study.stats, study.flags, 20)));
    delete page.budget.file;
    // Every simulated number (RMS, mean, the filter's σ, the NEES averages), the budget's σ, the verdict and the
    // flags agree bit for bit. The χ² quantiles of the bounds come from jstat's iterative inverse, whose last bits
    // follow the engine's Math.pow: Node 20's V8 and Chromium's differ there by about 1e-15 (measured), so the
    // bounds are compared to 1e-12 relative and everything else exactly.
    const bounds = new Set(['bandLow', 'bandHigh', 'low', 'high']);
    const strip = (json: any) => ({
      ...json,
      quantities: json.quantities.map((q: any) => Object.fromEntries(Object.entries(q).filter(([k]) => !bounds.has(k)))),
      nees: json.nees.map((g: any) => Object.fromEntries(Object.entries(g).filter(([k]) => !bounds.has(k)))),
    });
    expect(strip(page)).to.deep.equal(strip(reference));
    expect(page.quantities[0].rms.length).to.equal(reference.t_s.length);
    const groups = [...page.quantities.map((q: any, i: number) => [q, reference.quantities[i]]), ...page.nees.map((g: any, i: number) => [g, reference.nees[i]])];
    for (const [mine, theirs] of groups) {
      for (const key of bounds) {
        if (!(key in theirs)) continue;
        (theirs[key] as number[]).forEach((v, k) => expect(Math.abs(mine[key][k] - v)).to.be.at.most(1e-12 * Math.abs(v), `${mine.id}.${key}[${k}]`));
      }
    }
  });

  it('sizes the workers to the cores the browser reports, at most one per block of 64 runs', () => {
    expect(workerCount(1000, 2)).to.equal(2);
    expect(workerCount(1000, 8)).to.equal(8);
    expect(workerCount(100, 8)).to.equal(2);
    expect(workerCount(1000, 0)).to.equal(2);
  });

  it('runs from its own tab panel with progress, then shows the verdict, RMS and NEES charts and the caution; cancel stops a run', async () => {
    const el = await fixture<SlMonteCarloPanel>(html`<sl-monte-carlo-panel .document=${await linearGnss()}></sl-monte-carlo-panel>`);
    const q = <T extends Element>(s: string) => el.shadowRoot!.querySelector<T>(s);
    const runs = q<HTMLInputElement>('#runs')!;
    runs.value = '64';
    runs.dispatchEvent(new Event('change'));
    q<HTMLButtonElement>('#start')!.click();
    await waitUntil(() => q('progress') !== null, 'a progress bar while running');
    await waitUntil(() => q('#verdict') !== null, 'the verdict', { timeout: 60000 });
    expect(q('#verdict')!.textContent).to.equal('checked by 64 Monte Carlo runs: consistent within bounds');
    expect(q('#rms-charts')!.querySelectorAll('svg').length).to.be.greaterThan(0);
    expect(q('#nees-charts')!.querySelectorAll('svg').length).to.be.greaterThan(0);
    expect(q('#rms-charts')!.textContent).to.contain('95 % band of the RMS');
    expect(q('.caution')!.textContent).to.contain('not a safety case');
    runs.value = '5000';
    runs.dispatchEvent(new Event('change'));
    q<HTMLButtonElement>('#start')!.click();
    await waitUntil(() => q('#cancel') !== null, 'a cancel button while running');
    q<HTMLButtonElement>('#cancel')!.click();
    await waitUntil(() => q('[role="alert"]') !== null, 'a note that it was cancelled');
    expect(q('[role="alert"]')!.textContent).to.contain('Cancelled');
    expect(q('progress')).to.equal(null);
    expect(q('#verdict')!.textContent).to.contain('64 Monte Carlo runs');
  });
});
