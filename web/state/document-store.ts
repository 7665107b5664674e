import type { BudgetDocument, Cell } from '../../src';
import { setAtPath } from '../../src';

/** Most edits kept for undo. */
const UNDO_LIMIT = 500;

/** One undoable step: the document before and after, and what it was. */
interface HistoryEntry {
  label: string;
  before: BudgetDocument;
  after: BudgetDocument;
  /** File names before and after, for steps that open another file (undo brings the old name back). */
  fileNames?: { before: string; after: string };
}

/**
 * The open document and its edit history. Every change goes through
 * {@link edit}, which copies the document, applies the change and records
 * both versions, so undo and redo cover every edit. Documents are small
 * (kilobytes), so whole copies are simpler and safer than patches.
 *
 * Fires `change` (detail: { label }) after every edit, undo, redo or replace.
 */
export class DocumentStore extends EventTarget {
  private current: BudgetDocument;
  private undoStack: HistoryEntry[] = [];
  private redoStack: HistoryEntry[] = [];
  /** Name of the file the document came from or was last saved as. */
  fileName: string;

  constructor(doc: BudgetDocument, fileName = 'budget.json') {
    super();
    this.current = structuredClone(doc);
    this.fileName = fileName;
  }

  /** The current document. Treat it as read-only; change it with {@link edit}. */
  get document(): BudgetDocument {
    return this.current;
  }

  get canUndo(): boolean {
    return this.undoStack.length > 0;
  }

  get canRedo(): boolean {
    return this.redoStack.length > 0;
  }

  /** Label of the edit undo would revert, for the button's tooltip. */
  get undoLabel(): string | undefined {
    return this.undoStack[this.undoStack.length - 1]?.label;
  }

  get redoLabel(): string | undefined {
    return this.redoStack[this.redoStack.length - 1]?.label;
  }

  /** Applies `mutate` to a copy of the document and records it as one undoable step. */
  edit(label: string, mutate: (draft: BudgetDocument) => void): void {
    const before = this.current;
    const after = structuredClone(before);
    mutate(after);
    this.current = after;
    this.undoStack.push({ label, before, after });
    if (this.undoStack.length > UNDO_LIMIT) this.undoStack.shift();
    this.redoStack = [];
    this.changed(label);
  }

  /** Sets one value cell (`sensors[0].sources[1].value`) as an undoable edit. */
  setCell(path: string, content: Cell): void {
    this.edit(`edit ${path}`, (d) => setAtPath(d, path, content));
  }

  /** Replaces the whole document (opening a file) as an undoable step. */
  replace(doc: BudgetDocument, fileName: string, label = `open ${fileName}`): void {
    const fileNames = { before: this.fileName, after: fileName };
    this.fileName = fileName;
    this.edit(label, (d) => {
      for (const key of Object.keys(d)) delete (d as unknown as Record<string, unknown>)[key];
      Object.assign(d, structuredClone(doc));
    });
    this.undoStack[this.undoStack.length - 1].fileNames = fileNames;
  }

  undo(): void {
    const entry = this.undoStack.pop();
    if (!entry) return;
    this.redoStack.push(entry);
    this.current = entry.before;
    if (entry.fileNames) this.fileName = entry.fileNames.before;
    this.changed(`undo ${entry.label}`);
  }

  redo(): void {
    const entry = this.redoStack.pop();
    if (!entry) return;
    this.undoStack.push(entry);
    this.current = entry.after;
    if (entry.fileNames) this.fileName = entry.fileNames.after;
    this.changed(`redo ${entry.label}`);
  }

  /** The history, for autosave: restored on reload so undo survives it too. */
  snapshot(): { document: BudgetDocument; fileName: string; undo: HistoryEntry[]; redo: HistoryEntry[] } {
    return { document: this.current, fileName: this.fileName, undo: this.undoStack, redo: this.redoStack };
  }

  /** Restores a snapshot taken by {@link snapshot}. */
  restore(s: ReturnType<DocumentStore['snapshot']>): void {
    this.current = s.document;
    this.fileName = s.fileName;
    this.undoStack = s.undo;
    this.redoStack = s.redo;
    this.changed('restore autosaved work');
  }

  private changed(label: string): void {
    this.dispatchEvent(new CustomEvent('change', { detail: { label } }));
  }
}
