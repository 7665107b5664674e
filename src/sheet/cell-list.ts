/**
 * Every value cell of a document, in document order, with its location,
 * formula name, unit and the dimension its unit must have where the field
 * fixes one. The sheet places the cells in this order.
 */
import type { BudgetDocument, MissionEntry, OutageEntry, QuantityCell, SegmentEntry, SensorEntry, SourceRow } from '../document/budget-document';
import type { AnyBudgetDocument } from '../document/inertial-document';
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

/** Adds the cell of a `{ value, unit }` found at `path` (nothing when `q` is absent). */
export function add(list: SheetCell[], path: string, q: QuantityCell | undefined, field: string, expected: DimensionName | undefined, extra: Extra = {}): void {
  if (q === undefined) return;
  list.push({ location: { path: `${path}.value`, field, ...extra }, quantity: q, unitPath: `${path}.unit`, expected });
}

/** The start cells (3-D budgets add latitude and height). */
export function addStart(list: SheetCell[], start: MissionEntry['start'] & { latitude?: QuantityCell; height?: QuantityCell }): void {
  add(list, 'mission.start.north', start.north, 'start.north', 'length');
  add(list, 'mission.start.east', start.east, 'start.east', 'length');
  add(list, 'mission.start.heading', start.heading, 'start.heading', 'angle');
  add(list, 'mission.start.latitude', start.latitude, 'start.latitude', 'angle');
  add(list, 'mission.start.height', start.height, 'start.height', 'length');
}

/** The cells of the legs (3-D budgets add a vertical speed). */
export function addSegments(list: SheetCell[], segments: (SegmentEntry & { verticalSpeed?: QuantityCell })[]): void {
  segments.forEach((s, i) => {
    const p = `mission.segments[${i}]`, f = `segments[${i}]`, extra = { itemId: s.id };
    add(list, `${p}.duration`, s.duration, `${f}.duration`, 'time', extra);
    add(list, `${p}.speed`, s.speed, `${f}.speed`, 'speed', extra);
    add(list, `${p}.speedEnd`, s.speedEnd, `${f}.speedEnd`, 'speed', extra);
    add(list, `${p}.turnRate`, s.turnRate, `${f}.turnRate`, 'angular-rate', extra);
    add(list, `${p}.verticalSpeed`, s.verticalSpeed, `${f}.verticalSpeed`, 'speed', extra);
  });
}

function addMission(list: SheetCell[], doc: BudgetDocument): void {
  const m = doc.mission;
  addStart(list, m.start);
  for (const key of ['initialPosition', 'initialHeading'] as const) {
    const extra = { sensorId: 'mission', rowId: key, name: INITIAL_POSE_NAMES[key] };
    add(list, `mission.${key}`, m[key], key, key === 'initialPosition' ? 'length' : 'angle', extra);
  }
  addSegments(list, m.segments);
}

function addRow(list: SheetCell[], sensorId: string, row: SourceRow, path: string): void {
  const extra = (field: RowCellField): Extra => ({ sensorId, rowId: row.id, name: rowCellName(sensorId, row.id, field) });
  add(list, path, row, 'value', undefined, extra('value'));
  add(list, `${path}.correlationTime`, row.correlationTime, 'correlationTime', 'time', extra('correlationTime'));
  add(list, `${path}.rate`, row.rate, 'rate', 'frequency', extra('rate'));
  add(list, `${path}.tuning.value`, row.tuning?.value, 'tuning.value', undefined, extra('tuning.value'));
  add(list, `${path}.tuning.correlationTime`, row.tuning?.correlationTime, 'tuning.correlationTime', 'time', extra('tuning.correlationTime'));
}

/** Adds the start and end cells of a sensor's spans (`outages`, or a zero-velocity sensor's `windows`). */
export function addSpans(list: SheetCell[], sensorId: string, spans: OutageEntry[] | undefined, path: string, key: string): void {
  (spans ?? []).forEach((o, k) => {
    const extra = { sensorId, itemId: o.id };
    add(list, `${path}[${k}].start`, o.start, `${key}[${k}].start`, 'time', extra);
    add(list, `${path}[${k}].end`, o.end, `${key}[${k}].end`, 'time', extra);
  });
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
  addSpans(list, s.id, s.outages, `${path}.outages`, 'outages');
  s.sources.forEach((row, j) => addRow(list, s.id, row, `${path}.sources[${j}]`));
}

/** The cells every document starts with: the step, then the named values. */
export function addHead(list: SheetCell[], doc: AnyBudgetDocument): void {
  add(list, 'settings.step', doc.settings.step, 'step', 'time');
  for (const [name, v] of Object.entries(doc.values ?? {})) add(list, `values.${name}`, v, 'value', undefined, { name });
}

/** The cells every document ends with: requirement limits and windows, checkpoint times. */
export function addTail(list: SheetCell[], doc: AnyBudgetDocument): void {
  (doc.requirements ?? []).forEach((r, i) => {
    const extra = { itemId: r.id };
    add(list, `requirements[${i}].limit`, r.limit, 'limit', undefined, extra);
    add(list, `requirements[${i}].window.start`, r.window?.start, 'window.start', 'time', extra);
    add(list, `requirements[${i}].window.end`, r.window?.end, 'window.end', 'time', extra);
  });
  (doc.checkpoints ?? []).forEach((c, i) => add(list, `checkpoints[${i}].time`, c.time, 'time', 'time', { itemId: c.id }));
}

/**
 * The value cells of `doc` in document order: settings, named values,
 * mission, sensors and their rows, requirements, checkpoints. Throws
 * nothing for a document that passed the schema.
 */
export function listCells(doc: BudgetDocument): SheetCell[] {
  return cellsInOrder(doc, addMission, addSensor);
}

/** The cells of a document of either model: head, the model's mission and sensors, tail. */
export function cellsInOrder<D extends AnyBudgetDocument>(
  doc: D, mission: (list: SheetCell[], doc: D) => void, sensor: (list: SheetCell[], s: D['sensors'][number], path: string) => void,
): SheetCell[] {
  const list: SheetCell[] = [];
  addHead(list, doc);
  mission(list, doc);
  doc.sensors.forEach((s, i) => sensor(list, s, `sensors[${i}]`));
  addTail(list, doc);
  return list;
}
