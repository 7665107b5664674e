import { expect } from '@open-wc/testing';
import { isoDate } from '../../../src/edits/provenance-text';
import { chooseFile, deepQuery, logImport, normal, pick, runAndWait, settle } from './helpers';

// A turntable run (invented): 7 set rates, 300 samples each, a gyro reading
// (1 + s)·truth + b + white noise. The least-squares fit (Draper & Smith,
// "Applied Regression Analysis", ch. 1; from memory) must recover b and s
// within three of its own standard deviations.
const OFFSET_DEG_S = 0.3, SCALE = 2e-3, NOISE_DEG_S = 0.05;
const SET_RATES = [-100, -50, -20, 0, 20, 50, 100];

function turntableLog(): File {
  const next = normal(11);
  const lines = ['set_rate,gyro_out'];
  for (const truth of SET_RATES) {
    for (let k = 0; k < 300; k++) lines.push(`${truth},${((1 + SCALE) * truth + OFFSET_DEG_S + NOISE_DEG_S * next()).toFixed(6)}`);
  }
  return new File([lines.join('\r\n')], 'turntable.csv', { type: 'text/csv' });
}

describe('the calibration import', () => {
  it('recovers a known offset and scale factor within 3σ and writes their σ into the gyro with provenance, undone in one step', async () => {
    const { el, store, original } = await logImport(0);
    deepQuery<HTMLInputElement>(el, 'input[type="radio"][value="calibration"]').click();
    await settle(el);
    await chooseFile(el, turntableLog());
    await pick(el, 'measured-column', 'gyro_out');
    await pick(el, 'truth-column', 'set_rate');
    await pick(el, 'calibration-unit', 'deg/s');
    await runAndWait(el);
    expect(el.jobs.status).to.equal('complete');
    const r = el.calibration!.report;
    expect(r.samples).to.equal(2100);
    expect(Math.abs(r.offset.value - OFFSET_DEG_S)).to.be.below(3 * r.offset.uncertainty);
    expect(Math.abs(r.scaleFactor.value - SCALE * 1e6)).to.be.below(3 * r.scaleFactor.uncertainty);
    expect(r.whiteness?.white).to.equal(true);

    const view = deepQuery(el, 'sl-log-calibration');
    expect(view.shadowRoot!.textContent).to.match(/remains is how well they are known/);
    view.shadowRoot!.querySelector<HTMLButtonElement>('#write')!.click();
    await settle(el);
    const rows = store.document.sensors.find((s) => s.id === 'gyro')!.sources;
    const bias = rows.find((x) => x.kind === 'turn-on-bias')!;
    const sf = rows.find((x) => x.kind === 'scale-factor')!;
    expect(bias).to.include({ id: 'bias', unit: 'deg/s', assumed: false });
    expect(bias.value as number).to.be.closeTo(r.offset.uncertainty, 1e-3 * r.offset.uncertainty);
    expect(sf).to.include({ id: 'sf', unit: 'ppm', assumed: false });
    expect(sf.value as number).to.be.closeTo(r.scaleFactor.uncertainty, 1e-3 * r.scaleFactor.uncertainty);
    const head = `calibrated from turntable.csv, ${isoDate(new Date())}, 2100 samples: offset `;
    expect(bias.provenance.startsWith(head)).to.equal(true);
    expect(bias.provenance).to.match(/ deg\/s, scale factor .* ± .* ppm; residuals consistent with white noise/);
    expect(sf.provenance).to.equal(bias.provenance);

    store.undo();
    expect(store.document).to.deep.equal(original);
  });

  it('writes only the scale factor into a wheel-speed sensor and says why the offset has no row there', async () => {
    const { el, store } = await logImport(0);
    deepQuery<HTMLInputElement>(el, 'input[type="radio"][value="calibration"]').click();
    await settle(el);
    const lines = ['truth,wheel'];
    const next = normal(5);
    for (const v of [0.5, 1, 1.5, 2]) for (let k = 0; k < 50; k++) lines.push(`${v},${(1.01 * v + 0.02 * next()).toFixed(5)}`);
    await chooseFile(el, new File([lines.join('\n')], 'rollers.csv'));
    await pick(el, 'calibration-unit', 'm/s');
    await runAndWait(el);
    const view = deepQuery(el, 'sl-log-calibration');
    expect(view.shadowRoot!.textContent).to.match(/not written: a wheel-speed sensor counts wheel turns and reads zero at rest/);
    view.shadowRoot!.querySelector<HTMLButtonElement>('#write')!.click();
    await settle(el);
    const wheel = store.document.sensors.find((s) => s.id === 'wheel')!.sources;
    expect(wheel.find((x) => x.kind === 'scale-factor')!.provenance).to.match(/^calibrated from rollers\.csv/);
    expect(wheel.some((x) => x.kind === 'turn-on-bias')).to.equal(false);
  });
});
