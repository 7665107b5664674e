import { expect } from '@open-wc/testing';
import { AIDING_KIND_NAMES } from '../../../src';
import type { InertialBudgetDocument } from '../../../src';
import type { SlInertialChart } from '../../../web/components/sl-inertial-chart';
import { deepQuery, deepQueryAll, settle } from '../workbench/helpers';
import { cellMessage, computed3d, droneApp, typeInto } from './helpers';
import { freshApp } from '../app/helpers';
import { EXAMPLES } from '../../../web/examples';
import type { SlApp } from '../../../web/components/sl-app';

/**
 * The page on a 3-D budget (budgets/survey-drone.json, an invented
 * scenario): it loads from the examples menu into the 3-D editors, an IMU
 * edit recomputes, the axis column edits the row, and bad input gets a
 * message naming the field while the typed text stays. Expected numbers are
 * the engine's own (the view is the engine's output); what is checked here
 * is that the page shows and edits them.
 */
/** Opens `file` through the page's Open… field, as a user picking it would. */
async function openFile(app: SlApp, file: File): Promise<void> {
  const input = app.shadowRoot!.querySelector<HTMLInputElement>('label.file input')!;
  const files = new DataTransfer();
  files.items.add(file);
  input.files = files.files;
  input.dispatchEvent(new Event('change'));
  await new Promise((r) => setTimeout(r, 300));
  await app.updateComplete;
}

