/**
 * Changes to a sensor's rows and to the suite, applied to a draft inside
 * `store.edit`: new rows with sensible defaults, a row's kind changed with
 * the fields that no longer apply removed, renames that rewrite formulas,
 * new and duplicated sensors.
 */
import type { BudgetDocument, SensorEntry, SourceRow } from '../../src';
import type { SensorKind, SourceKind } from '../../src';
import { unitDimension } from '../../src';
import { uniqueId } from '../../src';
import { renameRowReferences, renameSensorReferences } from '../../src';
import { defaultUnit, kindTakes, rowDimensions } from '../../src';
import { OPTION_FIELDS, optionFieldsOf } from '../../src';
import { SENSOR_KINDS } from '../../src';
import { SOURCE_KINDS } from '../../src';

const BIAS_INSTABILITY_TAU = SOURCE_KINDS['bias-instability'].assumedCells!.find((c) => c.field === 'correlationTime')!;

/** The correlation time a bias-instability row gets when nobody knows it (declared in src/sources/bias-instability.ts). */
export const ASSUMED_CORRELATION_TIME_S = BIAS_INSTABILITY_TAU.value;

/** Provenance text of a correlation time filled in by the tool. */
export const ASSUMED_CORRELATION_NOTE = BIAS_INSTABILITY_TAU.note;

/** Fills in what a row needs and nobody typed (the kind's `assumedCells`), marked as assumed. */
export function fillRequired(row: SourceRow): void {
  for (const cell of SOURCE_KINDS[row.kind]?.assumedCells ?? []) {
    if (row[cell.field] !== undefined) continue;
    row[cell.field] = { value: cell.value, unit: cell.unit };
    row.assumed = true;
    row.provenance = row.provenance ? `${row.provenance}; ${cell.note}` : cell.note;
  }
}

/** A new row of `kind` for a sensor of `sensorKind`, with an id not among `taken`. Throws nothing. */
export function newRow(sensorKind: SensorKind, kind: SourceKind, taken: readonly string[]): SourceRow {
  const row: SourceRow = {
    id: uniqueId(SOURCE_KINDS[kind].idBase, taken), kind, value: 0, unit: defaultUnit(rowDimensions(sensorKind, kind)), provenance: '', assumed: false,
  };
  writeNewRowOption(row);
  fillRequired(row);
  return row;
}

/**
 * Changes a row's kind: options and cells the new kind does not take are
 * removed, a unit of a dimension it does not accept is replaced by its
 * default (the number is kept), and required cells are filled in.
 */
export function changeRowKind(row: SourceRow, sensorKind: SensorKind, kind: SourceKind): void {
  row.kind = kind;
  const keep = optionFieldsOf(sensorKind, kind);
  for (const field of OPTION_FIELDS) if (field !== 'component' && !keep.includes(field)) delete row[field];
  if (!kindTakes(kind, 'correlationTime')) delete row.correlationTime;
  if (!kindTakes(kind, 'rate')) delete row.rate;
  const dims = rowDimensions(sensorKind, kind);
  const dim = unitDimension(row.unit);
  if (dim === undefined || !dims.includes(dim)) row.unit = defaultUnit(dims);
  writeNewRowOption(row);
  fillRequired(row);
}

/** Writes out the option value the row's kind wants on a new row (multipath: "states"). */
function writeNewRowOption(row: SourceRow): void {
  const spec = SOURCE_KINDS[row.kind];
  if (spec.option !== undefined && spec.newRowOption !== undefined) row[spec.option.field] = spec.newRowOption as never;
}

/** Renames row `rowIndex` of sensor `sensorIndex` and every formula that refers to it. */
export function renameRow(doc: BudgetDocument, sensorIndex: number, rowIndex: number, id: string): void {
  const sensor = doc.sensors[sensorIndex];
  renameRowReferences(doc, sensor.id, sensor.sources[rowIndex].id, id);
  sensor.sources[rowIndex].id = id;
}

/** Renames sensor `index` and every formula that refers to its cells. */
export function renameSensor(doc: BudgetDocument, index: number, id: string): void {
  renameSensorReferences(doc, doc.sensors[index].id, id);
  doc.sensors[index].id = id;
}

/** A new sensor of `kind` with its usual rate and no rows, its id not among `taken`. Throws nothing. */
export function newSensor(kind: SensorKind, taken: readonly string[]): SensorEntry {
  const d = SENSOR_KINDS[kind].defaults;
  return { id: uniqueId(d.id, taken), kind, rate: { value: d.rateHz, unit: 'Hz' }, sources: [] };
}

/**
 * Inserts a copy of sensor `index` after it, under a new id; formulas in
 * the copy that referred to the original's own rows refer to the copy's.
 * Returns the copy's index.
 */
export function duplicateSensor(doc: BudgetDocument, index: number): number {
  const original = doc.sensors[index];
  const copy = structuredClone(original);
  copy.id = uniqueId(`${original.id}_copy`, doc.sensors.map((s) => s.id));
  doc.sensors.splice(index + 1, 0, copy);
  // Only the copy's own cells are rewritten: the rest of this scratch document is a throwaway clone.
  const scratch: BudgetDocument = { ...structuredClone({ ...doc, sensors: [] }), sensors: [copy] };
  renameSensorReferences(scratch, original.id, copy.id);
  return index + 1;
}

/** Moves item `from` of `list` by `delta` places; returns the new index (unchanged at an end). */
export function moveItem<T>(list: T[], from: number, delta: number): number {
  const to = from + delta;
  if (to < 0 || to >= list.length) return from;
  const [item] = list.splice(from, 1);
  list.splice(to, 0, item);
  return to;
}
