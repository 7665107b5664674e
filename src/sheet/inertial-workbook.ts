/**
 * A 3-D budget document held in a HyperFormula engine: the same cells,
 * names, formulas and in-place errors as a planar workbook
 * (budget-workbook.ts), read into the inertial model's input.
 */
import type { InertialBudgetDocument } from '../document/inertial-document';
import type { InertialBudgetInput } from '../inertial/inertial-input';
import { CellSheet } from './budget-workbook';
import { buildInertialInput, type InertialIndexMap } from './build-inertial-input';
import { listInertialCells } from './inertial-cell-list';
import type { SheetEvaluation } from './sheet-evaluation';

/** What evaluating a 3-D budget's cells gives; see {@link SheetEvaluation} for the shared fields. */
export interface InertialSheetEvaluation extends Omit<SheetEvaluation, 'input' | 'indexMap'> {
  input?: InertialBudgetInput;
  indexMap: InertialIndexMap;
}

/** An editable, evaluable 3-D budget. Structural edits need a new workbook. */
export class InertialWorkbook extends CellSheet<InertialBudgetDocument> {
  /** Builds the engine for a copy of `document`. Throws nothing for a parsed 3-D document. */
  constructor(document: InertialBudgetDocument) {
    super(document, listInertialCells);
  }

  /** Reads every cell and builds the inertial input from those that evaluated. Throws nothing. */
  evaluate(): InertialSheetEvaluation {
    const { cellErrors, cellValues, lookup } = this.readCells();
    return { ...buildInertialInput(this.doc, lookup), cellErrors, cellValues };
  }
}

/** Evaluates every cell of a 3-D document once (a workbook built, read and released). Throws nothing. */
export function evaluateInertialDocument(doc: InertialBudgetDocument): InertialSheetEvaluation {
  const workbook = new InertialWorkbook(doc);
  try {
    return workbook.evaluate();
  } finally {
    workbook.destroy();
  }
}
