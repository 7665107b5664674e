import { expect } from '@open-wc/testing';
import { DIMENSIONS } from '../../../src/units';
import { deepQuery, optionsOf, pickUnit, settle, workbench } from './helpers';

describe('the unit picker of a row', () => {
  it('converts a number to the new unit: 0.2 deg/√h is 0.2/60 deg/s/√Hz', async () => {
    const { el, store } = await workbench(1, (d) => (d.sensors[0].sources[0].value = 0.2));
    expect(store.document.sensors[0].sources[0].unit).to.equal('deg/√h');
    await pickUnit(el, 'gyro.arw unit', 'deg/s/√Hz');
    const row = store.document.sensors[0].sources[0];
    expect(row.unit).to.equal('deg/s/√Hz');
    expect(row.value as number).to.be.closeTo(0.2 / 60, 1e-15);
    store.undo();
    expect(store.document.sensors[0].sources[0]).to.include({ value: 0.2, unit: 'deg/√h' });
  });

  it('wraps a formula in CONVERTUNIT so the physical value is kept', async () => {
    const { el, store } = await workbench(1, (d) => (d.sensors[0].sources[0].value = '=0.1*2'));
    await pickUnit(el, 'gyro.arw unit', 'deg/s/√Hz');
    expect(store.document.sensors[0].sources[0].value).to.equal('=CONVERTUNIT(0.1*2, "deg/√h", "deg/s/√Hz")');
  });

  it('unwraps a formula that already converts to the old unit when the new unit is its source', async () => {
    const { el, store } = await workbench(3);
    await pickUnit(el, 'gyro.arw unit', 'deg/s/√Hz');
    expect(store.document.sensors[0].sources[0]).to.include({ value: '=gyroNoiseDensity', unit: 'deg/s/√Hz' });
  });

  it('wraps formulas that use the converted cell so they still see the old unit', async () => {
    const { el, store } = await workbench(1, (d) => {
      d.sensors[0].sources[0].value = 0.2;
      d.values = { ...d.values, twice: { value: '=gyro.arw*2', unit: 'deg/√h' } };
    });
    await pickUnit(el, 'gyro.arw unit', 'deg/s/√Hz');
    expect(store.document.values!.twice.value).to.equal('=CONVERTUNIT(gyro.arw, "deg/s/√Hz", "deg/√h")*2');
    expect(deepQuery(el, '[role="status"]').textContent).to.contain('now converts it back');
  });

  it('offers a gyro white-noise row angle random walk and angular-rate units only', async () => {
    const { el } = await workbench(1);
    const offered = optionsOf(el, 'gyro.arw unit');
    expect(offered).to.deep.equal([...DIMENSIONS['angle-random-walk'].picker, ...DIMENSIONS['angular-rate'].picker]);
  });

  it('offers a GNSS white-noise row lengths and a compass turn-on bias angles', async () => {
    const { el } = await workbench(1);
    const grid = () => deepQuery(el, 'sl-sensor-list').shadowRoot!.querySelectorAll('nav button');
    (grid()[2] as HTMLElement).click(); // gnss
    await settle(el);
    expect(optionsOf(el, 'gnss.white unit')).to.deep.equal([...DIMENSIONS.length.picker]);
    (grid()[3] as HTMLElement).click(); // compass
    await settle(el);
    expect(optionsOf(el, 'compass.bias unit')).to.deep.equal([...DIMENSIONS.angle.picker]);
  });

  it('keeps an unusual current unit in the list', async () => {
    const { el } = await workbench(1, (d) => (d.sensors[0].sources[0].unit = 'arcsec/√h'));
    expect(optionsOf(el, 'gyro.arw unit')[0]).to.equal('arcsec/√h');
  });
});
