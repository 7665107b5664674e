import { expect, waitUntil } from '@open-wc/testing';
import { parseBudgetDocument, serializeBudgetDocument } from '../../../src/document';
import { CAUTION } from '../../../src/report/caution';
import { EXAMPLES } from '../../../web/examples';
import { freshApp, readyApp, recomputed, shadowText } from './helpers';

describe('the page', () => {
  it('loads the demo budget, computes it and shows the caution', async () => {
    const app = await freshApp();
    expect(app.store.document.title).to.equal(EXAMPLES[0].document.title);
    expect(app.compute.view!.result!.series.t_s.length).to.be.greaterThan(100);
    expect(shadowText(app, '.caution')).to.contain(CAUTION);
    expect(shadowText(app, '.status')).to.contain('up to date');
  });

  it('recomputes after an edit, marking the old results stale until the new ones arrive', async () => {
    const app = await freshApp();
    const before = app.compute.view!.result!.series.heading_sigma_deg.at(-1)!;
    app.store.setCell('sensors[0].sources[1].value', 40); // gyro bias instability 4 -> 40 deg/h
    expect(app.compute.status).to.equal('pending');
    expect(app.compute.stale).to.equal(true);
    await recomputed(app);
    expect(app.compute.view!.result!.series.heading_sigma_deg.at(-1)!).to.be.greaterThan(before);
  });

  it('restores autosaved work, undo history included, after a reload', async () => {
    const app = await freshApp();
    app.store.edit('rename', (d) => (d.title = 'Edited before the reload'));
    await app.autosave.save(app.store.snapshot());
    app.remove();
    const reloaded = await readyApp();
    expect(reloaded.store.document.title).to.equal('Edited before the reload');
    reloaded.store.undo();
    expect(reloaded.store.document.title).to.equal(EXAMPLES[0].document.title);
  });

  it('undoes and redoes with Ctrl+Z and Ctrl+Shift+Z', async () => {
    const app = await freshApp();
    app.store.edit('rename', (d) => (d.title = 'changed'));
    window.dispatchEvent(new KeyboardEvent('keydown', { key: 'z', ctrlKey: true }));
    expect(app.store.document.title).to.equal(EXAMPLES[0].document.title);
    window.dispatchEvent(new KeyboardEvent('keydown', { key: 'Z', ctrlKey: true, shiftKey: true }));
    expect(app.store.document.title).to.equal('changed');
  });

  it('saves the same JSON the command line reads, and opening it again gives the same budget', async () => {
    const app = await freshApp();
    app.store.setCell('sensors[0].sources[1].value', '=3*2');
    let saved: Blob | undefined;
    const original = URL.createObjectURL;
    URL.createObjectURL = (blob: Blob) => { saved = blob; return 'blob:test'; };
    try {
      (app.shadowRoot!.querySelector('button[title^="Save"]') as HTMLButtonElement).click();
    } finally {
      URL.createObjectURL = original;
    }
    const text = await saved!.text();
    expect(text).to.equal(serializeBudgetDocument(app.store.document));
    app.store.edit('scribble', (d) => (d.title = 'scribbled'));
    const input = app.shadowRoot!.querySelector('input[type=file]') as HTMLInputElement;
    const transfer = new DataTransfer();
    transfer.items.add(new File([text], 'round-trip.json', { type: 'application/json' }));
    input.files = transfer.files;
    input.dispatchEvent(new Event('change'));
    await waitUntil(() => app.store.fileName === 'round-trip.json', 'reopened');
    expect(app.store.document).to.deep.equal(parseBudgetDocument(text, 'x').document);
    expect(app.store.document.sensors[0].sources[1].value).to.equal('=3*2');
  });

  it('refuses a broken file with a message and keeps the current budget', async () => {
    const app = await freshApp();
    const title = app.store.document.title;
    const input = app.shadowRoot!.querySelector('input[type=file]') as HTMLInputElement;
    const transfer = new DataTransfer();
    transfer.items.add(new File(['{"format": "sigma-ledger-budget", '], 'broken.json'));
    input.files = transfer.files;
    input.dispatchEvent(new Event('change'));
    await waitUntil(() => shadowText(app, '.banner').includes('broken.json'), 'message');
    expect(shadowText(app, '.banner')).to.contain('not valid JSON');
    expect(app.store.document.title).to.equal(title);
  });
});
