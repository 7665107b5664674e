import { expect } from '@open-wc/testing';
import { EXAMPLES } from '../../../web/examples';
import { freshApp } from './helpers';

async function pickExample(app: Awaited<ReturnType<typeof freshApp>>, index: number) {
  const select = app.shadowRoot!.querySelector<HTMLSelectElement>('select[aria-label="Load an example budget"]')!;
  select.value = String(index);
  select.dispatchEvent(new Event('change'));
  await app.updateComplete;
}

describe('the examples menu', () => {
  const realConfirm = window.confirm;
  afterEach(() => { window.confirm = realConfirm; });

  it('asks before replacing an edited budget, and keeps it when the answer is no', async () => {
    const app = await freshApp();
    app.store.setCell('sensors[0].sources[0].value', 0.5);
    let asked = '';
    window.confirm = (text?: string) => { asked = text ?? ''; return false; };
    await pickExample(app, 1);
    expect(asked).to.contain(EXAMPLES[1].document.title);
    expect(app.store.document.title).to.equal(EXAMPLES[0].document.title);
    expect(app.store.document.sensors[0].sources[0].value).to.equal(0.5);
  });

  it('replaces it on yes, and Undo brings back the budget and its file name', async () => {
    const app = await freshApp();
    app.store.setCell('sensors[0].sources[0].value', 0.5);
    window.confirm = () => true;
    await pickExample(app, 1);
    expect(app.store.fileName).to.equal(EXAMPLES[1].fileName);
    app.store.undo();
    expect([app.store.fileName, app.store.document.sensors[0].sources[0].value]).to.deep.equal([EXAMPLES[0].fileName, 0.5]);
  });
});
