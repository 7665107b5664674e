/**
 * A budget document held in a HyperFormula engine, so a UI can change one
 * cell and re-read the budget without rebuilding anything.
 *
 * Layout: one sheet, one cell per value cell of the document in document
 * order (column A); each cell with a formula name (see document/names.ts)
 * gets a workbook-level named expression pointing at it. Formulas refer to
 * names only; a grid position such as A1 is reported as an error, because
 * the layout is not the user's.
 *
 * Cost, measured on the development machine (Node 20, 2 cores, medians of
 * 21 runs): building the engine for the 60-cell annotated example takes
 * about 12 ms once HyperFormula's code is warm (the first build in a
 * process about 55 ms); `evaluate` about 0.4 ms; one `setCell` about
 * 0.1 ms, so an edit plus a re-read is under 1 ms. A full one-shot
 * evaluation of an 18-cell document costs about 12 ms: the engine build
 * dominates, so keep one workbook per open document.
 * See test/bench/workbook-bench.ts.
 *
 * A document without formulas needs no engine: its cells are their numbers.
 * The engine is then built only when a formula is first set (the first
 * build in a process costs about 80 ms of the command line's start-up:
 * HyperFormula's parser and its string collator).
 */
import { HyperFormula, type SimpleCellAddress, type SimpleCellRange } from 'hyperformula';
import { InputError } from '../errors';
import type { BudgetDocument, Cell } from '../document/budget-document';
import type { AnyBudgetDocument } from '../document/inertial-document';
import { formulaNameProblem, nameKey } from '../document/names';
import { buildBudgetInput } from './build-input';
import type { CellError } from './cell-error';
import { listCells, type SheetCell } from './cell-list';
import type { CellLookup } from './cell-reader';
import { isFailure, outcomeOf, type CellOutcome } from './cell-outcome';
import { explainDependencies } from './dependencies';
import { formulaProblem } from './formula-screen';
import type { SheetEvaluation } from './sheet-evaluation';
import { unitProblem } from './unit-checks';
import { registerUnitFunctions } from './unit-functions';

const SHEET_NAME = 'budget';

/** HyperFormula's default sheet height; a larger document gets a taller sheet rather than an exception. */
const DEFAULT_MAX_ROWS = 40_000;

/** Full double precision: no rounding of results, no zeroing of small differences. */
function engineConfig(cellCount: number) {
  return { licenseKey: 'gpl-v3', smartRounding: false, maxRows: Math.max(DEFAULT_MAX_ROWS, cellCount) };
}

/** What a cell must hold, or undefined when it does. */
function contentProblem(content: unknown): string | undefined {
  if (typeof content === 'number' && Number.isFinite(content)) return undefined;
  if (typeof content === 'string' && content.startsWith('=') && content.length > 1) return formulaProblem(content);
  return `must be a number or a formula starting with '=', got ${JSON.stringify(content) ?? String(content)}`;
}

/** True for a cell content the engine must evaluate: a formula text. */
function isFormula(content: unknown): boolean {
  return typeof content === 'string' && content.startsWith('=');
}

/** What the engine is given for a cell: the content, or an error in place of content it cannot take. */
function engineContent(content: unknown): Cell {
  // An empty cell would read as 0 in formulas that use it; an error makes them fail visibly instead.
  return contentProblem(content) === undefined ? (content as Cell) : '=#VALUE!';
}

/** Names HyperFormula would refuse or that repeat an earlier name, by cell path, with our message. */
function refusedNames(cells: SheetCell[]): Map<string, string> {
  const refused = new Map<string, string>();
  const seen = new Set<string>();
  for (const c of cells) {
    const name = c.location.name;
    if (name === undefined) continue;
    const problem = formulaNameProblem(name) ?? (seen.has(nameKey(name)) ? `the name "${name}" is used by another cell; names must differ in more than letter case` : undefined);
    if (problem) refused.set(c.location.path, problem);
    seen.add(nameKey(name));
  }
  return refused;
}

