// Real views of the bundled example budgets for the findings' browser tests.
import type { BudgetDocument } from '../../../src/document';
import { computeView, type ViewResult } from '../../../src/report/view-result';
import { EXAMPLES } from '../../../web/examples';

/** Example indices in web/examples.ts. */
export const ORCHARD = 0, HARBOUR = 1, WAREHOUSE = 2;

const cache = new Map<number, ViewResult>();

/** The view of example `i`, computed once per test file (callers must not change it). */
export function exampleView(i: number): ViewResult {
  if (!cache.has(i)) cache.set(i, computeView(EXAMPLES[i].document));
  return cache.get(i)!;
}

/** The view of a copy of example `i` after `edit`. */
export function editedView(i: number, edit: (doc: BudgetDocument) => void): ViewResult {
  const doc = structuredClone(EXAMPLES[i].document);
  edit(doc);
  return computeView(doc);
}

/** The element's shadow root, which every sl-* component has. */
export function shadow(el: Element): ShadowRoot {
  return el.shadowRoot!;
}
