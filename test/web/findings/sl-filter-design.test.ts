import { expect, fixture, html } from '@open-wc/testing';
import '../../../web/components/sl-filter-design';
import type { SlFilterDesign } from '../../../web/components/sl-filter-design';
import { exampleView, shadow } from './views';

const ANNOTATED = 3;
const text = (el: Element) => el.textContent!.replace(/\s+/g, ' ').trim();

describe('the filter as tuned versus truth', () => {
  it('says per quantity what the filter believes against the actual error, and judges requirements on the actual error', async () => {
    const design = exampleView(ANNOTATED).result!.filterDesign!;
    const el = await fixture<SlFilterDesign>(html`<sl-filter-design .design=${design}></sl-filter-design>`);
    const heading = shadow(el).querySelector('[data-quantity="heading"]')!;
    // Same wording as the run summary (test/golden/annotated-example.summary.txt).
    expect(text(heading)).to.match(/heading: the filter believes [\d.]+ deg, the actual error is [\d.]+ deg: overconfident by [\d.]+×/);
    const req = shadow(el).querySelector('[data-requirement="greenhousePosition"]')!;
    expect(req.getAttribute('data-verdict')).to.equal(design.actual.requirements[0].verdict);
    expect(text(req)).to.contain('on the actual error');
    expect(text(shadow(el).querySelector('p')!)).to.contain('gnss.multipath');
  });

  it('shows nothing without a filter design', async () => {
    const el = await fixture<SlFilterDesign>(html`<sl-filter-design></sl-filter-design>`);
    expect(shadow(el).querySelector('h2')).to.equal(null);
  });
});

describe('the σ plots with a filter design', () => {
  it('draw the believed (dotted) and the actual heading σ beside the optimal one, from the view\'s series', async () => {
    const { sigmaDatasets } = await import('../../../web/charts/sigma-series');
    const view = exampleView(ANNOTATED);
    const sets = sigmaDatasets(view, 'heading');
    const believed = sets.find((d) => d.label === 'heading 1σ, believed by the filter as tuned')!;
    const actual = sets.find((d) => d.label === 'heading 1σ, actual with the filter as tuned')!;
    expect(believed.data).to.deep.equal(view.result!.filterDesign!.believed.series.heading_sigma_deg);
    expect(actual.data).to.deep.equal(view.result!.filterDesign!.actual.series.heading_sigma_deg);
    expect(believed.borderDash.length).to.equal(2);
    expect(sets.filter((d) => d.label.includes('filter as tuned')).length).to.equal(2);
  });
});
