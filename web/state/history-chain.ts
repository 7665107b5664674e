/**
 * The document store's undo history as the chain of versions it walks
 * through: version 0 is the oldest kept, each later one the document after
 * one edit, and `position` the version shown (versions after it are redo).
 * Autosave stores each version once, so an edit writes one document and a
 * small index, however long the history (see autosave.ts).
 */
import type { BudgetDocument } from '../../src';
import type { DocumentStore } from './document-store';

/** What DocumentStore.snapshot() gives and restore() takes. */
export type Snapshot = ReturnType<DocumentStore['snapshot']>;

/** The history as versions and the labels of the edits between them. */
export interface Chain {
  documents: BudgetDocument[];
  /** labels[k] is the edit that made version k from version k-1 (labels[0] is unused). */
  labels: string[];
  position: number;
}

/** The chain of a snapshot. Throws nothing. */
export function chainOf(s: Snapshot): Chain {
  const redo = [...s.redo].reverse();
  const documents = [s.undo[0]?.before ?? s.document, ...s.undo.map((e) => e.after), ...redo.map((e) => e.after)];
  const labels = ['', ...s.undo.map((e) => e.label), ...redo.map((e) => e.label)];
  return { documents, labels, position: s.undo.length };
}

/** The snapshot of a chain (inverse of {@link chainOf}). Throws nothing for a chain with position within it. */
export function snapshotOf(c: Chain, fileName: string): Snapshot {
  const entry = (k: number) => ({ label: c.labels[k], before: c.documents[k - 1], after: c.documents[k] });
  const undo = Array.from({ length: c.position }, (_, i) => entry(i + 1));
  const redo = Array.from({ length: c.documents.length - 1 - c.position }, (_, i) => entry(c.documents.length - 1 - i));
  return { document: c.documents[c.position], fileName, undo, redo };
}