/** Every value cell read once: errors in document order, good numbers by path, and the lookup the input builders take. */
export interface ReadCells {
  cellErrors: CellError[];
  cellValues: Map<string, number>;
  /** The number of a value cell, undefined when the cell or its unit failed. */
  lookup: CellLookup;
}

/**
 * The cells of a document of either model in a HyperFormula engine: the part
 * of a workbook that does not depend on the model. Structural edits (adding
 * a row, renaming an id) need a new one.
 */
export class CellSheet<D extends AnyBudgetDocument> {
  protected readonly doc: D;
  private readonly cells: SheetCell[];
  private readonly byPath = new Map<string, number>();
  private readonly nameProblems: Map<string, string>;
  /** The formula engine, built when the first formula appears (absent while every cell is a number). */
  private engine?: HyperFormula;
  private sheetId = 0;

  /**
   * Holds a copy of `document` (the caller's object is not changed), with
   * the cells `list` finds in it, and builds the formula engine if any cell
   * has a formula. Cell problems do not throw; they come back from
   * {@link readCells}. Throws nothing for a document that passed the parser.
   * @param options.engine `always` builds the engine even without formulas (tests compare both ways).
   */
  constructor(document: D, list: (doc: D) => SheetCell[], options: { engine?: 'always' | 'for-formulas' } = {}) {
    this.doc = JSON.parse(JSON.stringify(document)) as D;
    this.cells = list(this.doc);
    this.cells.forEach((c, row) => {
      this.byPath.set(c.location.path, row);
      this.byPath.set(c.unitPath, row);
    });
    this.nameProblems = refusedNames(this.cells);
    if (options.engine === 'always' || this.cells.some((c) => isFormula(c.quantity.value))) this.buildEngine();
  }

  /** Builds the engine from the cells as they are now. */
  private buildEngine(): HyperFormula {
    registerUnitFunctions();
    const named = this.cells.flatMap((c, row) =>
      c.location.name === undefined || this.nameProblems.has(c.location.path) ? [] : [{ name: c.location.name, expression: `=${SHEET_NAME}!$A$${row + 1}` }]);
    const sheet = this.cells.map((c) => [engineContent(c.quantity.value)]);
    const engine = HyperFormula.buildFromSheets({ [SHEET_NAME]: sheet }, engineConfig(sheet.length), named);
    this.engine = engine;
    this.sheetId = engine.getSheetId(SHEET_NAME)!;
    return engine;
  }

  /** A copy of the document with every edit made so far, for saving. */
  get document(): D {
    return JSON.parse(JSON.stringify(this.doc)) as D;
  }

  /** Paths of every value cell, in document order. */
  get cellPaths(): string[] {
    return this.cells.map((c) => c.location.path);
  }

  /**
   * Sets a value cell (`sensors[0].sources[1].value`) to a number or a
   * formula; dependent cells recompute at once. Bad content is not thrown:
   * {@link evaluate} reports it for that cell.
   * @throws InputError when `path` is not a value cell of this document.
   */
  setCell(path: string, content: Cell): void {
    const cell = this.cellAt(path, 'value');
    cell.quantity.value = content;
    if (this.engine) this.engine.setCellContents(this.address(path), [[engineContent(content)]]);
    else if (isFormula(content)) this.buildEngine();
  }

  /**
   * Sets the unit beside a value cell (`sensors[0].sources[1].unit`).
   * References are unaffected: they yield the number as written.
   * @throws InputError when `path` is not the unit of a value cell.
   */
  setUnit(path: string, unit: string): void {
    this.cellAt(path, 'unit').quantity.unit = unit;
  }

