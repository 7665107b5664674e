import { expect, fixture, html, waitUntil } from '@open-wc/testing';
import { evaluateBudgetDocument, longestOutage, sizeSource } from '../../../src/index';
import type { BudgetDocument } from '../../../src/index';
import { minimalDocument } from '../../document/minimal-document';
import '../../../web/components/sl-sizing-panel';
import type { SlSizingPanel } from '../../../web/components/sl-sizing-panel';

/** The minimal test budget with a second, tighter heading requirement and a compass that drops out (invented). */
function doc(): BudgetDocument {
  const d = minimalDocument();
  d.mission.segments[0].duration = { value: 300, unit: 's' };
  d.requirements!.push({
    id: 'tight', quantity: 'heading', level: '1sigma', limit: { value: 0.2, unit: 'deg' },
    window: { start: { value: 50, unit: 's' }, end: { value: 300, unit: 's' } },
  });
  d.sensors.push({
    id: 'compass', kind: 'compass', rate: { value: 5, unit: 'Hz' },
    outages: [{ id: 'shed', start: { value: 100, unit: 's' }, end: { value: 120, unit: 's' } }],
    sources: [{ id: 'white', kind: 'white-noise', value: 0.5, unit: 'deg', provenance: 'invented', assumed: false }],
  });
  return d;
}

async function panel(d: BudgetDocument) {
  const el = await fixture<SlSizingPanel>(html`<sl-sizing-panel .document=${d} .requirementIds=${d.requirements!.map((r) => r.id)}></sl-sizing-panel>`);
  const q = <T extends Element>(s: string) => el.shadowRoot!.querySelector<T>(s)!;
  return { el, q };
}

async function choose(q: <T extends Element>(s: string) => T, ids: string[]) {
  for (const box of q<HTMLFieldSetElement>('fieldset').querySelectorAll<HTMLInputElement>('input')) {
    if (box.checked !== ids.includes(box.value)) box.click();
  }
}

describe('sizing on the page', () => {
  it('finds the largest allowable value for each requirement in a worker, names the binding one and draws the curve with its limits', async () => {
    const d = doc();
    const { el, q } = await panel(d);
    const row = q<HTMLSelectElement>('#row');
    row.value = 'gyro.bi';
    row.dispatchEvent(new Event('change'));
    await choose(q, ['heading', 'tight']);
    q<HTMLButtonElement>('button[type=submit]').click();
    await waitUntil(() => el.shadowRoot!.querySelector('#sized'), 'no sizing result', { timeout: 60_000 });
    const input = evaluateBudgetDocument(d).input!;
    const expected = sizeSource(input, 'tight', 'gyro.bi');
    expect(q('#binding').textContent).to.contain('tight');
    const cells = [...q('#sized').querySelectorAll('tr.binding td')].map((c) => c.textContent!.trim());
    expect(cells[0]).to.equal('tight');
    const shown = Number(cells[1].split(' ')[0]);
    expect(Math.abs(shown - expected.largestPassing)).to.be.at.most(expected.tolerance * 1.01 + 1e-12);
    const svg = q('.chart svg');
    expect(svg.textContent).to.contain('tight limit 0.2 deg');
    expect(svg.textContent).to.contain('heading limit 5 deg');
  });

  it('gives the longest outage of an aiding sensor that still holds each requirement', async () => {
    const d = doc();
    const { el, q } = await panel(d);
    const mode = q<HTMLSelectElement>('#mode');
    mode.value = 'outage';
    mode.dispatchEvent(new Event('change'));
    await el.updateComplete;
    await choose(q, ['tight']);
    q<HTMLButtonElement>('button[type=submit]').click();
    await waitUntil(() => el.shadowRoot!.querySelector('#longest'), 'no outage result', { timeout: 60_000 });
    const [expected] = longestOutage(evaluateBudgetDocument(d).input!, { sensorId: 'compass', outageIndex: 0 }, ['tight']);
    const text = q('#longest tbody td.num').textContent!.trim();
    expect(expected.holdsToEnd || expected.failsWithout).to.equal(false);
    expect(Math.abs(Number(text.split(' ')[0]) - expected.longestS), text).to.be.at.most(expected.toleranceS + 0.05);
    expect(q('.chart svg').textContent).to.contain('length of the outage (s)');
  });
});
