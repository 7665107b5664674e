import { expect } from '@open-wc/testing';
import { choose, clickButton, deepQuery, deepQueryAll, workbench } from './helpers';

describe('starting a sensor from a grade preset', () => {
  it("a new gyro from the tactical preset gets the grade's rows, each assumed and citing its source", async () => {
    const { el, store } = await workbench(1);
    await choose(el, 'Kind of the new sensor', 'yaw-gyro');
    const options = [...deepQuery<HTMLSelectElement>(el, 'select[aria-label="Rows of the new sensor"]').options].map(
      (o) => o.textContent,
    );
    expect(options).to.deep.equal([
      'no rows',
      'consumer MEMS grade',
      'industrial MEMS grade',
      'tactical grade',
      'navigation grade',
    ]);
    await choose(el, 'Rows of the new sensor', 'tactical');
    await clickButton(el, 'sl-sensor-list', 'Add sensor');
    const added = store.document.sensors.at(-1)!;
    expect(added.sources.map((r) => [r.id, r.value, r.unit])).to.deep.equal([
      ['arw', 0.05, 'deg/√h'],
      ['bi', 0.5, 'deg/h'],
      ['bias', 10, 'deg/h'],
    ]);
    expect(added.sources.every((r) => r.assumed)).to.equal(true);
    // Tactical gyro drift 1-10 °/h: El-Sheimy and Youssef 2020, Table 1 (docs/checks.md §8.1).
    expect(added.sources[2].provenance).to.contain('El-Sheimy and A. Youssef');
    expect(added.sources[0].provenance).to.contain('common practice, no source');
  });

  it("offers no preset for a kind that cannot take a gyro grade's rows", async () => {
    const { el } = await workbench(1);
    await choose(el, 'Kind of the new sensor', 'compass');
    expect(deepQueryAll(el, 'select[aria-label="Rows of the new sensor"]')).to.have.length(0);
  });

  it("keeps the picked sensor's rows as a candidate, and undo takes it back", async () => {
    const { el, store } = await workbench(1);
    await clickButton(el, 'sl-sensor-list', 'Keep as candidate');
    expect(store.document.candidates).to.deep.equal([
      { sensor: 'gyro', options: [{ id: 'rows1', sources: store.document.sensors[0].sources }] },
    ]);
    await clickButton(el, 'sl-sensor-list', 'Keep as candidate');
    expect(store.document.candidates![0].options.map((o) => o.id)).to.deep.equal(['rows1', 'rows2']);
    store.undo();
    store.undo();
    expect(store.document.candidates ?? []).to.deep.equal([]);
  });
});
