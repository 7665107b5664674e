/**
 * The columns of the error-source grid and, per row, which of them exist:
 * correlation time and rate only where the row's kind takes them, the unit
 * beside a correlation time or rate only once there is one, and the one
 * model option that applies to the row's kind on its sensor.
 */
import type { SensorKind } from '../../src';
import type { SourceRow } from '../../src';
import { unitDimension } from '../../src';
import { kindTakes } from '../../src';
import { rowOptionFor, type RowOption } from '../../src';
import type { OptionField } from '../../src';

/** A grid column: its key, header text and header tooltip. */
export interface SourceColumn {
  key: 'id' | 'kind' | 'value' | 'unit' | 'tau' | 'tauUnit' | 'rate' | 'rateUnit' | 'option' | 'provenance' | 'assumed';
  label: string;
  title: string;
}

/** The grid's columns, left to right; a column's index is its position here. */
export const SOURCE_COLUMNS: readonly SourceColumn[] = [
  { key: 'id', label: 'Id', title: 'Row id; formulas call the magnitude sensorId.rowId' },
  { key: 'kind', label: 'Kind', title: 'Which error-source model the row is' },
  { key: 'value', label: 'Magnitude', title: 'A number or a formula starting with "="; its unit decides its form' },
  { key: 'unit', label: 'Unit', title: 'Unit of the magnitude; changing it converts the value' },
  { key: 'tau', label: 'Corr. time', title: 'Correlation time (bias instability, multipath as states)' },
  { key: 'tauUnit', label: 'Unit', title: 'Unit of the correlation time' },
  { key: 'rate', label: 'Rate', title: 'Output rate a per-sample sigma or LSB refers to; empty means the sensor rate' },
  { key: 'rateUnit', label: 'Unit', title: 'Unit of the rate override' },
  { key: 'option', label: 'Form', title: 'The model option of this kind of row' },
  { key: 'provenance', label: 'Provenance', title: 'Where the number came from' },
  { key: 'assumed', label: 'Assumed', title: 'Ticked when nobody measured the value or read it from a datasheet' },
];

/** Index of a column by key. Throws nothing. */
export function columnIndex(key: SourceColumn['key']): number {
  return SOURCE_COLUMNS.findIndex((c) => c.key === key);
}

export type { OptionField, RowOption };

/** The option of a row's kind on a sensor of `sensorKind` (the kinds' own declarations), or undefined when none applies. Throws nothing. */
export function rowOption(sensorKind: SensorKind, row: SourceRow): RowOption | undefined {
  return rowOptionFor(sensorKind, row.kind, unitDimension(row.unit), (field) => row[field]);
}

/** Which columns a row has, by column index. Throws nothing. */
export function presentColumns(sensorKind: SensorKind, row: SourceRow): boolean[] {
  const has: Record<SourceColumn['key'], boolean> = {
    id: true, kind: true, value: true, unit: true, provenance: true, assumed: true,
    tau: kindTakes(row.kind, 'correlationTime') || row.correlationTime !== undefined,
    tauUnit: row.correlationTime !== undefined,
    rate: kindTakes(row.kind, 'rate') || row.rate !== undefined,
    rateUnit: row.rate !== undefined,
    option: rowOption(sensorKind, row) !== undefined,
  };
  return SOURCE_COLUMNS.map((c) => has[c.key]);
}
