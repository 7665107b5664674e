/**
 * Keys a grid handles for the controls in its cells that are not text:
 * Enter opens a select's list or ticks a check box, and Ctrl+Z / Ctrl+Y
 * undo and redo through the store while no field is being edited.
 */
import type { DocumentStore } from '../state/document-store';

/** Enter on a select opens its list; on a check box it toggles it. Other targets are left alone. */
export function openControl(e: KeyboardEvent): void {
  const target = e.composedPath()[0];
  if (target instanceof HTMLSelectElement) {
    e.preventDefault();
    try {
      target.showPicker();
    } catch {
      // showPicker needs a user gesture; without one the list stays closed and Alt+Down still opens it.
    }
  } else if (target instanceof HTMLInputElement && target.type === 'checkbox') {
    e.preventDefault();
    target.click();
  }
}

/**
 * Ctrl+Z undoes, Ctrl+Shift+Z and Ctrl+Y redo. The event stops here: the
 * page's own shortcut skips text fields but not selects, and would undo twice.
 */
export function undoKeys(e: KeyboardEvent, store: DocumentStore): void {
  const key = e.key.toLowerCase();
  if (key !== 'z' && key !== 'y') return;
  e.preventDefault();
  e.stopPropagation();
  if (key === 'z' && !e.shiftKey) store.undo();
  else store.redo();
}
