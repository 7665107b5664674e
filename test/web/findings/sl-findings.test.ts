import { expect, fixture, html } from '@open-wc/testing';
import '../../../web/components/sl-findings';
import type { SlFindings } from '../../../web/components/sl-findings';
import type { SlSigmaChart } from '../../../web/components/sl-sigma-chart';
import { editedView, exampleView, ORCHARD, shadow } from './views';

async function findingsOf(view = exampleView(ORCHARD)): Promise<SlFindings> {
  return fixture<SlFindings>(html`<sl-findings .view=${view} status="complete"></sl-findings>`);
}

function headingChart(el: SlFindings): SlSigmaChart {
  return shadow(el).querySelector<SlSigmaChart>('sl-sigma-chart[kind="heading"]')!;
}

describe('the findings', () => {
  it('plots the result\'s heading σ as the first dataset of the heading chart', async () => {
    const el = await findingsOf();
    const chart = headingChart(el);
    await chart.updateComplete;
    const series = exampleView(ORCHARD).result!.series;
    const data = chart.charts.chart!.data.datasets[0].data;
    expect(data.length).to.equal(series.t_s.length);
    expect(data).to.deep.equal(series.heading_sigma_deg);
    expect(chart.charts.chart!.data.labels).to.deep.equal(series.t_s);
  });

  it('updates the same chart in place when a recompute brings a changed value', async () => {
    const el = await findingsOf();
    const chart = headingChart(el);
    await chart.updateComplete;
    const before = chart.charts.chart!;
    const firstBefore = [...before.data.datasets[0].data];
    // Ten times the gyro's angle random walk must raise heading σ somewhere.
    const noisier = editedView(ORCHARD, (d) => (d.sensors[0].sources[0].value = 0.04));
    el.view = noisier;
    await el.updateComplete;
    await chart.updateComplete;
    expect(chart.charts.chart).to.equal(before);
    expect(before.data.datasets[0].data).to.deep.equal(noisier.result!.series.heading_sigma_deg);
    expect(before.data.datasets[0].data).not.to.deep.equal(firstBefore);
  });

  it('marks stale results while recomputing and clears the mark when fresh ones arrive', async () => {
    const el = await findingsOf();
    el.stale = true;
    el.status = 'pending';
    await el.updateComplete;
    expect(el.hasAttribute('data-stale')).to.equal(true);
    expect(shadow(el).querySelector('.stale-label')!.textContent).to.contain('stale — recomputing');
    expect(headingChart(el)).to.exist;
    el.stale = false;
    el.status = 'complete';
    await el.updateComplete;
    expect(el.hasAttribute('data-stale')).to.equal(false);
    expect(shadow(el).querySelector('.stale-label')).to.equal(null);
  });

  it('shows why nothing was computed, with the document path, for a blocked view', async () => {
    // A refused outage is now left out in place; a rate beyond the work limits still blocks the whole run.
    const blocked = editedView(ORCHARD, (d) => (d.sensors[2].rate = { value: 1e9, unit: 'Hz' }));
    const el = await findingsOf(blocked);
    const note = shadow(el).querySelector('.blocked')!;
    expect(note.textContent).to.contain(blocked.blocked!.message);
    expect(note.querySelector('code')!.textContent).to.equal('sensors[2].rate.value');
    expect(shadow(el).querySelector('sl-sigma-chart')).to.equal(null);
  });

  it('warns that the results are partial and marks the verdicts provisional when cells have errors', async () => {
    const partial = editedView(ORCHARD, (d) => (d.sensors[0].sources[0].value = '=noSuchName*2'));
    const el = await findingsOf(partial);
    const warning = shadow(el).querySelector('.partial')!.textContent!.replace(/\s+/g, ' ');
    expect(warning).to.contain(`Partial: ${partial.cellErrors.length} cell`);
    for (const item of partial.omitted) expect(warning).to.contain(item.what);
    const verdicts = shadow(el).querySelector('sl-verdicts')!;
    await verdicts.updateComplete;
    expect(verdicts.provisional).to.equal(true);
    expect(shadow(verdicts).querySelectorAll('li.verdict .provisional').length).to.equal(partial.result!.requirements.length);
  });

  it('opens each tab on click and keeps the ones already opened', async () => {
    const el = await findingsOf();
    for (const [tab, tag] of [['shares', 'sl-share-chart'], ['checkpoint', 'sl-checkpoint-table'], ['calibration', 'sl-calibration-chart'], ['noise', 'sl-noise-ledger']]) {
      shadow(el).querySelector<HTMLButtonElement>(`[data-tab="${tab}"]`)!.click();
      await el.updateComplete;
      const panel = shadow(el).querySelector(`#panel-${tab}`)!;
      expect(panel.hasAttribute('hidden')).to.equal(false);
      expect(panel.querySelector(tag), tag).to.exist;
    }
    expect(shadow(el).querySelector('#panel-time')!.hasAttribute('hidden')).to.equal(true);
  });
});
