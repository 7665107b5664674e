import { expect } from '@open-wc/testing';
import { sendKeys } from '@web/test-runner-commands';
import { cell, deepQuery, settle, workbench } from './helpers';

describe('editing a cell of the grid', () => {
  it('typing a number and pressing Enter sets the row magnitude in the document, and undo restores it', async () => {
    const { el, store } = await workbench(1);
    const before = store.document.sensors[0].sources[0].value;
    const { input } = cell(el, 'gyro.arw magnitude');
    input.focus();
    await sendKeys({ type: '0.25' });
    await sendKeys({ press: 'Enter' });
    await settle(el);
    expect(store.document.sensors[0].sources[0].value).to.equal(0.25);
    expect(store.undoLabel).to.equal('edit sensors[0].sources[0].value');
    store.undo();
    await settle(el);
    expect(store.document.sensors[0].sources[0].value).to.equal(before);
    expect(cell(el, 'gyro.arw magnitude').input.value).to.equal(String(before));
  });

  it('a formula is stored as text and its evaluated number is shown under it', async () => {
    const { el, store } = await workbench(3);
    const { cell: c } = cell(el, 'gyro.arw magnitude');
    expect(store.document.sensors[0].sources[0].value).to.match(/^=CONVERTUNIT/);
    const value = c.shadowRoot!.querySelector('.value')!.textContent!;
    expect(value.endsWith('= 0.3'), value).to.equal(true);
    // A formula wider than its field is shown whole on that line, so nothing of it is hidden.
    const input = c.shadowRoot!.querySelector('input')!;
    const whole = c.shadowRoot!.querySelector('.value .whole');
    const cut = input.scrollWidth > input.clientWidth + 1;
    expect(whole?.textContent ?? '').to.equal(cut ? String(store.document.sensors[0].sources[0].value) : '');
  });

  it('text that is neither a number nor a formula stays in the cell with a message and changes nothing', async () => {
    const { el, store } = await workbench(1);
    const { cell: c, input } = cell(el, 'gyro.arw magnitude');
    input.focus();
    await sendKeys({ type: 'about 3' });
    await sendKeys({ press: 'Enter' });
    await settle(el);
    expect(store.canUndo).to.equal(false);
    expect(c.isEditing).to.equal(true);
    expect(input.value).to.equal('about 3');
    expect(c.shadowRoot!.querySelector('[role="alert"]')!.textContent).to.contain('type a number');
  });

  it('a cell named in the view errors shows the message in place while other cells do not', async () => {
    const { el } = await workbench(1, (d) => (d.sensors[0].sources[1].value = '=nosuchname*2'));
    const bad = cell(el, 'gyro.bi magnitude');
    const good = cell(el, 'gyro.arw magnitude');
    expect(bad.input.getAttribute('aria-invalid')).to.equal('true');
    const described = bad.cell.shadowRoot!.getElementById(bad.input.getAttribute('aria-describedby')!.split(' ').pop()!)!;
    expect(described.textContent).to.contain('nosuchname');
    const grid = deepQuery(el, 'sl-source-grid');
    const visible = [...grid.shadowRoot!.querySelectorAll('tr.messages')];
    expect(visible).to.have.length(1);
    expect(visible[0].textContent).to.contain('Magnitude').and.contain('nosuchname');
    expect((visible[0] as HTMLElement).offsetHeight).to.be.greaterThan(0);
    expect(good.input.getAttribute('aria-invalid')).to.equal('false');
    expect(good.input.hasAttribute('aria-describedby')).to.equal(false);
  });

  it('the workbench re-renders when the store changes outside it', async () => {
    const { el, store } = await workbench(1);
    store.setCell('sensors[0].sources[0].value', '=1+2');
    await settle(el);
    expect(cell(el, 'gyro.arw magnitude').input.value).to.equal('=1+2');
  });

  it('stops listening to the store when removed from the page', async () => {
    const { el, store } = await workbench(1);
    el.remove();
    let updates = 0;
    const original = el.requestUpdate.bind(el);
    el.requestUpdate = (...args: Parameters<typeof original>) => {
      updates++;
      original(...args);
    };
    store.setCell('sensors[0].sources[0].value', 1);
    expect(updates).to.equal(0);
  });
});
