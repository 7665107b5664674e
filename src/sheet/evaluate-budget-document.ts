import type { BudgetDocument } from '../document/budget-document';
import { BudgetWorkbook } from './budget-workbook';
import type { SheetEvaluation } from './sheet-evaluation';

/**
 * Evaluates every cell of a document once and builds the engine's input:
 * a workbook built, read and released. For repeated edits keep a
 * {@link BudgetWorkbook} instead (building one is the expensive part).
 * Throws nothing for a document that passed parseBudgetDocument: bad cells
 * come back in `cellErrors`.
 */
export function evaluateBudgetDocument(doc: BudgetDocument): SheetEvaluation {
  const workbook = new BudgetWorkbook(doc);
  try {
    return workbook.evaluate();
  } finally {
    workbook.destroy();
  }
}
