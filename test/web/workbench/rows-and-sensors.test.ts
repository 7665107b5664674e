import { expect } from '@open-wc/testing';
import { ASSUMED_CORRELATION_TIME_S } from '../../../web/grid/row-edits';
import { cell, choose, clickButton, deepQuery, settle, workbench } from './helpers';

describe('adding, moving and removing rows and sensors', () => {
  it('a new bias-instability row gets a 100 s correlation time marked assumed, with a provenance saying so', async () => {
    const { el, store } = await workbench(1);
    await choose(el, 'Kind of the new row', 'bias-instability');
    await clickButton(el, 'sl-source-grid', 'Add row');
    const row = store.document.sensors[0].sources.at(-1)!;
    expect(row).to.deep.include({ id: 'bi2', kind: 'bias-instability', correlationTime: { value: ASSUMED_CORRELATION_TIME_S, unit: 's' }, assumed: true });
    expect(row.provenance).to.contain('assumed');
    expect(cell(el, 'gyro.bi2 correlation time').input.value).to.equal('100');
    expect(deepQuery<HTMLInputElement>(el, 'input[aria-label="gyro.bi2 assumed"]').checked).to.equal(true);
  });

  it('changing a row to bias instability fills in the assumed correlation time too', async () => {
    const { el, store } = await workbench(1);
    await choose(el, 'gyro.bias kind', 'bias-instability');
    expect(store.document.sensors[0].sources[2]).to.deep.include({ kind: 'bias-instability', correlationTime: { value: 100, unit: 's' }, assumed: true });
  });

  it('Move down and Delete row act on the active row and undo brings a deleted row back', async () => {
    const { el, store } = await workbench(1);
    cell(el, 'gyro.arw magnitude').input.focus();
    await settle(el);
    await clickButton(el, 'sl-source-grid', 'Move down');
    expect(store.document.sensors[0].sources.map((r) => r.id).slice(0, 2)).to.deep.equal(['bi', 'arw']);
    await clickButton(el, 'sl-source-grid', 'Delete row');
    expect(store.document.sensors[0].sources.map((r) => r.id)).not.to.include('arw');
    store.undo();
    expect(store.document.sensors[0].sources[1].id).to.equal('arw');
  });

  it('a new sensor gets a unique valid id and becomes the picked one', async () => {
    const { el, store } = await workbench(1);
    await choose(el, 'Kind of the new sensor', 'compass');
    await clickButton(el, 'sl-sensor-list', 'Add sensor');
    const added = store.document.sensors.at(-1)!;
    expect(added.id).to.equal('compass2');
    expect(added).to.deep.include({ kind: 'compass', sources: [] });
    expect(cell(el, 'Sensor id').input.value).to.equal('compass2');
  });

  it('duplicating a sensor copies it under a new id whose own formulas refer to the copy', async () => {
    const { el, store } = await workbench(1, (d) => (d.sensors[0].sources[2].value = '=gyro.bi*2'));
    await clickButton(el, 'sl-sensor-list', 'Duplicate');
    const [original, copy] = store.document.sensors;
    expect(copy.id).to.equal('gyro_copy');
    expect(copy.sources[2].value).to.equal('=gyro_copy.bi*2');
    expect(original.sources[2].value).to.equal('=gyro.bi*2');
    expect(cell(el, 'Sensor id').input.value).to.equal('gyro_copy');
  });

  it('removing a sensor is one undoable step', async () => {
    const { el, store } = await workbench(1);
    await clickButton(el, 'sl-sensor-list', 'Remove');
    expect(store.document.sensors.map((s) => s.id)).to.deep.equal(['log', 'gnss', 'compass']);
    store.undo();
    expect(store.document.sensors[0].id).to.equal('gyro');
  });
});
