/** Edits of a document's candidates that the page makes (pure: they change the document they are given). */
import type { BudgetDocument, SourceRow } from '../document/budget-document';
import { nameKey } from '../document/names';
import './candidate-entries';

/**
 * Adds `rows` (by default the sensor's rows as they are now) as a new
 * candidate of sensor `sensorId`, creating its slot when it has none, under
 * the first free id `stem1`, `stem2`, …; returns that id.
 * @throws Error for a sensor the document lacks (the page offers only its own).
 */
export function keepRowsAsCandidate(doc: BudgetDocument, sensorId: string, stem = 'rows', rows?: SourceRow[]): string {
  const sensor = doc.sensors.find((s) => s.id === sensorId);
  if (!sensor) throw new Error(`no sensor "${sensorId}"`);
  doc.candidates ??= [];
  let slot = doc.candidates.find((s) => s.sensor === sensorId);
  if (!slot) {
    slot = { sensor: sensorId, options: [] };
    doc.candidates.push(slot);
  }
  const taken = new Set(slot.options.map((o) => nameKey(o.id)));
  let n = 1;
  while (taken.has(nameKey(`${stem}${n}`))) n++;
  const id = `${stem}${n}`;
  slot.options.push({ id, sources: JSON.parse(JSON.stringify(rows ?? sensor.sources)) as SourceRow[] });
  return id;
}
