import { expect, fixture, html } from '@open-wc/testing';
import '../../../web/components/sl-sigma-chart';
import type { SlSigmaChart } from '../../../web/components/sl-sigma-chart';
import { niceCeil } from '../../../web/charts/sigma-series';
import { exampleView, HARBOUR, ORCHARD, WAREHOUSE } from './views';

async function chartOf(i: number, kind: string) {
  const el = await fixture<SlSigmaChart>(html`<sl-sigma-chart kind=${kind} .view=${exampleView(i)}></sl-sigma-chart>`);
  return el.charts.chart!;
}

const labels = (chart: Awaited<ReturnType<typeof chartOf>>) => chart.data.datasets.map((d) => d.label);

describe('the σ-over-time chart', () => {
  it('draws each requirement\'s limit as a dashed line over its window only', async () => {
    const chart = await chartOf(HARBOUR, 'heading');
    const t = exampleView(HARBOUR).result!.series.t_s;
    const survey = chart.data.datasets.find((d) => d.label === 'limit surveyHeading: 0.5 deg (95 %)')!;
    expect(survey.borderDash).to.deep.equal([6, 4]);
    survey.data.forEach((v, k) => expect(v).to.equal(t[k] >= 300 ? 0.5 : null));
  });

  it('draws a requirement\'s own curve once per quantity and level, and not when it repeats a 1σ series', async () => {
    expect(labels(await chartOf(HARBOUR, 'heading'))).to.deep.equal([
      'heading 1σ', 'heading 95 %', 'limit surveyHeading: 0.5 deg (95 %)', 'limit bridgeHeading: 1 deg (95 %)',
    ]);
    expect(labels(await chartOf(WAREHOUSE, 'heading'))).to.deep.equal(['heading 1σ', 'limit heading: 0.5 deg (1σ)']);
  });

  it('adds R95 to the position chart only when a horizontal requirement exists', async () => {
    expect(labels(await chartOf(HARBOUR, 'position'))).to.include('R95');
    const orchard = await chartOf(ORCHARD, 'position');
    expect(labels(orchard)).not.to.include('R95');
    expect(labels(orchard)).to.include('cross-track 95 %');
    const r95 = (await chartOf(HARBOUR, 'position')).data.datasets.find((d) => d.label === 'R95')!;
    expect(r95.data).to.deep.equal(exampleView(HARBOUR).result!.series.r95_m);
  });

  it('shades every outage of the plan, has no animation and a y axis from 0 with units', async () => {
    const chart = await chartOf(HARBOUR, 'speed');
    expect(chart.options.plugins!.slOutageBands!.bands!.map((b) => `${b!.sensorId}:${b!.id}`)).to.deep.equal(['gnss:bridge', 'compass:bridge']);
    expect(chart.options.animation).to.equal(false);
    const y = chart.scales.y;
    expect(y.min).to.equal(0);
    expect(chart.options.scales!.y!.title!.text).to.equal('speed error (m/s)');
  });

  it('stops the y axis above the limits when the start would squash the rest, and says so', async () => {
    const el = await fixture<SlSigmaChart>(html`<sl-sigma-chart kind="heading" .view=${exampleView(ORCHARD)}></sl-sigma-chart>`);
    expect(el.charts.chart!.scales.y.max).to.equal(2.5);
    expect(el.shadowRoot!.querySelector('.cut')!.textContent).to.match(/axis stops at 2\.5 deg; the curves reach 9\.\d deg at 0 s/);
  });

  it('rounds an axis top up to a round number', () => {
    expect([0.87, 2.4, 13, 0.0061].map(niceCeil)).to.deep.equal([1, 2.5, 15, 0.008]);
  });
});
