// Set-up of the 3-D page tests: the app with the 3-D example loaded from the
// examples menu, waits for its results, and typing into a cell as a user does.
import { waitUntil } from '@open-wc/testing';
import type { SlApp } from '../../../web/components/sl-app';
import { freshApp } from '../app/helpers';
import { deepQuery, settle } from '../workbench/helpers';
import type { SlCell } from '../../../web/components/sl-cell';

/** The 3-D example's file name in the menu. */
export const DRONE = 'survey-drone.json';

/** Waits until the view matches the document and holds every source's share (the worker's second answer). */
export async function computed3d(app: SlApp): Promise<void> {
  await waitUntil(
    () =>
      app.compute.status === 'complete' &&
      !app.compute.stale &&
      app.compute.view !== undefined &&
      !app.compute.view.contributionsPending,
    '3-D results',
    { timeout: 90000 },
  );
  await settle(app);
}

/** A fresh page with the 3-D example picked from the examples menu, its results in. */
export async function droneApp(): Promise<SlApp> {
  const app = await freshApp();
  const select = app.shadowRoot!.querySelector<HTMLSelectElement>('select[aria-label="Load an example budget"]')!;
  const option = [...select.options].find((o) => o.dataset.file === DRONE)!;
  select.value = option.value;
  select.dispatchEvent(new Event('change'));
  await app.updateComplete;
  await computed3d(app);
  return app;
}

/** Types `text` into the cell labelled `label` and presses Enter; returns the cell and its field. */
export async function typeInto(
  root: Element,
  label: string,
  text: string,
): Promise<{ cell: SlCell; input: HTMLInputElement }> {
  const cell = deepQuery<SlCell>(root, `sl-cell[label="${label}"]`);
  const input = cell.shadowRoot!.querySelector('input')!;
  input.focus();
  input.value = text;
  input.dispatchEvent(new Event('input'));
  input.dispatchEvent(new KeyboardEvent('keydown', { key: 'Enter', bubbles: true, composed: true }));
  await settle(root);
  return { cell, input };
}

/** The message a cell shows in place (its own refusal or the view's error). */
export function cellMessage(cell: SlCell): string {
  return cell.shadowRoot!.querySelector('.message')?.textContent ?? '';
}
