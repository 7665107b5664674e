// Not part of `npm test` (the name does not end in .test.ts): run on demand with
//   npx web-test-runner test/web/app/autosave.bench.ts
// Times one autosave after an edit of a 0.8 MB budget at undo histories of
// 1, 180 and 400 edits (medians of 15 saves each), against writing the whole
// history as one record as autosave did before (the same browser, one run).
import { openDB } from 'idb';
import { EXAMPLES } from '../../../web/examples';
import { Autosave } from '../../../web/state/autosave';
import { DocumentStore } from '../../../web/state/document-store';

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];

async function timeSaves(store: DocumentStore, autosave: Autosave, saves: number, whole: boolean): Promise<number> {
  const db = await openDB('sigma-ledger-bench');
  const times: number[] = [];
  for (let i = 0; i < saves; i++) {
    store.edit(`edit ${i}`, (d) => (d.title = `title ${i}`));
    const started = performance.now();
    if (whole) await db.put('autosave', store.snapshot(), 'whole');
    else await autosave.save(store.snapshot());
    times.push(performance.now() - started);
  }
  db.close();
  return median(times);
}

describe('autosave cost per edit (benchmark)', () => {
  it('stays flat with the history length', async () => {
    const doc = structuredClone(EXAMPLES[0].document);
    doc.description = 'x'.repeat(800_000);
    const autosave = new Autosave('sigma-ledger-bench');
    await autosave.clear();
    const store = new DocumentStore(doc);
    const lines: string[] = [];
    for (const history of [1, 180, 400]) {
      while (store.snapshot().undo.length < history) store.edit('grow', (d) => (d.title = `grow ${store.snapshot().undo.length}`));
      await autosave.save(store.snapshot());
      const incremental = await timeSaves(store, autosave, 15, false);
      const whole = history <= 180 ? await timeSaves(store, autosave, 3, true) : NaN;
      lines.push(`history ${history}: incremental median ${incremental.toFixed(1)} ms, whole-history record ${whole.toFixed(0)} ms`);
    }
    console.log(`autosave of a 0.8 MB budget per edit:\n${lines.join('\n')}`);
    await autosave.clear();
  }).timeout(600_000);
});
