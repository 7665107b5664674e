import { expect, fixture, html } from '@open-wc/testing';
import '../../../web/components/sl-checkpoint-table';
import type { SlCheckpointTable } from '../../../web/components/sl-checkpoint-table';
import { checkpointsOf } from '../../../web/charts/result-shapes';
import { num } from '../../../web/charts/findings-text';
import { exampleView, ORCHARD } from './views';

describe('the checkpoint table', () => {
  it('lists each quantity\'s total σ and its sources by share, with σ and percent', async () => {
    const checkpoints = structuredClone(checkpointsOf(exampleView(ORCHARD).result!));
    // Set by hand, so the expected text follows from these numbers alone: total 0.1891 deg, and the largest
    // source at 63.8 % of the variance, whose σ is then 0.1891 · √0.638 = 0.1510 deg.
    const budget = checkpoints[0].budgets.find((b) => b.quantity === 'heading')!;
    budget.sigma = 0.1891;
    Object.assign(budget.sources[0], { sigma: 0.1891 * Math.sqrt(0.638), share: 0.638 });
    const el = await fixture<SlCheckpointTable>(html`<sl-checkpoint-table .checkpoints=${checkpoints}></sl-checkpoint-table>`);
    const heading = el.shadowRoot!.querySelector('tbody[data-quantity="heading"]')!;
    expect(heading.querySelector('tr')!.textContent).to.contain('0.189 deg');
    const rows = [...heading.querySelectorAll('tr[data-source]')];
    expect(rows[0].getAttribute('data-source')).to.equal('gyro.bi');
    expect(rows[0].textContent!.replace(/\s+/g, ' ')).to.contain('0.151 deg 63.8 %');
    expect((rows[0].querySelector('.bar div') as HTMLElement).style.width).to.equal('63.8%');
    const shares = rows.map((r) => Number(r.children[2].textContent!.replace(' %', '')));
    expect(shares).to.deep.equal([...shares].sort((a, b) => b - a));
  });

  it('shows the checkpoint picked', async () => {
    const checkpoints = checkpointsOf(exampleView(ORCHARD).result!);
    const el = await fixture<SlCheckpointTable>(html`<sl-checkpoint-table .checkpoints=${checkpoints}></sl-checkpoint-table>`);
    const select = el.shadowRoot!.querySelector('select')!;
    select.value = 'row4Start';
    select.dispatchEvent(new Event('change'));
    await el.updateComplete;
    const sigma = checkpoints[1].budgets[0].sigma;
    expect(el.shadowRoot!.querySelector('tbody[data-quantity="heading"] tr')!.textContent).to.contain(`${num(sigma)} deg`);
  });

  it('says so when the budget has no checkpoints', async () => {
    const el = await fixture<SlCheckpointTable>(html`<sl-checkpoint-table .checkpoints=${[]}></sl-checkpoint-table>`);
    expect(el.shadowRoot!.textContent).to.contain('no checkpoints');
  });
});
