import { expect } from '@open-wc/testing';
import { deepQuery, settle, workbench } from './helpers';

describe('the table level', () => {
  it('is set from the Requirements tab as an undoable edit, and 1σ removes it from the file', async () => {
    const { el, store } = await workbench(0);
    el.show('requirements');
    await settle(el);
    const select = deepQuery<HTMLSelectElement>(el, 'select[aria-label="Level of the budget tables"]');
    select.value = '95%';
    select.dispatchEvent(new Event('change', { bubbles: true }));
    expect(store.document.settings.level).to.equal('95%');
    select.value = '1sigma';
    select.dispatchEvent(new Event('change', { bubbles: true }));
    expect('level' in store.document.settings).to.equal(false);
    store.undo();
    expect(store.document.settings.level).to.equal('95%');
  });
});
