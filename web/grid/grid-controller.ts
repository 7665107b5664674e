/**
 * The source grid's behaviour behind its template: the active cell and row
 * selection, keys, focus, the clipboard, and the edits they start. A lit
 * reactive controller, so the grid component stays a view.
 */
import type { LitElement, ReactiveController, ReactiveControllerHost } from 'lit';
import type { SensorEntry } from '../../src';
import type { SourceKind } from '../../src';
import type { ViewResult } from '../../src';
import type { DocumentStore } from '../state/document-store';
import type { CellCommitDetail, CellMove } from '../components/sl-cell';
import { openControl, undoKeys } from './grid-keys';
import { keyMove, moveInGrid, type GridMove, type GridPosition } from './grid-navigation';
import { rowsAsText } from './paste-rows';
import { columnIndex } from './source-columns';
import type { SourceCellContext } from './source-cells';
import {
  addSourceRow, changeSourceUnit, deleteSourceRow, moveSourceRow, pasteSourceRows, pickSourceField, renameSourceRow,
  setProvenance, setSourceCell, type PasteResult,
} from './source-edits';

/** What the controller needs of its grid element. */
export interface SourceGridHost extends ReactiveControllerHost, HTMLElement {
  store: DocumentStore;
  sensorIndex: number;
  readonly sensor: SensorEntry | undefined;
  present(): boolean[][];
  readonly renderRoot: HTMLElement | DocumentFragment;
}

const CELL_MOVES: Record<CellMove, GridMove> = { down: 'down', up: 'up', next: 'next', previous: 'previous', none: 'none' };

/** True when the event comes from a cell being edited (whose keys and clipboard belong to its field). */
function fromEditingCell(e: Event): boolean {
  return e.composedPath().some((n) => (n as { isEditing?: boolean }).isEditing === true);
}

/** True for clipboard events of the grid's table, or sent to the grid itself (not of its toolbar or paste report). */
function forTheTable(e: Event, host: HTMLElement): boolean {
  const path = e.composedPath();
  return path[0] === host || path.some((n) => n instanceof HTMLTableElement);
}

/** Keyboard, focus, clipboard and edits of an sl-source-grid. */
export class GridController implements ReactiveController {
  /** The active cell. */
  active: GridPosition = { row: 0, col: 0 };
  /** What the last paste did, shown until dismissed. */
  pasteResult?: PasteResult;
  private anchor?: number;
  private focusWanted = false;

  constructor(private readonly host: SourceGridHost) {
    host.addController(this);
  }

  hostConnected(): void {
    for (const [type, fn] of this.clipboard()) this.host.addEventListener(type, fn);
  }

  hostDisconnected(): void {
    for (const [type, fn] of this.clipboard()) this.host.removeEventListener(type, fn);
  }

  private clipboard(): ['paste' | 'copy', (e: ClipboardEvent) => void][] {
    return [['paste', this.pasted], ['copy', this.copied]];
  }

  /** Back to the first cell, no selection, no paste report (another sensor was selected). */
  reset(): void {
    this.active = { row: 0, col: 0 };
    this.anchor = undefined;
    this.pasteResult = undefined;
  }

  /** Keeps the active cell on an existing cell after rows or columns went away. */
  clamp(): void {
    this.active = moveInGrid(this.host.present(), this.active, 'none') ?? { row: 0, col: 0 };
  }

  /** True when row `r` is in the Shift+arrow selection (or is the active row). */
  isSelected(r: number): boolean {
    const [lo, hi] = this.rowRange();
    return this.anchor !== undefined && r >= lo && r <= hi;
  }

  /** The handlers the cell templates call. */
  cellContext(sensor: SensorEntry, sensorIndex: number, view: ViewResult | undefined): SourceCellContext {
    const { store } = this.host;
    return {
      sensor, sensorIndex, view,
      tab: (r, c) => (r === this.active.row && c === this.active.col ? 0 : -1),
      commit: (r, key, e) => this.commit(r, key, e),
      unit: (r, field, e) => this.note(changeSourceUnit(store, sensorIndex, r, field, e.detail.unit)),
      pick: (r, key, value) => pickSourceField(store, sensorIndex, r, key, value),
    };
  }

  /** Moves the active cell and focuses it after the next render; undefined past the grid's ends. */
  move(m: GridMove): GridPosition | undefined {
    const next = moveInGrid(this.host.present(), this.active, m);
    if (!next) return undefined;
    this.active = next;
    this.focusWanted = true;
    this.host.requestUpdate();
    return next;
  }

  /** Called by the grid after each render. */
  focusIfWanted(): void {
    if (!this.focusWanted) return;
    this.focusWanted = false;
    void this.focusActive();
  }

  /** Adds a row of `kind` and makes its magnitude the active cell. */
  addRow(kind: SourceKind): void {
    const row = addSourceRow(this.host.store, this.host.sensorIndex, kind);
    this.setActive({ row, col: columnIndex('value') }, true);
  }

  /** Moves the active row up (-1) or down (+1); `refocus` returns focus to the grid (keyboard use). */
  moveRow(delta: number, refocus = false): void {
    if (!this.host.sensor?.sources.length) return;
    const row = moveSourceRow(this.host.store, this.host.sensorIndex, this.active.row, delta);
    this.setActive({ row, col: this.active.col }, refocus);
  }

