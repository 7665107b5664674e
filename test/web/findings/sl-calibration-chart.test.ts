import { expect, fixture, html } from '@open-wc/testing';
import '../../../web/components/sl-findings';
import type { SlFindings } from '../../../web/components/sl-findings';
import type { SlCalibrationChart } from '../../../web/components/sl-calibration-chart';
import { calibrationGroups } from '../../../web/charts/calibration-groups';
import { exampleView, ORCHARD } from './views';

describe('the calibration charts', () => {
  it('group the states by unit and show them in the units the trade writes', () => {
    const groups = calibrationGroups(exampleView(ORCHARD).result!);
    expect(groups.map((g) => `${g.unitSI}->${g.unit}`)).to.deep.equal(['rad/s->deg/h', '1->ppm', 'm->m']);
    const turnOn = groups[0].states.find((s) => s.state === 'gyro turn-on bias')!;
    // 0.1 deg/s turn-on bias in the budget = 360 deg/h (1 deg/s = 3600 deg/h).
    expect(turnOn.sigma[0]).to.be.closeTo(360, 1e-9);
    const sf = groups[1].states.find((s) => s.state === 'gyro scale factor')!;
    expect(sf.sigma[0]).to.be.closeTo(3000, 1e-9); // 0.3 % = 3000 ppm
  });

  it('draw one chart per unit group, with the unit on the axis', async () => {
    const el = await fixture<SlFindings>(html`<sl-findings .view=${exampleView(ORCHARD)} status="complete"></sl-findings>`);
    el.shadowRoot!.querySelector<HTMLButtonElement>('[data-tab="calibration"]')!.click();
    await el.updateComplete;
    const charts = [...el.shadowRoot!.querySelectorAll<SlCalibrationChart>('sl-calibration-chart')];
    await Promise.all(charts.map((c) => c.updateComplete));
    expect(charts.map((c) => c.charts.chart!.options.scales!.y!.title!.text)).to.deep.equal([
      '1σ (deg/h, log scale)', '1σ (ppm, log scale)', '1σ (m, log scale)',
    ]);
    expect(charts[0].charts.chart!.data.datasets.map((d) => d.label)).to.deep.equal(['gyro bias instability (bi)', 'gyro turn-on bias']);
  });
});
