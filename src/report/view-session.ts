import type { BudgetDocument } from '../document/budget-document';
import { isInertialDocument, type AnyBudgetDocument, type InertialBudgetDocument } from '../document/inertial-document';
import { BudgetWorkbook, type CellSheet } from '../sheet/budget-workbook';
import { listCells, type SheetCell } from '../sheet/cell-list';
import { listInertialCells } from '../sheet/inertial-cell-list';
import { InertialWorkbook, type InertialSheetEvaluation } from '../sheet/inertial-workbook';
import type { SheetEvaluation } from '../sheet/sheet-evaluation';
import { inertialViewFromSheet } from './inertial-view-result';
import { viewFromSheet, type ViewResult } from './view-result';

/** A workbook of either model with its evaluation. */
type AnyWorkbook = CellSheet<AnyBudgetDocument> & { evaluate(): SheetEvaluation | InertialSheetEvaluation };

/** The cells of a document of either model. */
function cellsOf(doc: AnyBudgetDocument): SheetCell[] {
  return isInertialDocument(doc) ? listInertialCells(doc) : listCells(doc);
}

/**
 * Views of successive versions of one document, keeping its HyperFormula
 * workbook between them: building the workbook is most of the sheet's cost
 * (about 12 ms of 15 for the examples; BudgetWorkbook's notes), while an
 * edit of a few cells costs well under a millisecond. When anything but
 * cell contents and units changed (rows, ids, kinds, text), the workbook is
 * rebuilt. A 3-D document (`"model": "inertial"`) gets an InertialWorkbook
 * and the inertial view (inertial-view-result.ts).
 */
export class ViewSession {
  private workbook?: AnyWorkbook;
  private structure = '';
  private sheet?: { doc: AnyBudgetDocument; evaluation: SheetEvaluation | InertialSheetEvaluation };

  /** The view of `doc`; with `contributions: false`, totals only. Never throws for bad input (see computeView). */
  view(doc: BudgetDocument | InertialBudgetDocument, options: { contributions?: boolean } = {}): ViewResult {
    const evaluation = this.evaluate(doc);
    if (isInertialDocument(doc)) return inertialViewFromSheet(doc, evaluation as InertialSheetEvaluation, options);
    return viewFromSheet(doc, evaluation as SheetEvaluation, options);
  }

  /** The sheet of `doc`, by updating the kept workbook where only cells changed. */
  private evaluate(doc: AnyBudgetDocument): SheetEvaluation | InertialSheetEvaluation {
    if (this.sheet?.doc === doc) return this.sheet.evaluation;
    const structure = structureKey(doc);
    if (!this.workbook || structure !== this.structure) {
      this.workbook?.destroy();
      this.workbook = (isInertialDocument(doc) ? new InertialWorkbook(doc) : new BudgetWorkbook(doc)) as unknown as AnyWorkbook;
      this.structure = structure;
    } else {
      const kept = cellsOf(this.workbook.document);
      cellsOf(doc).forEach((c, i) => {
        const old = kept[i].quantity;
        if (old.value !== c.quantity.value) this.workbook!.setCell(c.location.path, c.quantity.value);
        if (old.unit !== c.quantity.unit) this.workbook!.setUnit(c.unitPath, c.quantity.unit);
      });
    }
    const evaluation = this.workbook.evaluate();
    this.sheet = { doc, evaluation };
    return evaluation;
  }
}

/** The document with every cell's content and unit blanked: equal keys mean only cells differ. */
function structureKey(doc: AnyBudgetDocument): string {
  const copy = JSON.parse(JSON.stringify(doc)) as AnyBudgetDocument;
  for (const c of cellsOf(copy)) {
    c.quantity.value = 0;
    c.quantity.unit = '';
  }
  return JSON.stringify(copy);
}
