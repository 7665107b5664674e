import { expect, fixture, html } from '@open-wc/testing';
import '../../../web/components/sl-share-chart';
import type { SlShareChart } from '../../../web/components/sl-share-chart';
import { sharePercent } from '../../../web/charts/share-series';
import { NEUTRAL_COLOUR, SERIES_COLOURS } from '../../../web/styles/palette';
import { exampleView, ORCHARD } from './views';

async function sharesOf(i: number): Promise<SlShareChart> {
  const view = exampleView(i);
  return fixture<SlShareChart>(html`<sl-share-chart .result=${view.result} .outages=${view.plan!.outages}></sl-share-chart>`);
}

describe('the share-of-variance chart', () => {
  it('stacks shares that add up to 100 % at a step', async () => {
    const chart = (await sharesOf(ORCHARD)).charts.chart!;
    const n = exampleView(ORCHARD).result!.series.t_s.length;
    for (const k of [0, Math.floor(n / 3), n - 1]) {
      const sum = chart.data.datasets.reduce((s, d) => s + (d.data[k] ?? 0), 0);
      expect(sum).to.be.closeTo(100, 1e-9);
    }
  });

  it('colours the seven sources with the largest peak share and groups the rest as other sources in grey', async () => {
    const chart = (await sharesOf(ORCHARD)).charts.chart!;
    const sources = Object.keys(exampleView(ORCHARD).result!.contributions.heading);
    expect(sources.length).to.be.greaterThan(7);
    const sets = chart.data.datasets;
    expect(sets).to.have.length(8);
    expect(sets.slice(0, 7).map((d) => d.backgroundColor)).to.deep.equal([...SERIES_COLOURS]);
    expect(sets[7].label).to.equal(`other sources (${sources.length - 7})`);
    expect(sets[7].backgroundColor).to.equal(NEUTRAL_COLOUR);
    const peak = (d: (typeof sets)[number]) => Math.max(...d.data.map((v) => v ?? 0));
    const named = sets.slice(0, 7).map(peak);
    expect(named).to.deep.equal([...named].sort((a, b) => b - a));
  });

  it('switches quantity in the same chart when another is picked', async () => {
    const el = await sharesOf(ORCHARD);
    const chart = el.charts.chart!;
    el.shadowRoot!.querySelector<HTMLButtonElement>('[data-quantity="cross"]')!.click();
    await el.updateComplete;
    expect(el.charts.chart).to.equal(chart);
    const cross = sharePercent(exampleView(ORCHARD).result!.contributions.cross);
    const first = chart.data.datasets[0];
    expect(first.data).to.deep.equal(cross.get(first.label!));
    expect(el.shadowRoot!.querySelector('[data-quantity="cross"]')!.getAttribute('aria-pressed')).to.equal('true');
  });

  it('leaves a share undefined where the total variance is zero', () => {
    expect(sharePercent({ a: [0, 1, 3], b: [0, 3, 1] })).to.deep.equal(new Map([['a', [null, 25, 75]], ['b', [null, 75, 25]]]));
  });
});
