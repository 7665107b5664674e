import type { BudgetDocument } from '../document/budget-document';
import { BudgetWorkbook } from '../sheet/budget-workbook';
import { listCells } from '../sheet/cell-list';
import type { SheetEvaluation } from '../sheet/sheet-evaluation';
import { viewFromSheet, type ViewResult } from './view-result';

/**
 * Views of successive versions of one document, keeping its HyperFormula
 * workbook between them: building the workbook is most of the sheet's cost
 * (about 12 ms of 15 for the examples; BudgetWorkbook's notes), while an
 * edit of a few cells costs well under a millisecond. When anything but
 * cell contents and units changed (rows, ids, kinds, text), the workbook is
 * rebuilt.
 */
export class ViewSession {
  private workbook?: BudgetWorkbook;
  private structure = '';
  private sheet?: { doc: BudgetDocument; evaluation: SheetEvaluation };

  /** The view of `doc`; with `contributions: false`, totals only. Never throws for bad input (see computeView). */
  view(doc: BudgetDocument, options: { contributions?: boolean } = {}): ViewResult {
    return viewFromSheet(doc, this.evaluate(doc), options);
  }

  /** The sheet of `doc`, by updating the kept workbook where only cells changed. */
  private evaluate(doc: BudgetDocument): SheetEvaluation {
    if (this.sheet?.doc === doc) return this.sheet.evaluation;
    const structure = structureKey(doc);
    if (!this.workbook || structure !== this.structure) {
      this.workbook?.destroy();
      this.workbook = new BudgetWorkbook(doc);
      this.structure = structure;
    } else {
      const kept = listCells(this.workbook.document);
      listCells(doc).forEach((c, i) => {
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
function structureKey(doc: BudgetDocument): string {
  const copy = JSON.parse(JSON.stringify(doc)) as BudgetDocument;
  for (const c of listCells(copy)) {
    c.quantity.value = 0;
    c.quantity.unit = '';
  }
  return JSON.stringify(copy);
}
