/**
 * Edits of a row's filter design (`tuning`, docs/suboptimal-filter.md), each
 * one undoable step through the store: the value the filter is tuned with,
 * left out, the variance inflation and the state model. A design that says
 * nothing any more is removed, so the row reads as "filter = truth".
 */
import type { Cell, RowTuning, TuningModel } from '../../src';
import type { DocumentStore } from '../state/document-store';

/** One field of a row's filter design and its new content (undefined clears it). */
export type TuningPatch =
  | { field: 'value'; content: Cell | undefined }
  | { field: 'leftOut'; on: boolean }
  | { field: 'inflation'; factor: number | undefined }
  | { field: 'model'; model: TuningModel | undefined };

/** Applies `patch` to the design of row `r` of sensor `s` as one undoable edit. */
export function setTuning(store: DocumentStore, s: number, r: number, patch: TuningPatch): void {
  const row = store.document.sensors[s].sources[r];
  const name = `${store.document.sensors[s].id}.${row.id}`;
  store.edit(`${patch.field === 'leftOut' && patch.on ? 'leave out' : 'tune'} ${name} in the filter${patch.field === 'leftOut' ? '' : ` (${patch.field})`}`, (d) => {
    const target = d.sensors[s].sources[r];
    const t: RowTuning = { ...target.tuning };
    if (patch.field === 'value') {
      if (patch.content === undefined) delete t.value;
      else t.value = { value: patch.content, unit: t.value?.unit ?? target.unit };
    } else if (patch.field === 'leftOut') {
      if (patch.on) t.leftOut = true; else delete t.leftOut;
    } else if (patch.field === 'inflation') {
      if (patch.factor === undefined) delete t.inflation; else t.inflation = patch.factor;
    } else if (patch.model === undefined) delete t.model;
    else t.model = patch.model;
    if (Object.keys(t).length === 0) delete target.tuning;
    else target.tuning = t;
  });
}

/**
 * The inflation a user typed, or the reason it is refused (it must be a plain number above zero).
 * Empty text clears it.
 */
export function readInflation(text: string): { factor: number | undefined } | { problem: string } {
  const t = text.trim();
  if (t === '') return { factor: undefined };
  const v = Number(t);
  if (!Number.isFinite(v) || !(v > 0)) return { problem: `inflation must be a number above zero (a factor on the filter's variances), got "${t}"` };
  return { factor: v };
}
