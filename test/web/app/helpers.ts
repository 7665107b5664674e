import { fixture, html, waitUntil } from '@open-wc/testing';
import type { SlApp } from '../../../web/components/sl-app';
import { Autosave } from '../../../web/state/autosave';
import '../../../web/components/sl-app';

/** A fresh <sl-app> with no autosaved work, waited on until its first results arrive. */
export async function freshApp(): Promise<SlApp> {
  await new Autosave().clear();
  return readyApp();
}

/** An <sl-app> as a reload would make it (restoring autosaved work), waited on until its results arrive. */
export async function readyApp(): Promise<SlApp> {
  const app = await fixture<SlApp>(html`<sl-app></sl-app>`);
  await waitUntil(() => app.compute.status === 'complete' && app.compute.view !== undefined, 'first results', { timeout: 15000 });
  return app;
}

/** Waits until the results match the document again after an edit. */
export async function recomputed(app: SlApp): Promise<void> {
  await waitUntil(() => app.compute.status === 'complete' && !app.compute.stale, 'recompute', { timeout: 15000 });
}

/** The text of an element inside the app's shadow root. */
export function shadowText(app: SlApp, selector: string): string {
  return app.shadowRoot!.querySelector(selector)?.textContent ?? '';
}
