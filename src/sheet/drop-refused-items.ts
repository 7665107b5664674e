/**
 * A bad cell drops only its own item (budgets/FORMAT.md), also when the
 * cell evaluated but the engine refuses it: a unit of the wrong kind for
 * the row (`m` on a gyro's white noise), an implausible magnitude, an
 * option the row's kind does not read, a requirement window without a step.
 * Such an item is left out and reported in place like a cell error; the
 * rest still computes and is marked partial. Errors outside an item (the
 * step, a segment, a sensor's rate, the suite) still stop the analysis.
 */
import { SigmaLedgerError } from '../errors';
import type { BudgetDocument } from '../document/budget-document';
import type { BudgetInput } from '../inputs/budget-input';
import type { CellError, CellLocation } from './cell-error';
import type { SheetEvaluation } from './sheet-evaluation';
import { documentPathOf } from './input-paths';

/** An engine path inside one item of a list: `sensors[0].sources[2].value.unit`, `requirements[1].window`. */
const SENSOR_ITEM = /^sensors\[(\d+)\]\.(sources|outages|landmarks)\[(\d+)\]/;
const TOP_ITEM = /^(requirements|checkpoints)\[(\d+)\]/;

/** The location of an engine refusal, in the document's terms, for the grid to show it in its row. */
function locationOf(doc: BudgetDocument, docPath: string): CellLocation {
  const row = /^sensors\[(\d+)\]\.(sources|outages|landmarks)\[(\d+)\]\.?([A-Za-z]*)/.exec(docPath);
  if (row) {
    const sensor = doc.sensors[Number(row[1])];
    const item = (sensor?.[row[2] as 'sources'] ?? [])[Number(row[3])] as { id?: string } | undefined;
    const field = row[4] === 'unit' || row[4] === '' ? 'value' : row[4];
    return row[2] === 'sources'
      ? { path: docPath, field, sensorId: sensor?.id, rowId: item?.id }
      : { path: docPath, field: `${row[2]}[${row[3]}]`, sensorId: sensor?.id, itemId: item?.id };
  }
  const top = /^(requirements|checkpoints)\[(\d+)\]\.?([A-Za-z]*)/.exec(docPath);
  const item = top ? (doc[top[1] as 'requirements'] ?? [])[Number(top[2])] : undefined;
  return { path: docPath, field: top?.[3] || 'value', itemId: item?.id };
}

/** The item in words, as the sheet's omissions say it: `row gyro.arw`, `requirement position`. */
function describeItem(doc: BudgetDocument, itemPath: string): string {
  const loc = locationOf(doc, itemPath);
  const [, list, index] = /(?:\.(sources|outages|landmarks))?\[(\d+)\]$/.exec(itemPath) ?? [];
  const name = loc.itemId ?? Number(index) + 1;
  if (list === 'sources') return `row ${loc.sensorId}.${loc.rowId}`;
  if (list) return `${list === 'outages' ? 'outage' : 'landmark'} ${name} of ${loc.sensorId}`;
  return `${itemPath.startsWith('requirements') ? 'requirement' : 'checkpoint'} ${name}`;
}

/** Removes input item `index` of a list, and its entry in the index map. */
function removeAt<T>(list: T[] | undefined, index: number): void {
  list?.splice(index, 1);
}

/** Drops the item an error names from a copy of the input; false when the error names no item. */
function dropItem(input: BudgetInput, map: SheetEvaluation['indexMap'], path: string): boolean {
  const s = SENSOR_ITEM.exec(path);
  if (s) {
    const [i, list, j] = [Number(s[1]), s[2] as 'sources' | 'outages' | 'landmarks', Number(s[3])];
    const sensor = input.sensors[i];
    if (!sensor?.[list] || j >= sensor[list]!.length) return false;
    sensor[list] = sensor[list]!.filter((_x, k) => k !== j) as never;
    removeAt(map[list][i], j);
    return true;
  }
  const t = TOP_ITEM.exec(path);
  if (t) {
    const [list, i] = [t[1] as 'requirements' | 'checkpoints', Number(t[2])];
    if (!input[list] || i >= input[list]!.length) return false;
    input[list] = input[list]!.filter((_x, k) => k !== i) as never;
    removeAt(map[list], i);
    return true;
  }
  return false;
}

/** An item dropped for an engine refusal: where to show the error, and the item's path and words. */
export interface DroppedItem {
  docPath: string;
  location: CellLocation;
  itemPath: string;
  what: string;
}

/** The shared fields of either model's sheet evaluation that dropping touches. */
interface DroppableSheet<I, M> {
  input?: I;
  indexMap: M;
  cellErrors: CellError[];
  omitted: SheetEvaluation['omitted'];
}

/**
 * The loop behind both models' item dropping: `probe` is called on a copy of
 * the input; when it throws for a path, `drop` removes the item that path
 * names from the input and the map (undefined when it names none), the error
 * is added in place and the probe repeated. Throws nothing else.
 */
export function dropWhileRefused<S extends DroppableSheet<object, object>>(
  sheet: S, probe: (input: NonNullable<S['input']>) => void,
  drop: (enginePath: string, input: NonNullable<S['input']>, map: S['indexMap']) => DroppedItem | undefined,
): S {
  if (!sheet.input) return sheet;
  const input = JSON.parse(JSON.stringify(sheet.input)) as NonNullable<S['input']>;
  const indexMap = JSON.parse(JSON.stringify(sheet.indexMap)) as S['indexMap'];
  const cellErrors: CellError[] = [...sheet.cellErrors];
  const omitted = [...sheet.omitted];
  for (;;) {
    try {
      probe(input);
      break;
    } catch (e) {
      if (!(e instanceof SigmaLedgerError) || !e.path) break;
      const item = drop(e.path, input, indexMap);
      if (!item) break;
      cellErrors.push({ location: item.location, kind: /\.unit$/.test(item.docPath) ? 'unit' : 'out-of-range', message: e.message.slice(e.path.length + 2) });
      omitted.push({ path: item.itemPath, what: item.what });
    }
  }
  if (cellErrors.length === sheet.cellErrors.length) return sheet;
  return { ...sheet, input, indexMap, cellErrors, omitted };
}

/**
 * The evaluation with every item the engine refuses left out: `probe` (the
 * checks before a run, e.g. pipeline's prepareBudget) is called on the
 * input; when it throws for a path inside an item, that item is dropped,
 * its error added in place, and the probe repeated. Returns the evaluation
 * unchanged when the probe passes or throws outside any item (the caller's
 * run then reports that error as before). Throws nothing else.
 */
export function dropRefusedItems(doc: BudgetDocument, sheet: SheetEvaluation, probe: (input: BudgetInput) => void): SheetEvaluation {
  return dropWhileRefused(sheet, probe, (path, input, map) => {
    const docPath = documentPathOf(path, map);
    const itemPath = (SENSOR_ITEM.exec(docPath) ?? TOP_ITEM.exec(docPath))?.[0];
    if (!itemPath || !dropItem(input, map, path)) return undefined;
    return { docPath, location: locationOf(doc, docPath), itemPath, what: describeItem(doc, itemPath) };
  });
}
