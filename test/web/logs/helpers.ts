// Shared set-up of the sensor-log tests: seeded noise, logs written as CSV
// Files, the import component on a real example budget, and waits for the
// log worker.
import { fixture, html } from '@open-wc/testing';
import type { BudgetDocument } from '../../../src/document';
import { EXAMPLES } from '../../../web/examples';
import { DocumentStore } from '../../../web/state/document-store';
import { seededRandom } from '../../fixtures/seeded-random';
import '../../../web/components/sl-log-import';
import type { SlLogImport } from '../../../web/components/sl-log-import';
import { deepQuery, deepQueryAll, settle } from '../workbench/helpers';

export { deepQuery, deepQueryAll, settle };

/** A seeded standard normal generator (Box-Muller on the seeded uniform generator of test/fixtures). */
export function normal(seed: number): () => number {
  const u = seededRandom(seed);
  return () => Math.sqrt(-2 * Math.log(1 - u())) * Math.cos(2 * Math.PI * u());
}

/** A CSV log "time,gyro_z" of white noise with per-sample sigma `sigma` at `rateHz` for `durationS`, as a File. */
export function whiteNoiseLog(name: string, sigma: number, rateHz: number, durationS: number, seed = 7): File {
  const next = normal(seed);
  const n = Math.round(rateHz * durationS);
  const lines = ['time,gyro_z'];
  for (let i = 0; i < n; i++) lines.push(`${(i / rateHz).toFixed(6)},${(sigma * next()).toPrecision(9)}`);
  return new File([lines.join('\n') + '\n'], name, { type: 'text/csv' });
}

/** The import component on a copy of example `example`, with its store. */
export async function logImport(example = 0): Promise<{ el: SlLogImport; store: DocumentStore; original: BudgetDocument }> {
  const original = structuredClone(EXAMPLES[example].document);
  const store = new DocumentStore(original, EXAMPLES[example].fileName);
  const el = await fixture<SlLogImport>(html`<sl-log-import .store=${store}></sl-log-import>`);
  await settle(el);
  return { el, store, original };
}

/** Waits until `done()` holds, polling; throws after `timeoutMs`. */
export async function waitFor(done: () => boolean, timeoutMs = 15000, what = 'the condition'): Promise<void> {
  const start = performance.now();
  while (!done()) {
    if (performance.now() - start > timeoutMs) throw new Error(`timed out waiting for ${what}`);
    await new Promise((r) => setTimeout(r, 20));
  }
}

/** Gives `file` to the component's file input, as a user picking it would, and waits for its header. */
export async function chooseFile(el: SlLogImport, file: File): Promise<void> {
  const input = deepQuery<HTMLInputElement>(el, 'input[type="file"]');
  const data = new DataTransfer();
  data.items.add(file);
  input.files = data.files;
  input.dispatchEvent(new Event('change', { bubbles: true }));
  await waitFor(() => el.jobs.status !== 'pending', 15000, 'the header');
  await settle(el);
}

/** Picks `value` in the select with id `id` (looking through shadow roots). */
export async function pick(el: Element, id: string, value: string): Promise<void> {
  const select = deepQuery<HTMLSelectElement>(el, `select#${id}`);
  select.value = value;
  select.dispatchEvent(new Event('change', { bubbles: true }));
  await settle(el);
}

/** Clicks the button with id `id` and waits for the log job it starts to end. */
export async function runAndWait(el: SlLogImport, id = 'run', timeoutMs = 30000): Promise<void> {
  deepQuery<HTMLButtonElement>(el, `button#${id}`).click();
  await settle(el);
  await waitFor(() => el.jobs.status !== 'pending', timeoutMs, 'the log job');
  await settle(el);
}
