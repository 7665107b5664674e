/**
 * The one way log results enter the document: planned rows written into one
 * sensor as a single `store.edit`, so one undo reverts the whole write.
 */
import type { DocumentStore } from '../state/document-store';
import { writeRows, type RowPlan, type WrittenRow } from '../../src';

/** What a write did, and a one-line note for the workbench's status line. */
export interface WriteResult {
  rows: WrittenRow[];
  note: string;
}

/**
 * Writes `plans` into `store.document.sensors[sensorIndex]` as one undoable edit.
 * @param what names the write in the undo label ("2 noise terms").
 * @param fileName the log the rows come from.
 * Throws nothing for a valid sensor index.
 */
export function writeIntoSensor(store: DocumentStore, sensorIndex: number, plans: readonly RowPlan[], what: string, fileName: string): WriteResult {
  const sensorId = store.document.sensors[sensorIndex].id;
  let rows: WrittenRow[] = [];
  store.edit(`write ${what} from ${fileName} into ${sensorId}`, (draft) => {
    rows = writeRows(draft, sensorIndex, plans);
  });
  return { rows, note: `${sensorId}: ${rows.map((w) => `${w.fullId} ${w.action}`).join(', ')} from ${fileName}` };
}
