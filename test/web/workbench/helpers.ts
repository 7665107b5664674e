// Shared set-up of the workbench tests: a workbench on a real example budget
// with a real view, and queries that reach through shadow roots.
import { fixture, html } from '@open-wc/testing';
import type { LitElement } from 'lit';
import type { BudgetDocument } from '../../../src/document';
import { computeView } from '../../../src/report/view-result';
import { EXAMPLES } from '../../../web/examples';
import { DocumentStore } from '../../../web/state/document-store';
import '../../../web/components/sl-workbench';
import type { SlWorkbench } from '../../../web/components/sl-workbench';
import type { SlCell } from '../../../web/components/sl-cell';

/** Every element matching `selector` under `root`, looking inside shadow roots too. */
export function deepQueryAll<T extends Element = HTMLElement>(root: Element | ShadowRoot | Document, selector: string): T[] {
  const found: T[] = [];
  const walk = (node: Element | ShadowRoot | Document) => {
    node.querySelectorAll(selector).forEach((e) => found.push(e as unknown as T));
    node.querySelectorAll('*').forEach((e) => e.shadowRoot && walk(e.shadowRoot));
  };
  walk(root);
  if (root instanceof Element && root.shadowRoot) walk(root.shadowRoot);
  return found;
}

/** The first element matching `selector` under `root`, through shadow roots; throws when there is none. */
export function deepQuery<T extends Element = HTMLElement>(root: Element | ShadowRoot | Document, selector: string): T {
  const [first] = deepQueryAll<T>(root, selector);
  if (!first) throw new Error(`nothing matches ${selector}`);
  return first;
}

/** Waits until every lit element under `root` has finished updating. */
export async function settle(root: Element): Promise<void> {
  for (let round = 0; round < 10; round++) {
    const elements = [root, ...deepQueryAll(root, '*')].filter((e) => 'updateComplete' in e) as LitElement[];
    const pending = await Promise.all(elements.map((e) => e.updateComplete));
    if (pending.every(Boolean)) break;
  }
  await new Promise((r) => requestAnimationFrame(() => r(undefined)));
}

/** A workbench on example `example` (or a document changed by `change`), with the view computed from it. */
export async function workbench(example = 0, change?: (d: BudgetDocument) => void) {
  const doc = structuredClone(EXAMPLES[example].document);
  change?.(doc);
  const store = new DocumentStore(doc, EXAMPLES[example].fileName);
  const el = await fixture<SlWorkbench>(html`<sl-workbench .store=${store} .view=${computeView(store.document)}></sl-workbench>`);
  await settle(el);
  return { el, store };
}

/** Recomputes the view from the store's document, as the page's compute worker would. */
export async function recompute(el: SlWorkbench, store: DocumentStore): Promise<void> {
  el.view = computeView(store.document);
  await settle(el);
}

/** The value cell with accessible name `label`, and its text field. */
export function cell(root: Element, label: string): { cell: SlCell; input: HTMLInputElement } {
  const c = deepQuery<SlCell>(root, `sl-cell[label="${label}"]`);
  return { cell: c, input: c.shadowRoot!.querySelector('input')! };
}

/** The element that has focus, looking inside shadow roots. */
export function deepActiveElement(): Element | null {
  let a: Element | null = document.activeElement;
  while (a?.shadowRoot?.activeElement) a = a.shadowRoot.activeElement;
  return a;
}

/** Picks `unit` in the unit picker with accessible name `label`, as a user would. */
export async function pickUnit(root: Element, label: string, unit: string): Promise<void> {
  const select = deepQuery<HTMLSelectElement>(root, `select[aria-label="${label}"]`);
  select.value = unit;
  select.dispatchEvent(new Event('change', { bubbles: true }));
  await settle(root);
}

/** The options a select with accessible name `label` offers. */
export function optionsOf(root: Element, label: string): string[] {
  return [...deepQuery<HTMLSelectElement>(root, `select[aria-label="${label}"]`).options].map((o) => o.value);
}

/** A clipboard event carrying `text`, as a paste from another program would. */
export function clipboardEvent(type: 'paste' | 'copy', text = ''): ClipboardEvent {
  const data = new DataTransfer();
  if (text) data.setData('text/plain', text);
  return new ClipboardEvent(type, { clipboardData: data, bubbles: true, composed: true, cancelable: true });
}

/** Clicks the button whose text is `text` inside `root`'s shadow tree. */
export async function clickButton(el: Element, host: string, text: string): Promise<void> {
  const button = deepQueryAll<HTMLButtonElement>(deepQuery(el, host).shadowRoot!, 'button').find((b) => b.textContent!.trim() === text);
  if (!button) throw new Error(`no button "${text}" in ${host}`);
  button.click();
  await settle(el);
}

/** Picks `value` in the select with accessible name `label`. */
export async function choose(el: Element, label: string, value: string): Promise<void> {
  const select = deepQuery<HTMLSelectElement>(el, `select[aria-label="${label}"]`);
  select.value = value;
  select.dispatchEvent(new Event('change', { bubbles: true }));
  await settle(el);
}
