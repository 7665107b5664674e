/**
 * The grid's edits of one sensor's rows, each one undoable step through the
 * store. Functions take the store and the sensor's index and return what the
 * grid should say or select next.
 */
import type { Cell, SourceRow } from '../../src';
import type { SourceKind } from '../../src';
import { unitDimension } from '../../src';
import type { DocumentStore } from '../state/document-store';
import { changeUnit } from '../../src';
import { idProblem } from '../../src';
import { applyPastedRows, parsePastedRows, type PasteProblem } from './paste-rows';
import { changeRowKind, moveItem, newRow, renameRow } from './row-edits';
import { rowOption } from './source-columns';
import type { UnitField } from './source-cells';

/** What a paste did: rows added and overwritten, and the lines it could not use. */
export interface PasteResult {
  added: number;
  replaced: number;
  problems: PasteProblem[];
}

const rowOf = (store: DocumentStore, s: number, r: number): SourceRow => store.document.sensors[s].sources[r];
const nameOf = (store: DocumentStore, s: number, r: number) => `${store.document.sensors[s].id}.${rowOf(store, s, r).id}`;

/** Renames a row (and formulas using it); returns why the id is refused, or undefined when done. */
export function renameSourceRow(store: DocumentStore, s: number, r: number, id: string): string | undefined {
  const others = store.document.sensors[s].sources.filter((_, i) => i !== r).map((x) => x.id);
  const problem = idProblem(id, others, 'row id');
  if (problem) return problem;
  store.edit(`rename ${nameOf(store, s, r)} to ${id}`, (d) => renameRow(d, s, r, id));
  return undefined;
}

/** Sets a row's magnitude, correlation time or rate cell; an empty optional cell removes it. */
export function setSourceCell(store: DocumentStore, s: number, r: number, field: UnitField, content: Cell | undefined): void {
  if (field === 'value') return store.setCell(`sensors[${s}].sources[${r}].value`, content!);
  const unit = field === 'rate' ? 'Hz' : 's';
  store.edit(`${content === undefined ? 'clear' : 'edit'} ${nameOf(store, s, r)} ${field}`, (d) => {
    const row = d.sensors[s].sources[r];
    if (content === undefined) delete row[field];
    else if (row[field]) row[field]!.value = content;
    else row[field] = { value: content, unit };
  });
}

/** Sets a row's provenance text. */
export function setProvenance(store: DocumentStore, s: number, r: number, text: string): void {
  store.edit(`edit ${nameOf(store, s, r)} provenance`, (d) => (d.sensors[s].sources[r].provenance = text));
}

/** Changes the unit of a row's field, converting the value; a range-bearing row's component follows the unit. Returns the note. */
export function changeSourceUnit(store: DocumentStore, s: number, r: number, field: UnitField, unit: string): string {
  let note = '';
  store.edit(`change unit of ${nameOf(store, s, r)} ${field === 'value' ? '' : `${field} `}to ${unit}`, (d) => {
    const path = `sensors[${s}].sources[${r}]${field === 'value' ? '' : `.${field}`}`;
    note = changeUnit(d, path, unit);
    const row = d.sensors[s].sources[r];
    if (field === 'value' && row.component !== undefined) row.component = unitDimension(unit) === 'angle' ? 'bearing' : 'range';
  });
  return `${nameOf(store, s, r)}: ${note}`;
}

/** Applies a pick of the kind select, the option select or the assumed box. */
export function pickSourceField(store: DocumentStore, s: number, r: number, key: 'kind' | 'option' | 'assumed', value: string | boolean): void {
  const name = nameOf(store, s, r);
  store.edit(`set ${name} ${key}`, (d) => {
    const sensor = d.sensors[s];
    const row = sensor.sources[r];
    if (key === 'kind') changeRowKind(row, sensor.kind, value as SourceKind);
    else if (key === 'assumed') row.assumed = value as boolean;
    else {
      const option = rowOption(sensor.kind, row);
      if (option) (row as unknown as Record<string, unknown>)[option.field] = value;
    }
  });
}

/** Adds a row of `kind` at the end; returns its index. */
export function addSourceRow(store: DocumentStore, s: number, kind: SourceKind): number {
  const sensor = store.document.sensors[s];
  const row = newRow(sensor.kind, kind, sensor.sources.map((x) => x.id));
  store.edit(`add row ${sensor.id}.${row.id}`, (d) => d.sensors[s].sources.push(row));
  return sensor.sources.length;
}

/** Moves row `r` by `delta`; returns its new index. */
export function moveSourceRow(store: DocumentStore, s: number, r: number, delta: number): number {
  const to = r + delta;
  if (to < 0 || to >= store.document.sensors[s].sources.length) return r;
  store.edit(`move ${nameOf(store, s, r)} ${delta < 0 ? 'up' : 'down'}`, (d) => moveItem(d.sensors[s].sources, r, delta));
  return to;
}

/** Deletes row `r`; formulas that used it then show an error, and undo brings it back. */
export function deleteSourceRow(store: DocumentStore, s: number, r: number): void {
  store.edit(`delete ${nameOf(store, s, r)}`, (d) => d.sensors[s].sources.splice(r, 1));
}

/** Pastes tab-separated rows into sensor `s` as one undoable step. */
export function pasteSourceRows(store: DocumentStore, s: number, text: string): PasteResult {
  const sensor = store.document.sensors[s];
  const { rows, problems } = parsePastedRows(text, sensor.kind);
  let counts = { added: 0, replaced: 0 };
  if (rows.length > 0) {
    store.edit(`paste ${rows.length} row${rows.length > 1 ? 's' : ''} into ${sensor.id}`, (d) => (counts = applyPastedRows(d.sensors[s], rows)));
  }
  return { ...counts, problems };
}
