/**
 * Writes planned rows into one sensor of a document draft: a row of the same
 * kind (and, where the plan says, the same form) is overwritten in place and
 * keeps its id; otherwise a row with a new unique id is added at the end.
 * Formulas that refer to an overwritten cell keep seeing the number in the
 * unit they were written for (wrapped as on a unit change); references the
 * new row cannot serve are reported. Call it inside one `store.edit`, so the
 * whole write is one undoable step.
 */
import type { BudgetDocument, QuantityCell, SensorEntry, SourceRow } from '../document';
import { nameKey, rowCellName } from '../document/names';
import type { SourceKind } from '../inputs/budget-input';
import { listCells } from '../sheet/cell-list';
import { formatSignificant } from '../units';
import { isFormula } from './cell-text';
import { convertible } from './change-unit';
import { uniqueId } from './ids';
import { keepReferencesInUnit, rewriteNames } from './references';

/** One row to write. */
export interface RowPlan {
  kind: SourceKind;
  /** Id stem for a new row ("arw", "bi"). */
  idStem: string;
  /** What the row holds, for the summary ("angle random walk"). */
  label: string;
  /** The new row without id and kind: value, unit, provenance, assumed and any kind fields. */
  fields: Omit<SourceRow, 'id' | 'kind'>;
  /** Which existing rows of `kind` count as the same source (default: all of that kind). */
  sameSource?: (row: SourceRow) => boolean;
}

/** What happened to one planned row. */
export interface WrittenRow {
  /** Full id, sensorId.rowId. */
  fullId: string;
  label: string;
  action: 'added' | 'overwritten';
  /** The new magnitude with its unit. */
  value: string;
  /** The old magnitude with its unit, for an overwrite. */
  previous?: string;
  /** Things the user should look at (other rows of the kind, formulas left without a cell). */
  warnings: string[];
}

const shown = (q: QuantityCell): string => `${typeof q.value === 'number' ? formatSignificant(q.value, 4) : q.value} ${q.unit}`;

/** How many formula cells refer to `name` (letter case ignored). */
function referencesTo(doc: BudgetDocument, name: string): number {
  const key = nameKey(name);
  let count = 0;
  for (const cell of listCells(doc)) {
    const content = cell.quantity.value;
    if (!isFormula(content)) continue;
    let found = false;
    rewriteNames(content, (n) => {
      if (nameKey(n) === key) found = true;
      return undefined;
    });
    if (found) count++;
  }
  return count;
}

/** Keeps formulas that use `name` right when its cell moves from `before` to `after` (or disappears). */
function keepReferences(doc: BudgetDocument, name: string, before: QuantityCell | undefined, after: QuantityCell | undefined, warnings: string[]): void {
  if (!before) return;
  const used = referencesTo(doc, name);
  if (used === 0) return;
  if (!after) warnings.push(`${used} formula${used > 1 ? 's refer' : ' refers'} to ${name}, which the new row does not have: fix ${used > 1 ? 'them' : 'it'}`);
  else if (before.unit === after.unit) return;
  else if (convertible(before.unit, after.unit)) keepReferencesInUnit(doc, name, after.unit, before.unit);
  else warnings.push(`${used} formula${used > 1 ? 's use' : ' uses'} ${name}, now in ${after.unit} instead of ${before.unit}: check ${used > 1 ? 'them' : 'it'}`);
}

function overwrite(doc: BudgetDocument, sensorIndex: number, rowIndex: number, plan: RowPlan, warnings: string[]): SourceRow {
  const sensor = doc.sensors[sensorIndex];
  const old = sensor.sources[rowIndex];
  const row: SourceRow = { id: old.id, kind: plan.kind, ...copyOf(plan.fields) };
  // A log measures the truth; the filter's own design of the row stays as the user wrote it.
  if (old.tuning && old.kind === plan.kind) row.tuning = old.tuning;
  for (const field of ['value', 'correlationTime', 'rate'] as const) {
    const before = field === 'value' ? old : old[field];
    const after = field === 'value' ? row : row[field];
    keepReferences(doc, rowCellName(sensor.id, old.id, field), before, after, warnings);
  }
  sensor.sources[rowIndex] = row;
  return old;
}

/** Indices of the rows of `sensor` that `plan` counts as its own source; the first is the one overwritten. Throws nothing. */
export function sameSourceRows(sensor: SensorEntry, plan: RowPlan): number[] {
  return sensor.sources.flatMap((r, i) => (r.kind === plan.kind && (plan.sameSource?.(r) ?? true) ? [i] : []));
}

/**
 * Writes `plans` into `doc.sensors[sensorIndex]` (mutates `doc`).
 * @returns one entry per plan, in plan order. Throws nothing for a valid sensor index.
 */
export function writeRows(doc: BudgetDocument, sensorIndex: number, plans: readonly RowPlan[]): WrittenRow[] {
  const sensor = doc.sensors[sensorIndex];
  return plans.map((plan) => {
    const warnings: string[] = [];
    const same = sameSourceRows(sensor, plan);
    if (same.length === 0) {
      const id = uniqueId(plan.idStem, sensor.sources.map((r) => r.id));
      const row: SourceRow = { id, kind: plan.kind, ...copyOf(plan.fields) };
      sensor.sources.push(row);
      return { fullId: `${sensor.id}.${id}`, label: plan.label, action: 'added', value: shown(row), warnings };
    }
    if (same.length > 1) {
      const others = same.slice(1).map((i) => sensor.sources[i].id).join(', ');
      warnings.push(`${sensor.id} has more ${plan.kind} rows (${others}); they were left as they are and still count`);
    }
    const old = overwrite(doc, sensorIndex, same[0], plan, warnings);
    return { fullId: `${sensor.id}.${old.id}`, label: plan.label, action: 'overwritten', value: shown(plan.fields), previous: shown(old), warnings };
  });
}

/** A deep copy of plain JSON data (the engine has no structuredClone: it targets ES2022 without DOM or Node). */
function copyOf<T>(value: T): T {
  return JSON.parse(JSON.stringify(value)) as T;
}
