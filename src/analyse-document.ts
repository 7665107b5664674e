/**
 * One function from a budget document to its result, used by the command
 * line, the page's compute worker and library users alike: parse and
 * validate the text (when given text), evaluate the cells with HyperFormula,
 * run the covariance analysis, and build the JSON report.
 */
import { parseAnyBudgetDocument } from './document/parse-budget-document';
import type { BudgetDocument } from './document/budget-document';
import { isInertialDocument, type AnyBudgetDocument, type InertialBudgetDocument } from './document/inertial-document';
import { analyseParsedDocument, type AnalyseOptions, type DocumentAnalysis } from './analyse-parsed-document';
import { analyseInertialDocument, type InertialDocumentAnalysis } from './analyse-inertial-document';

export type { AnalyseOptions, AnalysisBlock, DocumentAnalysis } from './analyse-parsed-document';
export type { InertialAnalyseOptions, InertialDocumentAnalysis } from './analyse-inertial-document';

/** The analysis of a document of either model (`model: 'inertial'` tells a 3-D one). */
export type AnyDocumentAnalysis = DocumentAnalysis | InertialDocumentAnalysis;

/**
 * Parses (when given text), evaluates and analyses a budget document of
 * either model, dispatching on its `model`: planar budgets through
 * computeBudget, 3-D ones through computeInertialBudget. Bad cells and
 * engine input errors come back in `sheet.cellErrors`, `partial` and
 * `blocked`, never as a throw.
 * @param document the text of a budget file, or a document already parsed and validated.
 * @param options `evaluate` and `beforeCompute` apply to planar documents only.
 * @throws BudgetFileError (a SigmaLedgerError) naming `options.name` and the
 *   path when the text is not a valid budget document.
 */
export function analyseDocument(document: BudgetDocument, options?: AnalyseOptions): DocumentAnalysis;
export function analyseDocument(document: InertialBudgetDocument, options?: AnalyseOptions): InertialDocumentAnalysis;
export function analyseDocument(document: string | AnyBudgetDocument, options?: AnalyseOptions): AnyDocumentAnalysis;
export function analyseDocument(document: string | AnyBudgetDocument, options: AnalyseOptions = {}): AnyDocumentAnalysis {
  const parsed = typeof document === 'string' ? parseAnyBudgetDocument(document, options.name ?? 'budget') : { document, notes: [] };
  if (isInertialDocument(parsed.document)) {
    return analyseInertialDocument(parsed.document, parsed.notes, { contributions: options.contributions, report: options.report });
  }
  return analyseParsedDocument(parsed.document, parsed.notes, options);
}
