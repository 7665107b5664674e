import { expect, fixture, html } from '@open-wc/testing';
import '../../../web/components/sl-verdicts';
import type { SlVerdicts } from '../../../web/components/sl-verdicts';
import { outageSentence } from '../../../web/charts/findings-text';
import type { RequirementEntry } from '../../../web/charts/result-shapes';
import { exampleView, HARBOUR, ORCHARD, shadow } from './views';

const text = (el: Element) => el.textContent!.replace(/\s+/g, ' ').trim();

async function verdictsOf(i: number, provisional = false): Promise<SlVerdicts> {
  return fixture<SlVerdicts>(html`<sl-verdicts .result=${exampleView(i).result} ?provisional=${provisional}></sl-verdicts>`);
}

/** The orchard's result with the alley requirement's worst value set by hand, so the expected text follows from it alone. */
function orchardWithWorst(worst: number, worstTS: number) {
  const result = structuredClone(exampleView(ORCHARD).result!);
  const alley = result.requirements.find((r) => r.id === 'alleyKeeping')!;
  Object.assign(alley, { worst, worst_t_s: worstTS, margin: alley.limit - worst });
  return result;
}

describe('the verdicts', () => {
  it('gives each requirement a word and an icon, with its worst value and margin in the limit\'s unit', async () => {
    const el = await fixture<SlVerdicts>(html`<sl-verdicts .result=${orchardWithWorst(0.45816, 329.9)}></sl-verdicts>`);
    const alley = shadow(el).querySelector('[data-requirement="alleyKeeping"]')!;
    const heading = shadow(el).querySelector('[data-requirement="heading"]')!;
    expect(alley.getAttribute('data-verdict')).to.equal('fail');
    expect(alley.querySelector('.word')!.textContent!.trim()).to.equal('Fail');
    expect(alley.querySelector('.word svg')).to.exist;
    expect(heading.querySelector('.word')!.textContent!.trim()).to.equal('Pass');
    // Worst set to 0.45816 m against the 0.25 m limit: margin 0.25 - 0.45816 = -0.20816 m, shown to 3 significant digits.
    expect(text(alley)).to.contain('worst 0.458 m at 329.9 s · margin -0.208 m (over the limit)');
    expect(text(shadow(el).querySelector('h2')!)).to.contain('1 of 2 hold');
  });

  it('says in words how long a requirement holds after each outage begins', async () => {
    const result = structuredClone(exampleView(ORCHARD).result!);
    const row3 = result.requirements.find((r) => r.id === 'alleyKeeping')!.outages.find((o) => o.outage === 'canopyRow3')!;
    row3.timeToExceed_s = 57.38; // set by hand: shown to 3 significant digits
    const el = await fixture<SlVerdicts>(html`<sl-verdicts .result=${result}></sl-verdicts>`);
    const alley = shadow(el).querySelector('[data-requirement="alleyKeeping"]')!;
    expect(text(alley.querySelector('[data-outage="canopyRow3"]')!)).to.equal(
      'cross-track stays within 0.25 m (95 %) for 57.4 s after the gnss outage "canopyRow3" begins (the outage lasts 90 s)',
    );
    expect(text(alley.querySelector('[data-outage="canopyRow2"]')!)).to.equal(
      'cross-track stays within 0.25 m (95 %) throughout the gnss outage "canopyRow2" (30 s)',
    );
  });

  it('names the sensor of each outage when two sensors are out at once', async () => {
    const el = await verdictsOf(HARBOUR);
    const lines = [...shadow(el).querySelectorAll('[data-requirement="bridgeHeading"] [data-outage]')].map(text);
    expect(lines).to.deep.equal([
      'heading stays within 1 deg (95 %) throughout the gnss outage "bridge" (40 s)',
      'heading stays within 1 deg (95 %) throughout the compass outage "bridge" (60 s)',
    ]);
  });

  it('says when a requirement is already broken as an outage begins', () => {
    const req: RequirementEntry = {
      id: 'r', quantity: 'horizontal', level: '95%', limit: 2, unit: 'm', verdict: 'fail', margin: -1, worst: 3, worst_t_s: 5, window_s: [0, 10],
      outages: [{ sensor: 'gnss', outage: 'tunnel', start_s: 2, end_s: 8, timeToExceed_s: 0 }],
    };
    expect(outageSentence(req, req.outages[0])).to.equal('horizontal position is already beyond 2 m (95 %) when the gnss outage "tunnel" begins');
  });

  it('marks every verdict provisional when asked', async () => {
    const el = await verdictsOf(ORCHARD, true);
    expect(shadow(el).querySelectorAll('li.verdict .provisional').length).to.equal(2);
  });
});
