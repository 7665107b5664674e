/**
 * One function from a budget document to its result, used by the command
 * line, the page's compute worker and library users alike: parse and
 * validate the text (when given text), evaluate the cells with HyperFormula,
 * run the covariance analysis, and build the JSON report.
 */
import { parseBudgetDocument } from './document/parse-budget-document';
import type { BudgetDocument } from './document/budget-document';
import { analyseParsedDocument, type AnalyseOptions, type DocumentAnalysis } from './analyse-parsed-document';

export type { AnalyseOptions, AnalysisBlock, DocumentAnalysis } from './analyse-parsed-document';

/**
 * Parses (when given text), evaluates and analyses a budget document. Bad
 * cells and engine input errors come back in `sheet.cellErrors`, `partial`
 * and `blocked`, never as a throw.
 * @param document the text of a budget file, or a document already parsed and validated.
 * @throws BudgetFileError (a SigmaLedgerError) naming `options.name` and the
 *   path when the text is not a valid budget document.
 */
export function analyseDocument(document: string | BudgetDocument, options: AnalyseOptions = {}): DocumentAnalysis {
  if (typeof document !== 'string') return analyseParsedDocument(document, [], options);
  const parsed = parseBudgetDocument(document, options.name ?? 'budget');
  return analyseParsedDocument(parsed.document, parsed.notes, options);
}
