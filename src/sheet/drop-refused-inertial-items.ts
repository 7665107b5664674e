/**
 * The 3-D counterpart of drop-refused-items.ts: a cell that evaluated but
 * that the inertial engine refuses (a unit of the wrong kind for the row, an
 * implausible magnitude, a zero-velocity window while moving, a requirement
 * the model cannot judge) drops only its own item, which is then shown in
 * place like a cell error. Errors outside an item (the mission, the step, a
 * sensor's rate or lever arm) still stop the analysis.
 */
import type { InertialBudgetDocument } from '../document/inertial-document';
import type { InertialBudgetInput } from '../inertial/inertial-input';
import type { CellLocation } from './cell-error';
import { dropWhileRefused } from './drop-refused-items';
import type { InertialIndexMap } from './build-inertial-input';
import { inertialDocumentPathOf } from './inertial-input-paths';
import type { InertialSheetEvaluation } from './inertial-workbook';

/** An engine path inside one item, and the list it sits in. */
const ENGINE_ITEM = /^(?:imu\.rows\[(\d+)\]|aiding\[(\d+)\]\.(rows|outages|windows)\[(\d+)\]|(requirements|checkpoints)\[(\d+)\])/;
const DOC_ITEM = /^(?:sensors\[(\d+)\]\.(sources|outages|windows)\[(\d+)\]|(requirements|checkpoints)\[(\d+)\])\.?([A-Za-z]*)/;

/** Location of the refusal and the item in words. */
function describe(doc: InertialBudgetDocument, docPath: string): { location: CellLocation; itemPath: string; what: string } | undefined {
  const m = DOC_ITEM.exec(docPath);
  if (!m) return undefined;
  const itemPath = m[0].replace(/\.[A-Za-z]*$/, '');
  const field = m[6] === '' || m[6] === 'unit' ? 'value' : m[6];
  if (m[1] !== undefined) {
    const sensor = doc.sensors[Number(m[1])];
    const item = (sensor?.[m[2] as 'sources'] ?? [])[Number(m[3])] as { id?: string } | undefined;
    if (m[2] === 'sources') return { location: { path: docPath, field, sensorId: sensor?.id, rowId: item?.id }, itemPath, what: `row ${sensor?.id}.${item?.id}` };
    const word = m[2] === 'outages' ? 'outage' : 'window';
    const name = item?.id ?? Number(m[3]) + 1;
    return { location: { path: docPath, field: `${m[2]}[${m[3]}]`, sensorId: sensor?.id, itemId: item?.id }, itemPath, what: `${word} ${name} of ${sensor?.id}` };
  }
  const item = (doc[m[4] as 'requirements'] ?? [])[Number(m[5])];
  const word = m[4] === 'requirements' ? 'requirement' : 'checkpoint';
  return { location: { path: docPath, field: field || 'value', itemId: item?.id }, itemPath, what: `${word} ${item?.id ?? Number(m[5]) + 1}` };
}

/** Removes the item an engine path names from the input and the index map; false when there is none. */
function dropItem(input: InertialBudgetInput, map: InertialIndexMap, path: string): boolean {
  const m = ENGINE_ITEM.exec(path);
  if (!m) return false;
  const cut = (list: unknown[] | undefined, j: number): boolean => {
    if (!list || j >= list.length) return false;
    list.splice(j, 1);
    return true;
  };
  if (m[1] !== undefined) return cut(input.imu.rows, Number(m[1])) && cut(map.imuRows, Number(m[1]));
  if (m[2] !== undefined) {
    const [i, list, j] = [Number(m[2]), m[3] as 'rows' | 'outages' | 'windows', Number(m[4])];
    const sensor = input.aiding[i];
    return sensor !== undefined && cut(sensor[list], j) && cut(map[list][i], j);
  }
  const list = m[5] as 'requirements' | 'checkpoints';
  return cut(input[list], Number(m[6])) && cut(map[list], Number(m[6]));
}

/**
 * The evaluation with every item the engine refuses left out: `probe` (e.g.
 * prepareInertialBudget) is called on the input; when it throws for a path
 * inside an item, that item is dropped, its error added in place, and the
 * probe repeated. Returns the evaluation unchanged when the probe passes or
 * throws outside any item. Throws nothing else.
 */
export function dropRefusedInertialItems(
  doc: InertialBudgetDocument, sheet: InertialSheetEvaluation, probe: (input: InertialBudgetInput) => void,
): InertialSheetEvaluation {
  return dropWhileRefused(sheet, probe, (path, input, map) => {
    const docPath = inertialDocumentPathOf(path, map);
    const item = describe(doc, docPath);
    if (!item || !dropItem(input, map, path)) return undefined;
    return { docPath, ...item };
  });
}
