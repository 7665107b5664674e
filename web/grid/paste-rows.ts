/**
 * Rows pasted from other spreadsheets as tab-separated text, and rows
 * copied out the same way. Columns, in order: id, kind, value, unit,
 * correlation time, correlation time unit, provenance. Every line is either
 * used or reported with its text and the reason, so nothing is lost.
 */
import type { SensorEntry, SourceRow } from '../../src';
import type { SensorKind, SourceKind } from '../../src';
import { SENSOR_KINDS } from '../../src';
import { SOURCE_KINDS } from '../../src';
import { DIMENSIONS, unitDimension } from '../../src';
import { cellText, readCellText } from '../../src';
import { idProblem, isTaken, uniqueId } from '../../src';
import { changeRowKind, fillRequired, newRow } from './row-edits';
import { rowDimensions } from '../../src';
import { neutraliseCell, restoreCell } from '../../src';

/** The pasted columns, in order, as the hint in the grid names them. */
export const PASTE_COLUMNS = ['id', 'kind', 'value', 'unit', 'correlation time', 'correlation time unit', 'provenance'] as const;

/** A line that could not be used: its 1-based number, its text and why. */
export interface PasteProblem {
  line: number;
  text: string;
  message: string;
}

/** The usable part of one pasted line. */
export interface PastedRow {
  id?: string;
  kind: SourceKind;
  value: SourceRow['value'];
  unit: string;
  correlationTime?: { value: SourceRow['value']; unit: string };
  provenance?: string;
}

/** A kind as spreadsheets may spell it: "white noise", "Bias_Instability", a registry label. */
function readKind(text: string, sensorKind: SensorKind): SourceKind | string {
  const t = text.trim().toLowerCase().replace(/[\s_]+/g, '-').replace('quantization', 'quantisation');
  const kind = (Object.keys(SOURCE_KINDS) as SourceKind[]).find((k) => k === t || SOURCE_KINDS[k].label.replace(/\s+/g, '-') === t);
  if (!kind) return `"${text.trim()}" is not a kind of row; use one of ${SENSOR_KINDS[sensorKind].sourceKinds.join(', ')}`;
  if (!SENSOR_KINDS[sensorKind].sourceKinds.includes(kind)) {
    return `a ${SENSOR_KINDS[sensorKind].label} has no ${kind} rows; use one of ${SENSOR_KINDS[sensorKind].sourceKinds.join(', ')}`;
  }
  return kind;
}

/** Reads one line's fields; a string is the reason it cannot be used. */
function readLine(fields: string[], sensorKind: SensorKind): PastedRow | string {
  const [id, kindText, valueText, unitText, tauText, tauUnitText, provenance, ...extra] = fields.map((f) => restoreCell(f.trim()));
  if (extra.some((f) => f !== '')) return `has ${fields.length} columns; expected at most ${PASTE_COLUMNS.length} (${PASTE_COLUMNS.join(', ')})`;
  if (!kindText) return `needs at least id, kind, value and unit, separated by tabs`;
  const kind = readKind(kindText, sensorKind);
  if (!(kind in SOURCE_KINDS)) return kind;
  if (id && idProblem(id, [], 'row id')) return idProblem(id, [], 'row id')!;
  const value = readCellText(valueText ?? '');
  if (!value.ok) return `value "${valueText}": ${value.message}`;
  if (value.content === undefined) return 'has no value';
  const dims = rowDimensions(sensorKind, kind as SourceKind);
  const dim = unitText ? unitDimension(unitText) : undefined;
  if (!dim || !dims.includes(dim)) {
    return `unit "${unitText ?? ''}" does not fit; expected ${dims.map((d) => `${DIMENSIONS[d].label} (${DIMENSIONS[d].picker.slice(0, 2).join(', ')})`).join(' or ')}`;
  }
  const row: PastedRow = { id: id || undefined, kind: kind as SourceKind, value: value.content, unit: unitText };
  if (tauText) {
    const tau = readCellText(tauText);
    if (!tau.ok || tau.content === undefined) return `correlation time "${tauText}": ${tau.ok ? 'is empty' : tau.message}`;
    const tauUnit = tauUnitText || 's';
    if (unitDimension(tauUnit) !== 'time') return `correlation time unit "${tauUnit}" is not a time (s, min, h)`;
    row.correlationTime = { value: tau.content, unit: tauUnit };
  }
  if (provenance) row.provenance = provenance;
  return row;
}

/**
 * Reads tab-separated lines into rows for a sensor of `sensorKind`. Blank
 * lines and a header line starting with "id" are skipped; every other line
 * becomes a row or a problem. Throws nothing.
 */
export function parsePastedRows(text: string, sensorKind: SensorKind): { rows: PastedRow[]; problems: PasteProblem[] } {
  const rows: PastedRow[] = [];
  const problems: PasteProblem[] = [];
  text.replace(/\r\n?/g, '\n').split('\n').forEach((line, i) => {
    if (line.trim() === '') return;
    const fields = line.split('\t');
    if (i === 0 && fields[0].trim().toLowerCase() === 'id') return;
    const read = readLine(fields, sensorKind);
    if (typeof read === 'string') problems.push({ line: i + 1, text: line, message: read });
    else rows.push(read);
  });
  return { rows, problems };
}

/**
 * Adds pasted rows to `sensor`, or overwrites the row with the same id
 * (ignoring case): kind, value and unit, and the correlation time and
 * provenance when given. Returns the counts.
 */
export function applyPastedRows(sensor: SensorEntry, rows: PastedRow[]): { added: number; replaced: number } {
  let added = 0;
  let replaced = 0;
  for (const p of rows) {
    const ids = sensor.sources.map((r) => r.id);
    const existing = p.id === undefined ? undefined : sensor.sources.find((r) => isTaken(p.id!, [r.id]));
    if (existing) {
      if (existing.kind !== p.kind) changeRowKind(existing, sensor.kind, p.kind);
      replaced++;
    } else {
      sensor.sources.push({ id: p.id ?? uniqueId(newRow(sensor.kind, p.kind, ids).id, ids), kind: p.kind, value: 0, unit: p.unit, provenance: '', assumed: false });
      added++;
    }
    const row = existing ?? sensor.sources[sensor.sources.length - 1];
    Object.assign(row, { value: p.value, unit: p.unit });
    if (p.correlationTime) row.correlationTime = p.correlationTime;
    if (p.provenance !== undefined) row.provenance = p.provenance;
    if (!existing && p.kind === 'multipath') row.multipathModel = 'states';
    fillRequired(row);
  }
  return { added, replaced };
}

/** A field made safe for one tab-separated cell. */
const field = (text: string) => text.replace(/[\t\r\n]+/g, ' ');

/**
 * Rows as tab-separated lines in the paste order, for the clipboard; a cell
 * a spreadsheet would evaluate (a formula, a provenance starting with = or
 * +) gets a leading ', which pasting back here removes. Throws nothing.
 */
export function rowsAsText(rows: SourceRow[]): string {
  return rows
    .map((r) => [r.id, r.kind, cellText(r.value), r.unit, cellText(r.correlationTime?.value), r.correlationTime?.unit ?? '', r.provenance].map((f) => neutraliseCell(field(f ?? ''))).join('\t'))
    .join('\n');
}
