import { expect } from '@open-wc/testing';
import { DIMENSIONS } from '../../../src/units';
import { cell, deepQuery, optionsOf, settle, workbench } from './helpers';

describe('the mission, named values and requirements tabs', () => {
  it('the mission tab edits start-pose cells through the store and leaves a slot for the plan view', async () => {
    const { el, store } = await workbench(3);
    await el.show('mission');
    await settle(el);
    const mission = deepQuery(el, 'sl-mission-editor');
    expect(mission.shadowRoot!.querySelector('sl-plan-view')).to.exist;
    const north = cell(el, 'Start north');
    north.input.value = '12.5';
    north.input.dispatchEvent(new Event('input'));
    north.input.dispatchEvent(new KeyboardEvent('keydown', { key: 'Enter', bubbles: true, composed: true }));
    await settle(el);
    expect(store.document.mission.start.north.value).to.equal(12.5);
  });

  it('segments are added, moved and kept to at least one', async () => {
    const { el, store } = await workbench(1);
    await el.show('mission');
    await settle(el);
    const table = deepQuery(el, 'sl-segment-table').shadowRoot!;
    const count = store.document.mission.segments.length;
    [...table.querySelectorAll('button')].find((b) => b.textContent === 'Add segment')!.click();
    await settle(el);
    expect(store.document.mission.segments).to.have.length(count + 1);
    const firstId = store.document.mission.segments[0].id;
    (table.querySelector(`button[aria-label^="Move segment"][aria-label$="down"]`) as HTMLButtonElement).click();
    await settle(el);
    expect(store.document.mission.segments[1].id).to.equal(firstId);
  });

  it('a named value unit change converts it and keeps the formulas that use it right', async () => {
    const { el, store } = await workbench(3);
    await el.show('values');
    await settle(el);
    const unit = deepQuery<HTMLInputElement>(el, 'input[aria-label="cruiseSpeed unit"]');
    unit.value = 'km/h';
    unit.dispatchEvent(new Event('change'));
    await settle(el);
    expect(store.document.values!.cruiseSpeed).to.include({ value: 9, unit: 'km/h' });
    expect(store.document.mission.segments[0].speed.value).to.equal('=CONVERTUNIT(cruiseSpeed, "km/h", "m/s")');
  });

  it('a requirement limit offers the units of its quantity only, and a quantity change resets the unit', async () => {
    const { el, store } = await workbench(3);
    await el.show('requirements');
    await settle(el);
    expect(optionsOf(el, 'heading limit unit')).to.deep.equal([...DIMENSIONS.angle.picker]);
    expect(optionsOf(el, 'greenhousePosition limit unit')).to.deep.equal([...DIMENSIONS.length.picker]);
    const quantity = deepQuery<HTMLSelectElement>(el, 'select[aria-label="heading quantity"]');
    quantity.value = 'speed';
    quantity.dispatchEvent(new Event('change'));
    await settle(el);
    expect(store.document.requirements![1]).to.deep.include({ quantity: 'speed', limit: { value: 5, unit: 'm/s' } });
  });

  it('the analysis step is edited on the requirements tab', async () => {
    const { el, store } = await workbench(3);
    await el.show('requirements');
    await settle(el);
    const step = cell(el, 'Analysis time step');
    step.input.value = '0.5';
    step.input.dispatchEvent(new Event('input'));
    step.input.dispatchEvent(new Event('blur'));
    await settle(el);
    expect(store.document.settings.step.value).to.equal(0.5);
  });
});
