import { expect } from '@open-wc/testing';
import { sendKeys } from '@web/test-runner-commands';
import { cell, clipboardEvent, deepQuery, settle, workbench } from './helpers';

const TWO_ROWS = 'noise2\twhite-noise\t0.15\tdeg/√h\t\t\tdatasheet table 3\nbi2\tbias instability\t3\tdeg/h\t5\tmin\tdatasheet Allan plot\n';

describe('pasting and copying rows', () => {
  it('pasting two tab-separated rows adds two rows in one undo step', async () => {
    const { el, store } = await workbench(1);
    const grid = deepQuery(el, 'sl-source-grid');
    const before = store.document.sensors[0].sources.length;
    const event = clipboardEvent('paste', TWO_ROWS);
    grid.dispatchEvent(event);
    await settle(el);
    expect(event.defaultPrevented).to.equal(true);
    const rows = store.document.sensors[0].sources;
    expect(rows).to.have.length(before + 2);
    expect(rows[before]).to.include({ id: 'noise2', kind: 'white-noise', value: 0.15, unit: 'deg/√h', provenance: 'datasheet table 3' });
    expect(rows[before + 1]).to.deep.include({ id: 'bi2', kind: 'bias-instability', value: 3, correlationTime: { value: 5, unit: 'min' } });
    expect(cell(el, 'gyro.bi2 magnitude').input.value).to.equal('3');
    store.undo();
    expect(store.document.sensors[0].sources).to.have.length(before);
  });

  it('a pasted row with an existing id overwrites that row', async () => {
    const { el, store } = await workbench(1);
    deepQuery(el, 'sl-source-grid').dispatchEvent(clipboardEvent('paste', 'ARW\twhite-noise\t0.3\tdeg/√h\t\t\tbench test'));
    await settle(el);
    expect(store.document.sensors[0].sources[0]).to.include({ id: 'arw', value: 0.3, provenance: 'bench test' });
  });

  it('bad lines are reported with their text and reason, and good lines still go in', async () => {
    const { el, store } = await workbench(1);
    const before = store.document.sensors[0].sources.length;
    const text = 'id\tkind\tvalue\tunit\nok1\tturn-on-bias\t10\tdeg/h\nwrong\twhite-noise\t2\tm\nlost\tmultipath\t1\tdeg/h';
    deepQuery(el, 'sl-source-grid').dispatchEvent(clipboardEvent('paste', text));
    await settle(el);
    expect(store.document.sensors[0].sources).to.have.length(before + 1);
    const report = deepQuery(el, 'sl-paste-report').shadowRoot!;
    expect(report.textContent).to.contain('line 3').and.contain('unit "m" does not fit').and.contain('line 4').and.contain('no multipath rows');
    const box = report.querySelector('textarea')!;
    expect(box.value).to.equal('wrong\twhite-noise\t2\tm\nlost\tmultipath\t1\tdeg/h');
  });

  it('fixed lines can be pasted again from the report', async () => {
    const { el, store } = await workbench(1);
    deepQuery(el, 'sl-source-grid').dispatchEvent(clipboardEvent('paste', 'wrong\twhite-noise\t2\tm'));
    await settle(el);
    const report = deepQuery(el, 'sl-paste-report').shadowRoot!;
    report.querySelector('textarea')!.value = 'wrong\twhite-noise\t2\tdeg/s';
    (report.querySelector('button') as HTMLButtonElement).click();
    await settle(el);
    expect(store.document.sensors[0].sources.at(-1)).to.include({ id: 'wrong', unit: 'deg/s' });
  });

  it('a single value pasted on an active cell starts an edit with it', async () => {
    const { el, store } = await workbench(1);
    const arw = cell(el, 'gyro.arw magnitude');
    arw.input.focus();
    arw.input.dispatchEvent(clipboardEvent('paste', '0.42'));
    await settle(el);
    expect(arw.cell.isEditing).to.equal(true);
    expect(arw.input.value).to.equal('0.42');
    expect(store.canUndo).to.equal(false);
  });

  it('copy puts the active row and the rows selected with Shift+Down on the clipboard as tab-separated text', async () => {
    const { el } = await workbench(1);
    const arw = cell(el, 'gyro.arw magnitude');
    arw.input.focus();
    await sendKeys({ down: 'Shift' });
    await sendKeys({ press: 'ArrowDown' });
    await sendKeys({ up: 'Shift' });
    await settle(el);
    const event = clipboardEvent('copy');
    cell(el, 'gyro.bi magnitude').input.dispatchEvent(event);
    const lines = event.clipboardData!.getData('text/plain').split('\n');
    expect(lines).to.have.length(2);
    expect(lines[0].split('\t').slice(0, 4)).to.deep.equal(['arw', 'white-noise', '0.02', 'deg/√h']);
    expect(lines[1].split('\t').slice(0, 6)).to.deep.equal(['bi', 'bias-instability', '0.3', 'deg/h', '300', 's']);
  });
});
