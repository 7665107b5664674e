import { expect } from '@open-wc/testing';
import { sendKeys } from '@web/test-runner-commands';
import type { BudgetDocument } from '../../../src/document';
import { cell, settle, workbench } from './helpers';

/** Adds cells that refer to gyro's rows in several spellings. */
function withReferences(d: BudgetDocument): void {
  d.values = {
    ...d.values,
    twice: { value: '=gyro.arw*2', unit: 'deg/√h' },
    shouted: { value: '=GYRO.bi.correlationTime/2', unit: 's' },
    quoted: { value: '=LEN("gyro.arw")+gyroscope', unit: '1' },
    gyroscope: { value: 1, unit: '1' },
  };
}

/** Replaces the text of the (non-grid) field with accessible name `label` and presses Enter. */
async function retype(el: Element, label: string, text: string): Promise<void> {
  const { input } = cell(el, label);
  input.focus();
  input.select();
  await sendKeys({ type: text });
  await sendKeys({ press: 'Enter' });
  await settle(el);
}

describe('renaming sensors, rows and named values', () => {
  it('renaming a sensor rewrites =gyro.arw references in every cell, in one undo step', async () => {
    const { el, store } = await workbench(1, withReferences);
    await retype(el, 'Sensor id', 'imu');
    const v = store.document.values!;
    expect(store.document.sensors[0].id).to.equal('imu');
    expect(v.twice.value).to.equal('=imu.arw*2');
    expect(v.shouted.value).to.equal('=imu.bi.correlationTime/2');
    expect(v.quoted.value).to.equal('=LEN("gyro.arw")+gyroscope');
    store.undo();
    expect(store.document.sensors[0].id).to.equal('gyro');
    expect(store.document.values!.twice.value).to.equal('=gyro.arw*2');
  });

  it('an unusable sensor id is refused with a message and the typed text kept', async () => {
    const { el, store } = await workbench(1);
    await retype(el, 'Sensor id', 'mission');
    const field = cell(el, 'Sensor id');
    expect(store.canUndo).to.equal(false);
    expect(field.input.value).to.equal('mission');
    expect(field.cell.shadowRoot!.textContent).to.contain('reserved');
    await retype(el, 'Sensor id', 'Compass');
    expect(cell(el, 'Sensor id').cell.shadowRoot!.textContent).to.contain('already used');
  });

  it('renaming a row in the grid rewrites references to it and to its other cells', async () => {
    const { el, store } = await workbench(1, withReferences);
    cell(el, 'Row id of gyro.arw').input.focus();
    await sendKeys({ type: 'noise' });
    await sendKeys({ press: 'Enter' });
    await settle(el);
    expect(store.document.sensors[0].sources[0].id).to.equal('noise');
    expect(store.document.values!.twice.value).to.equal('=gyro.noise*2');
    expect(store.document.values!.shouted.value).to.equal('=GYRO.bi.correlationTime/2');
  });

  it('a row id used by another row of the sensor is refused', async () => {
    const { el, store } = await workbench(1);
    cell(el, 'Row id of gyro.arw').input.focus();
    await sendKeys({ type: 'BI' });
    await sendKeys({ press: 'Enter' });
    await settle(el);
    expect(store.canUndo).to.equal(false);
    expect(cell(el, 'Row id of gyro.arw').cell.shadowRoot!.textContent).to.contain('already used');
  });

  it('renaming a named value rewrites the formulas that use it', async () => {
    const { el, store } = await workbench(3);
    await el.show('values');
    await settle(el);
    await retype(el, 'Name of cruiseSpeed', 'cruise');
    const d = store.document;
    expect(Object.keys(d.values!)[0]).to.equal('cruise');
    expect(d.mission.segments[0].speed.value).to.equal('=cruise');
    expect(d.mission.segments[3].speed.value).to.equal('=cruise/2');
  });
});
