/**
 * Every value cell of a 3-D budget document, in document order, with its
 * location, formula name and expected dimension: the planar list's head
 * and tail (step, named values, requirements, checkpoints) around the 3-D
 * mission and sensors.
 */
import type { InertialBudgetDocument, InertialRow, InertialSensorEntry, InitialSigmaSource } from '../document/inertial-document';
import { INERTIAL_START_NAMES, rowCellName, type RowCellField } from '../document/names';
import { add, addSegments, addSpans, addStart, cellsInOrder, type SheetCell } from './cell-list';

function addMission(list: SheetCell[], doc: InertialBudgetDocument): void {
  const m = doc.mission;
  addStart(list, m.start);
  for (const key of ['initialPosition', 'initialVelocity', 'initialTilt', 'initialHeading'] as const) {
    const name = INERTIAL_START_NAMES[key];
    const dim = key === 'initialPosition' ? 'length' : key === 'initialVelocity' ? 'speed' : 'angle';
    add(list, `mission.${key}`, m[key], key, dim, { sensorId: 'mission', rowId: key, name });
    const vertical = (m[key] as Partial<InitialSigmaSource>).vertical;
    add(list, `mission.${key}.vertical`, vertical, `${key}.vertical`, dim, { sensorId: 'mission', rowId: key, name: `${name}.vertical` });
  }
  addSegments(list, m.segments);
}

function addRow(list: SheetCell[], sensorId: string, row: InertialRow, path: string): void {
  const extra = (field: RowCellField) => ({ sensorId, rowId: row.id, name: rowCellName(sensorId, row.id, field) });
  add(list, path, row, 'value', undefined, extra('value'));
  add(list, `${path}.vertical`, row.vertical, 'vertical', undefined, extra('vertical'));
  add(list, `${path}.correlationTime`, row.correlationTime, 'correlationTime', 'time', extra('correlationTime'));
  add(list, `${path}.rate`, row.rate, 'rate', 'frequency', extra('rate'));
}

function addSensor(list: SheetCell[], s: InertialSensorEntry, path: string): void {
  const own = { sensorId: s.id };
  add(list, `${path}.rate`, s.rate, 'rate', 'frequency', own);
  for (const axis of ['x', 'y', 'z'] as const) {
    add(list, `${path}.leverArm.${axis}`, s.leverArm?.[axis], `leverArm.${axis}`, 'length', own);
  }
  addSpans(list, s.id, s.outages, `${path}.outages`, 'outages');
  addSpans(list, s.id, s.windows, `${path}.windows`, 'windows');
  s.sources.forEach((row, j) => addRow(list, s.id, row, `${path}.sources[${j}]`));
}

/** The value cells of a 3-D document in document order. Throws nothing for a document that passed the parser. */
export function listInertialCells(doc: InertialBudgetDocument): SheetCell[] {
  return cellsInOrder(doc, addMission, addSensor);
}
