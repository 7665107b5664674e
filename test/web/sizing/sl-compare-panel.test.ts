import { expect, fixture, html, waitUntil } from '@open-wc/testing';
import { compareCandidates } from '../../../src/index';
import '../../../web/components/sl-compare-panel';
import type { SlComparePanel } from '../../../web/components/sl-compare-panel';
import { gradeCandidates } from '../../compare/grade-candidates';

describe('candidates compared on the page', () => {
  it('runs every candidate in the worker: side by side, the cheapest passing, a chart each', async () => {
    const d = gradeCandidates({ coarse: 0.5, fine: 0.2 });
    const el = await fixture<SlComparePanel>(html`<sl-compare-panel .document=${d}></sl-compare-panel>`);
    const root = el.shadowRoot!;
    root.querySelector<HTMLButtonElement>('button')!.click();
    await waitUntil(() => root.querySelector('#compare-gyro'), 'the comparison table appears', { timeout: 60000 });
    const expected = compareCandidates(d).slots[0];
    const heads = [...root.querySelectorAll('#compare-gyro thead th')].map((th) => th.textContent!.trim());
    expect(heads).to.deep.equal(['', 'consumerMems', 'tactical', 'navigation']);
    const verdictRow = [...root.querySelectorAll('#compare-gyro tbody tr')].find((tr) =>
      tr.textContent!.includes('coarse: heading'),
    )!;
    expect([...verdictRow.querySelectorAll('td')].slice(1).map((td) => td.textContent)).to.deep.equal([
      'FAIL',
      'PASS',
      'PASS',
    ]);
    // Heading σ at 60 s: tactical 0.1668° passes 0.2°, so it is the cheapest that passes
    // (docs/checks.md §4.1, §4.2).
    expect(expected.cheapestPassing).to.equal('tactical');
    expect(root.querySelector('#cheapest-gyro')!.textContent).to.contain('tactical (4000 EUR)');
    expect(root.querySelector('th.best')!.textContent).to.equal('tactical');
    expect(root.querySelectorAll('.chart svg').length).to.equal(2);
  });

  it('says how to add candidates when the budget has none', async () => {
    const d = gradeCandidates();
    delete d.candidates;
    const el = await fixture<SlComparePanel>(html`<sl-compare-panel .document=${d}></sl-compare-panel>`);
    expect(el.shadowRoot!.textContent).to.contain('No candidates in this budget');
  });
});
