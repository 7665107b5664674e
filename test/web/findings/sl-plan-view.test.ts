import { expect, fixture, html } from '@open-wc/testing';
import '../../../web/components/sl-plan-view';
import type { SlPlanView } from '../../../web/components/sl-plan-view';
import { planGeometry, roundLength } from '../../../web/charts/plan-geometry';
import { exampleView, ORCHARD, WAREHOUSE } from './views';

async function planOf(i: number): Promise<SlPlanView> {
  return fixture<SlPlanView>(html`<sl-plan-view .plan=${exampleView(i).plan}></sl-plan-view>`);
}

describe('the plan view', () => {
  it('draws the whole path and one labelled marker per landmark', async () => {
    const el = await planOf(WAREHOUSE);
    const plan = exampleView(WAREHOUSE).plan!;
    const points = el.shadowRoot!.querySelector('polyline.path')!.getAttribute('points')!.split(' ');
    expect(points).to.have.length(plan.north.length);
    const markers = [...el.shadowRoot!.querySelectorAll('[data-landmark]')];
    expect(markers).to.have.length(7);
    expect(markers.map((m) => m.getAttribute('data-landmark'))).to.deep.equal(plan.landmarks.map((l) => l.id));
    const texts = [...el.shadowRoot!.querySelectorAll('text')].map((t) => t.textContent);
    for (const l of plan.landmarks) expect(texts).to.include(l.id);
  });

  it('highlights the stretch driven during each outage and names its sensor', async () => {
    const el = await planOf(ORCHARD);
    const stretches = [...el.shadowRoot!.querySelectorAll('polyline.outage')].map((p) => p.getAttribute('data-outage'));
    expect(stretches).to.have.members(['canopyRow2', 'canopyRow3', 'canopyRow4']);
    const texts = [...el.shadowRoot!.querySelectorAll('text')].map((t) => t.textContent);
    expect(texts).to.include('gnss outage canopyRow3');
    expect(el.shadowRoot!.querySelector('ul')!.textContent).to.contain('driven while gnss is out');
  });

  it('puts outage labels clear of each other and of the track, each example', async () => {
    for (const i of [ORCHARD, WAREHOUSE]) {
      const el = await planOf(i);
      const svgEl = el.shadowRoot!.querySelector('svg')!;
      const boxes = [...el.shadowRoot!.querySelectorAll<SVGTextElement>('text.outage-label')].map((t) => t.getBBox());
      const track = el.shadowRoot!.querySelector('polyline.path')!.getAttribute('points')!.split(' ').map((p) => p.split(',').map(Number));
      boxes.forEach((a, k) => {
        for (const b of boxes.slice(k + 1)) expect(a.y + a.height <= b.y + 0.5 || b.y + b.height <= a.y + 0.5 || a.x + a.width <= b.x || b.x + b.width <= a.x, 'labels overlap').to.equal(true);
        const hit = track.some(([x, y]) => x >= a.x && x <= a.x + a.width && y >= a.y && y <= a.y + a.height);
        expect(hit, `label over the track in example ${i}`).to.equal(false);
        expect(a.x + a.width).to.be.at.most(svgEl.viewBox.baseVal.width);
      });
    }
  });

  it('has a scale bar in metres and a north arrow', async () => {
    const el = await planOf(WAREHOUSE);
    expect(el.shadowRoot!.querySelector('.scale-bar text')!.textContent).to.match(/^\d+(\.\d+)? m$/);
    expect(el.shadowRoot!.querySelector('.north-arrow text')!.textContent).to.equal('N');
  });

  it('puts north up and east right at one scale on both axes', () => {
    const plan = { north: [0, 0, 10, 10], east: [0, 20, 20, 0], t: [0, 1, 2, 3], landmarks: [], outages: [] };
    const g = planGeometry(plan, 400, 300, 20);
    const [a, b, c] = g.path;
    expect(b.x - a.x).to.be.closeTo(20 * g.pxPerM, 1e-9); // east grows to the right
    expect(a.y - c.y).to.be.closeTo(10 * g.pxPerM, 1e-9); // north grows upwards
    expect(g.pxPerM).to.be.closeTo(Math.min(360 / 20, 260 / 10), 1e-12);
    expect(g.scaleBar.px).to.be.closeTo(g.scaleBar.metres * g.pxPerM, 1e-9);
  });

  it('picks round lengths for the scale bar', () => {
    expect([0.7, 3, 9.99, 20, 480].map(roundLength)).to.deep.equal([0.5, 2, 5, 20, 200]);
  });
});
