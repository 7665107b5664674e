import { expect } from '@open-wc/testing';
import { sendKeys } from '@web/test-runner-commands';
import { cell, deepActiveElement, settle, workbench } from './helpers';

/** Presses `key` and waits for the workbench to settle; returns the accessible name of what has focus. */
async function press(el: Element, key: string): Promise<string | null> {
  const [modifier, single] = key.includes('+') ? key.split('+') : [undefined, key];
  if (modifier) await sendKeys({ down: modifier });
  await sendKeys({ press: single });
  if (modifier) await sendKeys({ up: modifier });
  await settle(el);
  return deepActiveElement()?.getAttribute('aria-label') ?? null;
}

describe('keyboard use of the grid', () => {
  it('arrow keys move the active cell between rows and columns', async () => {
    const { el } = await workbench(1);
    cell(el, 'gyro.arw magnitude').input.focus();
    expect(await press(el, 'ArrowDown')).to.equal('gyro.bi magnitude');
    expect(await press(el, 'ArrowRight')).to.equal('gyro.bi unit');
    expect(await press(el, 'ArrowRight')).to.equal('gyro.bi correlation time');
    expect(await press(el, 'ArrowUp')).to.equal('gyro.arw unit'); // arw has no correlation time: the nearest cell to the left
    expect(await press(el, 'ArrowLeft')).to.equal('gyro.arw magnitude');
  });

  it('only the active cell is in the tab order', async () => {
    const { el } = await workbench(1);
    cell(el, 'gyro.arw magnitude').input.focus();
    await press(el, 'ArrowDown');
    expect(cell(el, 'gyro.bi magnitude').input.tabIndex).to.equal(0);
    expect(cell(el, 'gyro.arw magnitude').input.tabIndex).to.equal(-1);
  });

  it('Enter starts an edit, Enter again commits and moves down', async () => {
    const { el, store } = await workbench(1);
    const arw = cell(el, 'gyro.arw magnitude');
    arw.input.focus();
    await press(el, 'Enter');
    expect(arw.cell.isEditing).to.equal(true);
    await sendKeys({ press: 'Backspace' });
    await sendKeys({ type: '9' });
    expect(await press(el, 'Enter')).to.equal('gyro.bi magnitude');
    expect(String(store.document.sensors[0].sources[0].value)).to.match(/9$/);
  });

  it('typing a character on an active cell starts an edit with it', async () => {
    const { el } = await workbench(1);
    const arw = cell(el, 'gyro.arw magnitude');
    arw.input.focus();
    await sendKeys({ type: '7' });
    await settle(el);
    expect(arw.cell.isEditing).to.equal(true);
    expect(arw.input.value).to.equal('7');
  });

  it('Escape cancels an edit and leaves the document alone', async () => {
    const { el, store } = await workbench(1);
    const arw = cell(el, 'gyro.arw magnitude');
    const before = arw.input.value;
    arw.input.focus();
    await sendKeys({ type: '123' });
    expect(await press(el, 'Escape')).to.equal('gyro.arw magnitude');
    expect(arw.cell.isEditing).to.equal(false);
    expect(arw.input.value).to.equal(before);
    expect(store.canUndo).to.equal(false);
  });

  it('Tab commits and moves right, Shift+Tab moves left', async () => {
    const { el, store } = await workbench(1);
    cell(el, 'gyro.arw magnitude').input.focus();
    await sendKeys({ type: '0.5' });
    expect(await press(el, 'Tab')).to.equal('gyro.arw unit');
    expect(store.document.sensors[0].sources[0].value).to.equal(0.5);
    expect(await press(el, 'Shift+Tab')).to.equal('gyro.arw magnitude');
    expect(await press(el, 'Shift+Tab')).to.equal('gyro.arw kind');
  });

  it('Tab from the last cell of a row goes to the first cell of the next', async () => {
    const { el } = await workbench(1);
    cell(el, 'gyro.arw provenance').input.focus();
    expect(await press(el, 'Tab')).to.equal('gyro.arw assumed');
    expect(await press(el, 'Tab')).to.equal('Row id of gyro.bi');
  });

  it('Alt+Down moves the active row down as one undoable step', async () => {
    const { el, store } = await workbench(1);
    cell(el, 'gyro.arw magnitude').input.focus();
    expect(await press(el, 'Alt+ArrowDown')).to.equal('gyro.arw magnitude');
    expect(store.document.sensors[0].sources.map((r) => r.id).slice(0, 2)).to.deep.equal(['bi', 'arw']);
    store.undo();
    expect(store.document.sensors[0].sources[0].id).to.equal('arw');
  });

  it('Ctrl+Z on a cell that is not being edited undoes the last edit once', async () => {
    const { el, store } = await workbench(1);
    store.setCell('sensors[0].sources[0].value', 1);
    store.setCell('sensors[0].sources[0].value', 2);
    await settle(el);
    cell(el, 'gyro.arw magnitude').input.focus();
    await press(el, 'Control+z');
    expect(store.document.sensors[0].sources[0].value).to.equal(1);
  });
});
