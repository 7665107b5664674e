/**
 * The store's document read and edited as a 3-D budget. The store holds
 * either model (a 3-D document passes through it untouched); these helpers
 * give the 3-D editors typed access without changing the store's type.
 */
import type { BudgetDocument, InertialBudgetDocument } from '../../src';
import type { DocumentStore } from '../state/document-store';

/** The store's document as a 3-D budget (callers check `model` first). */
export function inertialDoc(store: DocumentStore): InertialBudgetDocument {
  return store.document as unknown as InertialBudgetDocument;
}

/** One undoable edit of the 3-D document (undo, redo and autosave cover it as any edit). */
export function editInertial(store: DocumentStore, label: string, mutate: (d: InertialBudgetDocument) => void): void {
  store.edit(label, (d: BudgetDocument) => mutate(d as unknown as InertialBudgetDocument));
}
