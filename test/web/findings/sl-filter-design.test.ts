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
