/**
 * Every value cell of a document, in document order, with its location,
 * formula name, unit and the dimension its unit must have where the field
 * fixes one. The sheet places the cells in this order.
 */
import type { BudgetDocument, QuantityCell, SensorEntry, SourceRow } from '../document/budget-document';
import { INITIAL_POSE_NAMES, rowCellName, type RowCellField } from '../document/names';
import type { DimensionName } from '../units';
import type { CellLocation } from './cell-error';

/** One value cell and what is known about it before evaluation. */
export interface SheetCell {
  /** `location.path` is the path of the value cell. */
  location: CellLocation;
  /** The document's own `{ value, unit }` object holding the cell, so an edit lands in the document too. */
  quantity: QuantityCell;
  unitPath: string;
  /** The dimension the unit must have; undefined where it depends on the row's form (then it need only be readable). */
  expected?: DimensionName;
}

type Extra = Omit<CellLocation, 'path' | 'field'>;

/** Adds the cell of a `{ value, unit }` found at `path`. */
function add(list: SheetCell[], path: string, q: QuantityCell | undefined, field: string, expected: DimensionName | undefined, extra: Extra = {}): void {
  if (q === undefined) return;
  list.push({ location: { path: `${path}.value`, field, ...extra }, quantity: q, unitPath: `${path}.unit`, expected });
}

function addMission(list: SheetCell[], doc: BudgetDocument): void {
  const m = doc.mission;
  add(list, 'mission.start.north', m.start.north, 'start.north', 'length');
  add(list, 'mission.start.east', m.start.east, 'start.east', 'length');
  add(list, 'mission.start.heading', m.start.heading, 'start.heading', 'angle');
  for (const key of ['initialPosition', 'initialHeading'] as const) {
    const extra = { sensorId: 'mission', rowId: key, name: INITIAL_POSE_NAMES[key] };
    add(list, `mission.${key}`, m[key], key, key === 'initialPosition' ? 'length' : 'angle', extra);
  }
  m.segments.forEach((s, i) => {
    const p = `mission.segments[${i}]`, f = `segments[${i}]`, extra = { itemId: s.id };
    add(list, `${p}.duration`, s.duration, `${f}.duration`, 'time', extra);
    add(list, `${p}.speed`, s.speed, `${f}.speed`, 'speed', extra);
    add(list, `${p}.speedEnd`, s.speedEnd, `${f}.speedEnd`, 'speed', extra);
    add(list, `${p}.turnRate`, s.turnRate, `${f}.turnRate`, 'angular-rate', extra);
  });
}

function addRow(list: SheetCell[], sensorId: string, row: SourceRow, path: string): void {
  const extra = (field: RowCellField): Extra => ({ sensorId, rowId: row.id, name: rowCellName(sensorId, row.id, field) });
  add(list, path, row, 'value', undefined, extra('value'));
  add(list, `${path}.correlationTime`, row.correlationTime, 'correlationTime', 'time', extra('correlationTime'));
  add(list, `${path}.rate`, row.rate, 'rate', 'frequency', extra('rate'));
  add(list, `${path}.tuning.value`, row.tuning?.value, 'tuning.value', undefined, extra('tuning.value'));
  add(list, `${path}.tuning.correlationTime`, row.tuning?.correlationTime, 'tuning.correlationTime', 'time', extra('tuning.correlationTime'));
}

function addSensor(list: SheetCell[], s: SensorEntry, path: string): void {
  const own = { sensorId: s.id };
  add(list, `${path}.rate`, s.rate, 'rate', 'frequency', own);
  add(list, `${path}.maxRange`, s.maxRange, 'maxRange', 'length', own);
  add(list, `${path}.fieldOfView`, s.fieldOfView, 'fieldOfView', 'angle', own);
  (s.landmarks ?? []).forEach((lm, k) => {
    const extra = { ...own, itemId: lm.id };
    add(list, `${path}.landmarks[${k}].north`, lm.north, `landmarks[${k}].north`, 'length', extra);
    add(list, `${path}.landmarks[${k}].east`, lm.east, `landmarks[${k}].east`, 'length', extra);
  });
  (s.outages ?? []).forEach((o, k) => {
    const extra = { ...own, itemId: o.id };
    add(list, `${path}.outages[${k}].start`, o.start, `outages[${k}].start`, 'time', extra);
    add(list, `${path}.outages[${k}].end`, o.end, `outages[${k}].end`, 'time', extra);
  });
  s.sources.forEach((row, j) => addRow(list, s.id, row, `${path}.sources[${j}]`));
}

/**
 * The value cells of `doc` in document order: settings, named values,
 * mission, sensors and their rows, requirements, checkpoints. Throws
 * nothing for a document that passed the schema.
 */
export function listCells(doc: BudgetDocument): SheetCell[] {
  const list: SheetCell[] = [];
  add(list, 'settings.step', doc.settings.step, 'step', 'time');
  for (const [name, v] of Object.entries(doc.values ?? {})) add(list, `values.${name}`, v, 'value', undefined, { name });
  addMission(list, doc);
  doc.sensors.forEach((s, i) => addSensor(list, s, `sensors[${i}]`));
  (doc.requirements ?? []).forEach((r, i) => {
    const extra = { itemId: r.id };
    add(list, `requirements[${i}].limit`, r.limit, 'limit', undefined, extra);
    add(list, `requirements[${i}].window.start`, r.window?.start, 'window.start', 'time', extra);
    add(list, `requirements[${i}].window.end`, r.window?.end, 'window.end', 'time', extra);
  });
  (doc.checkpoints ?? []).forEach((c, i) => add(list, `checkpoints[${i}].time`, c.time, 'time', 'time', { itemId: c.id }));
  return list;
}