  /** Reads every cell: its number or its error, and its unit checked. Throws nothing. */
  readCells(): ReadCells {
    const outcomes = new Map<string, CellOutcome>();
    this.cells.forEach((c, row) => outcomes.set(c.location.path, this.outcome(c, row)));
    explainDependencies(this.cells, outcomes);
    const cellErrors: CellError[] = [];
    const cellValues = new Map<string, number>();
    const badUnits = new Set<string>();
    for (const c of this.cells) {
      const path = c.location.path, outcome = outcomes.get(path)!;
      const nameProblem = this.nameProblems.get(path);
      if (nameProblem) cellErrors.push({ location: { ...c.location, path: path.replace(/\.value$/, ''), field: 'name' }, kind: 'name', message: nameProblem });
      if (isFailure(outcome)) cellErrors.push({ location: c.location, ...outcome });
      else cellValues.set(path, outcome.value);
      const unit = unitProblem(c.quantity.unit, c.expected);
      if (unit) {
        cellErrors.push({ location: { ...c.location, path: c.unitPath }, kind: 'unit', message: unit });
        badUnits.add(path);
      }
    }
    return { cellErrors, cellValues, lookup: (path) => (badUnits.has(path) ? undefined : cellValues.get(path)) };
  }

  /** Releases the engine. The workbook must not be used afterwards. Throws nothing. */
  destroy(): void {
    this.engine?.destroy();
  }

  private cellAt(path: string, part: 'value' | 'unit'): SheetCell {
    const row = this.byPath.get(path);
    const cell = row === undefined ? undefined : this.cells[row];
    if (!cell || (part === 'value' ? cell.location.path : cell.unitPath) !== path) {
      throw new InputError(path, `is not the ${part} of a value cell of this budget; ${part === 'value' ? 'e.g. sensors[0].sources[1].value or mission.segments[0].duration.value' : 'e.g. sensors[0].sources[1].unit'}`);
    }
    return cell;
  }

  private address(path: string): SimpleCellAddress {
    return { sheet: this.sheetId, col: 0, row: this.byPath.get(path)! };
  }

  /** A cell's own outcome: bad content, a grid position, or what the engine computed. */
  private outcome(c: SheetCell, row: number): CellOutcome {
    const problem = contentProblem(c.quantity.value);
    if (problem) return { kind: 'content', message: problem };
    // Without an engine every cell is a finite number (contentProblem passed it).
    if (!this.engine) return { value: c.quantity.value as number };
    const addr = { sheet: this.sheetId, col: 0, row };
    const positions = this.engine.getCellPrecedents(addr).filter((p) => ('sheet' in p ? p.sheet : p.start.sheet) === this.sheetId);
    if (positions.length > 0) {
      const text = positions.map((p) => this.positionText(p)).join(', ');
      return { kind: 'position', message: `refers to the grid position ${text}; formulas here use names (a named value, sensorId.rowId, or mission.initialPosition), and a name that looks like a cell reference such as ARW1 is read as one` };
    }
    return outcomeOf(this.engine.getCellValue(addr));
  }

  private positionText(p: SimpleCellAddress | SimpleCellRange): string {
    const engine = this.engine!;
    const text = 'sheet' in p ? engine.simpleCellAddressToString(p, this.sheetId) : engine.simpleCellRangeToString(p, this.sheetId);
    return text ?? 'a cell';
  }
}

/** An editable, evaluable planar budget. Structural edits (adding a row, renaming an id) need a new workbook. */
export class BudgetWorkbook extends CellSheet<BudgetDocument> {
  /** Builds the engine for a copy of `document`; see {@link CellSheet}. Throws nothing for a parsed planar document. */
  constructor(document: BudgetDocument, options: { engine?: 'always' | 'for-formulas' } = {}) {
    super(document, listCells, options);
  }

  /**
   * Reads every cell and builds the engine's input from those that
   * evaluated. Throws nothing: every problem is a cell error, and a failure
   * that leaves no input is `blocked`.
   */
  evaluate(): SheetEvaluation {
    const { cellErrors, cellValues, lookup } = this.readCells();
    return { ...buildBudgetInput(this.doc, lookup), cellErrors, cellValues };
  }
}
