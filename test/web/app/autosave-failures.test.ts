/**
 * Hostile corpus, autosave in a real browser: a write that fails (storage
 * full, IndexedDB blocked) is shown at once with a download of the current
 * budget, a damaged autosave record falls back to the last good version and
 * says so, and an edit writes one document version however long the undo
 * history is. Nothing typed is lost in any case.
 */
import { expect, waitUntil } from '@open-wc/testing';
import { openDB } from 'idb';
import { EXAMPLES } from '../../../web/examples';
import { Autosave } from '../../../web/state/autosave';
import { freshApp, readyApp } from './helpers';

const banner = (app: HTMLElement) => app.shadowRoot!.querySelector('.save-failed');

/** Makes every IndexedDB put fail with `name` until the returned function is called. */
function failPuts(name: string): () => void {
  const original = IDBObjectStore.prototype.put;
  IDBObjectStore.prototype.put = function () {
    throw new DOMException('stubbed failure', name);
  };
  return () => (IDBObjectStore.prototype.put = original);
}

describe('autosave failures and damage', () => {
  it('warns at once when a write fails with QuotaExceededError, keeps the edit, and offers it for download', async () => {
    const app = await freshApp();
    const restore = failPuts('QuotaExceededError');
    let downloaded: Blob | undefined;
    const createObjectURL = URL.createObjectURL;
    URL.createObjectURL = (b: Blob) => ((downloaded = b), 'blob:stub');
    try {
      app.store.edit('rename', (d) => (d.title = 'Typed while storage was full'));
      await waitUntil(() => banner(app), 'save warning', { timeout: 5000 });
      expect(banner(app)!.textContent).to.contain("the browser's storage for this page is full");
      expect(app.store.document.title).to.equal('Typed while storage was full');
      (banner(app)!.querySelector('button') as HTMLButtonElement).click();
      expect(JSON.parse(await downloaded!.text()).title).to.equal('Typed while storage was full');
    } finally {
      restore();
      URL.createObjectURL = createObjectURL;
    }
    // The warning stays until a write succeeds again.
    app.store.edit('rename again', (d) => (d.title = 'Saved again'));
    await waitUntil(() => !banner(app), 'warning cleared', { timeout: 5000 });
    app.remove();
  });

  it('warns when IndexedDB cannot be opened at all (blocked storage)', async () => {
    await new Autosave().clear();
    const open = IDBFactory.prototype.open;
    IDBFactory.prototype.open = function () {
      throw new DOMException('stubbed', 'SecurityError');
    };
    try {
      const app = await readyApp();
      await waitUntil(() => banner(app), 'save warning', { timeout: 5000 });
      expect(banner(app)!.textContent).to.contain('does not allow this page to store data');
      app.store.edit('typed', (d) => (d.title = 'Typed with storage blocked'));
      expect(app.store.document.title).to.equal('Typed with storage blocked');
      app.remove();
    } finally {
      IDBFactory.prototype.open = open;
    }
  });

  it('restores the last good version when the shown one is damaged, and says so', async () => {
    const app = await freshApp();
    app.store.edit('first', (d) => (d.title = 'Good version'));
    app.store.edit('second', (d) => (d.title = 'Version that gets damaged'));
    await app.autosave.save(app.store.snapshot());
    app.remove();
    // Damage the newest version record as a crash mid-write might.
    const db = await openDB('sigma-ledger');
    const head = await db.get('head', 'current');
    await db.put('versions', { id: head.ids[head.position], document: { format: 'sigma-ledger-budget', sensors: 'damaged' } });
    db.close();
    const reloaded = await readyApp();
    expect(reloaded.store.document.title).to.equal('Good version');
    expect(reloaded.compute.view!.result).to.not.equal(undefined);
    expect(reloaded.shadowRoot!.querySelector('.banner')!.textContent).to.contain('The autosaved budget was damaged; the last good version (after "first") is restored, 1 edit earlier');
    reloaded.store.undo();
    expect(reloaded.store.document.title).to.equal(EXAMPLES[0].document.title);
    reloaded.remove();
  });

  it('writes one document version per edit and only the index on undo, at any history length', async () => {
    const app = await freshApp();
    for (let i = 0; i < 30; i++) app.store.edit(`edit ${i}`, (d) => (d.title = `title ${i}`));
    await app.autosave.save(app.store.snapshot());
    const original = IDBObjectStore.prototype.put;
    const stores: string[] = [];
    IDBObjectStore.prototype.put = function (...args: Parameters<IDBObjectStore['put']>) {
      stores.push(this.name);
      return original.apply(this, args);
    };
    try {
      app.store.edit('one more', (d) => (d.title = 'one more'));
      await app.autosave.save(app.store.snapshot());
      expect(stores.sort()).to.deep.equal(['head', 'head', 'versions']);
      stores.length = 0;
      app.store.undo();
      await app.autosave.save(app.store.snapshot());
      expect(stores).to.deep.equal(['head', 'head']);
    } finally {
      IDBObjectStore.prototype.put = original;
    }
    app.remove();
    const reloaded = await readyApp();
    expect(reloaded.store.document.title).to.equal('title 29');
    reloaded.store.redo();
    expect(reloaded.store.document.title).to.equal('one more');
    reloaded.remove();
  });
});