describe('the page on a 3-D budget', function () {
  this.timeout(240_000);

  const doc = (app: Awaited<ReturnType<typeof droneApp>>) => app.store.document as unknown as InertialBudgetDocument;
  const imuRow = (app: Awaited<ReturnType<typeof droneApp>>, id: string) =>
    doc(app).sensors[0].sources.findIndex((r) => r.id === id);

  it('loads the 3-D example into its editors, with verdicts, four σ charts, the plan and the profile', async () => {
    const app = await droneApp();
    expect(doc(app).model).to.equal('inertial');
    expect(app.shadowRoot!.querySelector('sl-workbench')).to.equal(null);
    const rows = [...deepQuery(app, 'sl-imu-grid').shadowRoot!.querySelectorAll<HTMLElement>('tbody tr[data-row]')];
    expect(rows.map((r) => r.dataset.row)).to.deep.equal(doc(app).sensors[0].sources.map((r) => r.id));
    const verdicts = deepQueryAll(app, 'tr[data-requirement]').map((r) => r.dataset.requirement);
    expect(verdicts).to.deep.equal(['outageDrift', 'heightHold', 'yawHold']);
    const charts = deepQueryAll<SlInertialChart>(app, 'sl-inertial-chart');
    expect(charts.map((c) => c.kind)).to.deep.equal(['position', 'height', 'attitude', 'velocity']);
    for (const c of charts) expect(c.charts.chart?.data.datasets.length, c.kind).to.be.greaterThan(0);
    const attitude = charts[2].charts.chart!.data.datasets.map((d) => d.label);
    expect(attitude).to.include.members(['roll 1σ', 'pitch 1σ', 'yaw 1σ']);
    expect(attitude.some((l) => l?.startsWith('yawHold limit'))).to.equal(true);
    const profile = deepQuery(app, 'sl-profile-view').shadowRoot!;
    expect(profile.querySelector('polyline.path')!.getAttribute('points')!.split(' ').length).to.be.greaterThan(100);
    expect(profile.querySelectorAll('polyline.outage').length).to.equal(2);
    expect(deepQuery(app, 'sl-plan-view').shadowRoot!.querySelector('polyline.path')).to.exist;
  });

  it('recomputes after an IMU cell edit: ten times the gyro bias instability drifts further', async () => {
    const app = await droneApp();
    const before = app.compute.view!.inertial!.verdicts[0].worst;
    await typeInto(app, 'imu.gBi magnitude', '40');
    expect(doc(app).sensors[0].sources[imuRow(app, 'gBi')].value).to.equal(40);
    await computed3d(app);
    // Heading error grows with the bias and turns the outage's acceleration errors sideways: the R95 drift grows.
    expect(app.compute.view!.inertial!.verdicts[0].worst).to.be.greaterThan(before * 1.5);
    app.store.undo();
    expect(doc(app).sensors[0].sources[imuRow(app, 'gBi')].value).to.equal(4);
  });

  it('edits the axis column: a z-only row carries a z state alone, and undo brings back all three axes', async () => {
    const app = await droneApp();
    await typeInto(app, 'imu.aBias axis', 'z');
    expect(doc(app).sensors[0].sources[imuRow(app, 'aBias')].axis).to.equal('z');
    await computed3d(app);
    const states = app.compute.view!.inertial!.calibration.map((c) => c.id);
    expect(states).to.include('imu.aBias.z');
    expect(states).not.to.include('imu.aBias.x');
    app.store.undo();
    expect(doc(app).sensors[0].sources[imuRow(app, 'aBias')].axis).to.equal(undefined);
  });

  it('refuses an axis not x, y, z or all, naming the field and keeping the typed text', async () => {
    const app = await droneApp();
    const before = JSON.stringify(app.store.document);
    const j = imuRow(app, 'gBias');
    const { cell, input } = await typeInto(app, 'imu.gBias axis', 'w');
    expect(cellMessage(cell)).to.contain(`sensors[0].sources[${j}].axis`).and.to.contain('x, y, z or all');
    expect(input.value).to.equal('w');
    expect(JSON.stringify(app.store.document)).to.equal(before);
  });

  it('shows a lever arm of absurd length at the lever arm, keeping the typed value', async () => {
    const app = await droneApp();
    const { input } = await typeInto(app, 'gnss lever arm x', '5000');
    await computed3d(app);
    const sensor = deepQuery(app, 'sl-aiding-sensor');
    expect(sensor.shadowRoot!.querySelector('[role="alert"]')?.textContent).to.contain('sensors[1].leverArm');
    expect(input.value).to.equal('5000');
  });

  it('shows a negative height σ at its cell, naming the field, keeping the typed value', async () => {
    const app = await droneApp();
    deepQuery(app, 'sl-inertial-workbench').shadowRoot!.querySelectorAll<HTMLButtonElement>('[role="tab"]')[1].click();
    await settle(app);
    const { cell, input } = await typeInto(app, 'Initial position vertical', '-1');
    await computed3d(app);
    await settle(app);
    expect(cellMessage(cell)).to.contain('mission.initialPosition.vertical');
    expect(input.value).to.equal('-1');
  });

  it('leaves a zero-velocity window while climbing out, with its message, and computes the rest', async () => {
    const app = await droneApp();
    const select = deepQuery<HTMLSelectElement>(app, 'select[aria-label="Add an aiding sensor"]');
    select.value = 'zero-velocity';
    select.dispatchEvent(new Event('change'));
    await settle(app);
    const sensor = deepQueryAll(app, 'sl-aiding-sensor').at(-1)!;
    [...sensor.shadowRoot!.querySelectorAll('button')].find((b) => b.textContent === 'Add window')!.click();
    await settle(app);
    // The new window is 0 to 10 s: the drone climbs then (2 m/s up), so the update cannot hold.
    await computed3d(app);
    await settle(app);
    const alert =
      sensor.shadowRoot!.querySelector('table[aria-label="zupt windows"] [role="alert"]')?.textContent ?? '';
    expect(alert).to.contain('climb').and.to.contain('stop');
    expect(app.compute.view!.inertial).to.exist;
    expect(app.compute.view!.omitted.map((o) => o.path)).to.deep.equal(['sensors[4].windows[0]']);
  });

  it('offers the trade units of each instrument and kind, and converts on a unit change', async () => {
    const app = await droneApp();
    const grid = deepQuery(app, 'sl-imu-grid');
    const units = (label: string) =>
      [...deepQuery<HTMLSelectElement>(grid, `select[aria-label="${label}"]`).options].map((o) => o.value);
    expect(units('imu.gArw magnitude unit')).to.include.members(['deg/√h', 'deg/s/√Hz', 'mdps/√Hz', 'deg/s']);
    expect(units('imu.aVrw magnitude unit')).to.include.members(['µg/√Hz', 'm/s/√h', 'mg']);
    expect(units('imu.aBias magnitude unit')).to.include.members(['mg', 'µg', 'm/s²']);
    expect(units('imu.gBias magnitude unit')).to.include.members(['deg/h', 'dps', 'mdeg/s']);
    const select = deepQuery<HTMLSelectElement>(grid, 'select[aria-label="imu.aBias magnitude unit"]');
    select.value = 'µg';
    select.dispatchEvent(new Event('change', { bubbles: true }));
    await settle(app);
    const row = doc(app).sensors[0].sources[imuRow(app, 'aBias')];
    // 4 mg = 4000 µg (SI prefixes, BIPM SI Brochure, 9th edition, Table 7).
    expect([row.value, row.unit]).to.deep.equal([4000, 'µg']);
  });

  it('edits 3-D requirements with the 3-D quantities', async () => {
    const app = await droneApp();
    deepQuery(app, 'sl-inertial-workbench').shadowRoot!.querySelectorAll<HTMLButtonElement>('[role="tab"]')[3].click();
    await settle(app);
    const quantity = deepQuery<HTMLSelectElement>(app, 'select[aria-label="heightHold quantity"]');
    expect(quantity.value).to.equal('height');
    expect([...quantity.options].map((o) => o.value)).to.include.members([
      'height',
      'roll',
      'pitch',
      'yaw',
      'drms',
      'horizontal',
    ]);
    quantity.value = 'pitch';
    quantity.dispatchEvent(new Event('change'));
    await settle(app);
    expect(doc(app).requirements![1].quantity).to.equal('pitch');
    expect(doc(app).requirements![1].limit.unit).to.equal('deg');
  });

  it("offers the 3-D model's aiding kinds only when adding a sensor, and adds one", async () => {
    const app = await droneApp();
    const select = deepQuery<HTMLSelectElement>(app, 'select[aria-label="Add an aiding sensor"]');
    expect([...select.options].map((o) => o.value).filter(Boolean)).to.deep.equal([...AIDING_KIND_NAMES]);
    select.value = 'heading-aid';
    select.dispatchEvent(new Event('change'));
    await settle(app);
    expect(doc(app).sensors.at(-1)!.kind).to.equal('heading-aid');
    await computed3d(app);
    expect(app.compute.view!.blocked).to.equal(undefined);
  });

  it('goes back to the planar editors when loading the 3-D example is undone', async () => {
    const app = await droneApp();
    app.store.undo();
    await app.updateComplete;
    await computed3d(app);
    expect(app.store.document.title).to.equal(EXAMPLES[0].document.title);
    expect(app.shadowRoot!.querySelector('sl-workbench')).to.exist;
    expect(app.shadowRoot!.querySelector('sl-inertial-workbench')).to.equal(null);
    expect(app.compute.view!.result).to.exist;
  });

  it('refuses an IMU in a planar file with a message naming its path, keeping the open budget', async () => {
    const app = await freshApp();
    const planar = structuredClone(EXAMPLES[0].document);
    (planar.sensors as unknown[]).push({ id: 'imu', kind: 'imu', rate: { value: 100, unit: 'Hz' }, sources: [] });
    await openFile(app, new File([JSON.stringify(planar)], 'planar-with-imu.json', { type: 'application/json' }));
    const banner = app.shadowRoot!.querySelector('.banner[role="alert"]')?.textContent ?? '';
    expect(banner)
      .to.contain('planar-with-imu.json')
      .and.to.contain(`sensors[${planar.sensors.length - 1}]`);
    expect(app.store.document.title).to.equal(EXAMPLES[0].document.title);
  });

  it('refuses a planar-only sensor in a 3-D file, naming its path, keeping the open budget', async () => {
    const app = await droneApp();
    const bad = structuredClone(app.store.document) as unknown as InertialBudgetDocument;
    (bad.sensors as unknown[]).push({ id: 'cmp', kind: 'compass', rate: { value: 10, unit: 'Hz' }, sources: [] });
    await openFile(app, new File([JSON.stringify(bad)], 'bad-drone.json', { type: 'application/json' }));
    const banner = app.shadowRoot!.querySelector('.banner[role="alert"]')?.textContent ?? '';
    expect(banner).to.contain('bad-drone.json').and.to.contain('sensors[4]');
    expect(doc(app).sensors.length).to.equal(4);
  });
});
