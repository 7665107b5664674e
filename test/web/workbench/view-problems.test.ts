import { expect } from '@open-wc/testing';
import type { SlSuiteEditor } from '../../../web/components/sl-suite-editor';
import { deepQuery, settle, workbench } from './helpers';

const outageOutsideMission = (d: import('../../../src/document').BudgetDocument) => {
  d.sensors[2].outages![0].start = { value: 5000, unit: 's' };
  d.sensors[2].outages![0].end = { value: 5100, unit: 's' };
};

describe('problems the view reports', () => {
  it('a blocking problem is shown at the top of the workbench and leads to its sensor', async () => {
    const { el } = await workbench(3, (d) => (d.sensors[2].rate = { value: 1e9, unit: 'Hz' }));
    expect(el.view!.blocked!.path).to.equal('sensors[2].rate.value');
    const top = el.shadowRoot!.querySelector('.alerts .blocked')!;
    expect(top.textContent).to.contain('1000000000 Hz is more than 100000 Hz');
    (top.querySelector('button') as HTMLButtonElement).click();
    await settle(el);
    expect((deepQuery(el, 'sl-suite-editor') as SlSuiteEditor).selected).to.equal(2);
  });

  it('an item the analysis refuses is left out, the rest computes, and its reason is shown next to it', async () => {
    const { el } = await workbench(3, outageOutsideMission);
    expect(el.view!.blocked).to.equal(undefined);
    expect(el.view!.result).to.not.equal(undefined);
    const list = el.shadowRoot!.querySelector('.alerts .omitted')!;
    expect(list.textContent).to.contain('outage');
    (list.querySelector('button') as HTMLButtonElement).click();
    await settle(el);
    expect((deepQuery(el, 'sl-suite-editor') as SlSuiteEditor).selected).to.equal(2);
    const row = deepQuery(el, 'sl-outage-table').shadowRoot!.querySelector('.blocked')!;
    expect(row.textContent).to.contain('must lie within the mission');
  });

  it('items left out of the analysis are listed, and the row is marked in the grid', async () => {
    const { el } = await workbench(1, (d) => (d.sensors[0].sources[1].value = '=nosuchname'));
    const list = el.shadowRoot!.querySelector('.alerts .omitted')!;
    expect(list.textContent).to.contain('row gyro.bi is left out of the analysis');
    expect(deepQuery(el, 'sl-source-grid').shadowRoot!.querySelector('tr.messages .omitted')).to.exist;
  });

  it('the tab of an area with cell errors shows their count', async () => {
    const { el } = await workbench(3, (d) => (d.values!.cruiseSpeed.value = '=1/0'));
    const tab = el.shadowRoot!.querySelector('#tab-values')!;
    expect(tab.textContent).to.match(/⚠\d/);
  });
});
