/**
 * The 3-D branch of analyseDocument: evaluate the cells of an inertial
 * document, leave out the items the engine refuses (in place, like cell
 * errors), run the 3-D analysis and build its JSON report. Same result shape
 * as the planar DocumentAnalysis, with `model: 'inertial'`.
 */
import type { InertialBudgetDocument } from './document/inertial-document';
import { SigmaLedgerError } from './errors';
import { computeInertialBudget, prepareInertialBudget, type InertialBudgetResult } from './inertial-pipeline';
import type { InertialBudgetInput } from './inertial/inertial-input';
import { buildInertialJsonResult, type InertialJsonResult } from './report/inertial-json-result';
import { dropRefusedInertialItems } from './sheet/drop-refused-inertial-items';
import { inertialDocumentPathOf } from './sheet/inertial-input-paths';
import { evaluateInertialDocument, type InertialSheetEvaluation } from './sheet/inertial-workbook';
import type { AnalysisBlock } from './analyse-parsed-document';

/** Options of the 3-D analysis (the planar AnalyseOptions that apply). */
export interface InertialAnalyseOptions {
  contributions?: boolean;
  report?: false | { every?: number; maxPoints?: number };
  /** Evaluates the cells instead of a fresh workbook (a page keeps its InertialWorkbook between edits). */
  evaluate?: (document: InertialBudgetDocument) => InertialSheetEvaluation;
  beforeCompute?: (input: InertialBudgetInput) => void;
}

/** A 3-D document analysed as far as it could be. */
export interface InertialDocumentAnalysis {
  model: 'inertial';
  document: InertialBudgetDocument;
  notes: string[];
  sheet: InertialSheetEvaluation;
  /** True when cells with errors were left out. */
  partial: boolean;
  title: string;
  blocked?: AnalysisBlock;
  budget?: InertialBudgetResult;
  report?: InertialJsonResult;
}

/**
 * Evaluates and analyses a parsed 3-D document. Bad cells and engine input
 * errors come back in the result (paths in the document's terms), never as a throw.
 */
export function analyseInertialDocument(doc: InertialBudgetDocument, notes: string[], options: InertialAnalyseOptions = {}): InertialDocumentAnalysis {
  const evaluated = (options.evaluate ?? evaluateInertialDocument)(doc);
  const sheet = dropRefusedInertialItems(doc, evaluated, (input) => prepareInertialBudget(input));
  const partial = sheet.cellErrors.length > 0 || sheet.omitted.length > 0;
  const title = doc.title + (partial ? ' (PARTIAL: cells with errors were left out)' : '');
  const base = { model: 'inertial' as const, document: doc, notes, sheet, partial, title };
  if (!sheet.input) return { ...base, blocked: { message: sheet.blocked ?? 'nothing to compute' } };
  try {
    options.beforeCompute?.(sheet.input);
    const budget = computeInertialBudget(sheet.input, { contributions: options.contributions });
    if (options.report === false) return { ...base, budget };
    const steps = budget.budget.rows.length;
    const every = Math.max(options.report?.every ?? 1, options.report?.maxPoints ? Math.ceil(steps / options.report.maxPoints) : 1);
    return { ...base, budget, report: buildInertialJsonResult(budget, title, every) };
  } catch (e) {
    if (!(e instanceof SigmaLedgerError)) throw e;
    if (!e.path) return { ...base, blocked: { message: e.message } };
    return { ...base, blocked: { message: e.message.slice(e.path.length + 2), path: inertialDocumentPathOf(e.path, sheet.indexMap) } };
  }
}