  /** Deletes the active row. */
  deleteRow(): void {
    if (!this.host.sensor?.sources.length) return;
    deleteSourceRow(this.host.store, this.host.sensorIndex, this.active.row);
    this.anchor = undefined;
    this.setActive({ row: Math.max(0, this.active.row - 1), col: this.active.col }, false);
  }

  /** Pastes tab-separated rows and keeps the report. */
  paste(text: string): void {
    const result = pasteSourceRows(this.host.store, this.host.sensorIndex, text);
    this.pasteResult = result;
    this.host.requestUpdate();
    const used = result.added + result.replaced;
    this.note(`Pasted ${used} row${used === 1 ? '' : 's'}${result.problems.length ? `; ${result.problems.length} line(s) need fixing` : ''}.`);
  }

  /** Hides the paste report. */
  dismissPaste(): void {
    this.pasteResult = undefined;
    this.host.requestUpdate();
  }

  /** Keys that reach the grid: those of cells not being edited, selects and check boxes. */
  readonly keydown = (e: KeyboardEvent): void => {
    const pos = this.positionOf(e);
    if (!pos) return;
    this.active = pos;
    if ((e.ctrlKey || e.metaKey) && !e.altKey) return undoKeys(e, this.host.store);
    if (e.altKey && (e.key === 'ArrowUp' || e.key === 'ArrowDown')) {
      e.preventDefault();
      return this.moveRow(e.key === 'ArrowUp' ? -1 : 1, true);
    }
    if (e.key === 'Enter') return openControl(e);
    const m = keyMove(e);
    if (!m) return;
    if (e.shiftKey && (m === 'up' || m === 'down')) this.anchor ??= pos.row;
    else if (m !== 'next' && m !== 'previous') this.anchor = undefined;
    if (this.move(m)) e.preventDefault(); // past the ends, Tab leaves the grid
  };

  /** Clicks and focus moves make the focused cell the active one. */
  readonly focusin = (e: FocusEvent): void => {
    const pos = this.positionOf(e);
    if (pos && (pos.row !== this.active.row || pos.col !== this.active.col)) this.setActive(pos, false);
  };

  private setActive(pos: GridPosition, focus: boolean): void {
    this.active = pos;
    this.focusWanted ||= focus;
    this.host.requestUpdate();
  }

  private commit(r: number, key: string, e: CustomEvent<CellCommitDetail>): void {
    const { content, changed, move } = e.detail;
    const { store, sensorIndex: s } = this.host;
    if (changed && key === 'id') {
      const problem = renameSourceRow(store, s, r, String(content ?? ''));
      if (problem) return e.detail.reject(problem);
    } else if (changed && key === 'provenance') setProvenance(store, s, r, String(content ?? ''));
    else if (changed) setSourceCell(store, s, r, key === 'value' ? 'value' : key === 'tau' ? 'correlationTime' : 'rate', content);
    this.active = { row: r, col: this.active.col };
    if (move !== 'none') this.move(CELL_MOVES[move]);
  }

  private readonly copied = (e: ClipboardEvent): void => {
    const rows = this.host.sensor?.sources;
    if (!forTheTable(e, this.host) || fromEditingCell(e) || !rows?.length) return;
    const [lo, hi] = this.rowRange();
    e.clipboardData?.setData('text/plain', rowsAsText(rows.slice(lo, hi + 1)));
    e.preventDefault();
    this.note(`Copied ${hi - lo + 1} row${hi > lo ? 's' : ''} as tab-separated text.`);
  };

  private readonly pasted = (e: ClipboardEvent): void => {
    if (!forTheTable(e, this.host)) return;
    const text = e.clipboardData?.getData('text/plain') ?? '';
    const oneValue = !/[\t\n\r]/.test(text.replace(/[\r\n]+$/, ''));
    if (oneValue && fromEditingCell(e)) return; // an ordinary paste into the field being edited
    e.preventDefault();
    const cell = this.activeElement() as { startEditing?: (t: string) => void } | null;
    if (oneValue && cell?.startEditing) return cell.startEditing(text.trim());
    this.paste(text);
  };

  private rowRange(): [number, number] {
    const a = this.anchor ?? this.active.row;
    return [Math.min(a, this.active.row), Math.max(a, this.active.row)];
  }

  private positionOf(e: Event): GridPosition | undefined {
    for (const n of e.composedPath()) {
      if (n === this.host) return undefined;
      if (n instanceof HTMLTableCellElement && n.dataset.row !== undefined) return { row: Number(n.dataset.row), col: Number(n.dataset.col) };
    }
    return undefined;
  }

  private activeElement(): HTMLElement | null {
    const { row, col } = this.active;
    return this.host.renderRoot.querySelector(`td[data-row="${row}"][data-col="${col}"] .f`);
  }

  private async focusActive(): Promise<void> {
    const el = this.activeElement();
    if (!el) return;
    if ('updateComplete' in el) await (el as LitElement).updateComplete;
    el.focus();
  }

  private note(message: string): void {
    this.host.dispatchEvent(new CustomEvent('sl-note', { detail: { message }, bubbles: true, composed: true }));
  }
}
