/**
 * The body of {@link analyseDocument} for a document already parsed: evaluate
 * the cells with HyperFormula, run the covariance analysis, build the JSON
 * report. Kept apart from the parser so that the page's compute worker, which
 * gets parsed documents, does not bundle the schema validator.
 */
import type { BudgetDocument } from './document/budget-document';
import { evaluateBudgetDocument } from './sheet/evaluate-budget-document';
import { documentPathOf } from './sheet/input-paths';
import type { SheetEvaluation } from './sheet/sheet-evaluation';
import type { BudgetInput } from './inputs/budget-input';
import { SigmaLedgerError } from './errors';
import { dropRefusedItems } from './sheet/drop-refused-items';
import { computeBudget, prepareBudget, type BudgetResult } from './pipeline';
import { buildJsonResult, type JsonResult } from './report/json-result';

/** Options of {@link analyseDocument}; every one may be left out. */
export interface AnalyseOptions {
  /** Name shown at the start of parse messages (a file name or a tab title); default `budget`. */
  name?: string;
  /** With `false`, totals only (several times faster): no per-source contributions or shares. */
  contributions?: boolean;
  /**
   * The JSON report: `false` for none (the text summary needs only `budget`);
   * otherwise its series keep every n-th step and the last (`every`, default 1),
   * or as few as keep at most `maxPoints` points.
   */
  report?: false | { every?: number; maxPoints?: number };
  /** Evaluates the cells instead of a fresh workbook (ViewSession keeps its workbook between edits). */
  evaluate?: (document: BudgetDocument) => SheetEvaluation;
  /** Called with the evaluated input just before the analysis runs (to announce a long run, say). */
  beforeCompute?: (input: BudgetInput) => void;
  /**
   * `false`: evaluate the cells only, with no covariance run (`budget` and `report` absent), for callers
   * that run analyses of their own on `sheet.input` (the sensitivity, the R sweep, a row sweep).
   */
  compute?: false;
}

/** Why nothing could be computed, with the document path (`sensors[0].sources[2].value`) when one is known. */
export interface AnalysisBlock {
  message: string;
  path?: string;
}

/** A document analysed as far as it could be. */
export interface DocumentAnalysis {
  /** Absent for planar budgets (3-D ones: InertialDocumentAnalysis, `model: 'inertial'`). */
  model?: 'planar';
  document: BudgetDocument;
  /** One note per format migration applied while parsing (empty for a current file or a parsed document). */
  notes: string[];
  sheet: SheetEvaluation;
  /** True when cells with errors were left out: the verdicts miss those rows and cannot be trusted. */
  partial: boolean;
  /** The document's title, with "(PARTIAL: ...)" when partial. */
  title: string;
  /** Set when nothing could be computed: the sheet could not make an input, or the engine refused it. */
  blocked?: AnalysisBlock;
  /** The analysis (absent when blocked). */
  budget?: BudgetResult;
  /** The JSON report (format sigma-ledger-result; absent when blocked or with `report: false`). */
  report?: JsonResult;
}

/**
 * Evaluates and analyses a parsed, valid budget document; see {@link analyseDocument}.
 * Bad cells and engine input errors come back in the result, never as a throw.
 */
export function analyseParsedDocument(doc: BudgetDocument, notes: string[], options: AnalyseOptions = {}): DocumentAnalysis {
  const sheet = (options.evaluate ?? evaluateDroppingRefused)(doc);
  const partial = sheet.cellErrors.length > 0 || sheet.omitted.length > 0;
  const title = doc.title + (partial ? ' (PARTIAL: cells with errors were left out)' : '');
  const base = { document: doc, notes, sheet, partial, title };
  if (!sheet.input) return { ...base, blocked: { message: sheet.blocked ?? 'nothing to compute' } };
  if (options.compute === false) return base;
  try {
    options.beforeCompute?.(sheet.input);
    const budget = computeBudget(sheet.input, { contributions: options.contributions, every: options.report ? options.report.every : undefined });
    // The engine already recorded every recordEvery-th step: thin the report only by what is left of the stride asked for.
    const report = options.report === false ? undefined : buildJsonResult(budget, title, Math.max(1, Math.ceil(reportEvery(budget, options.report) / budget.recordEvery)));
    return { ...base, budget, ...(report && { report }) };
  } catch (e) {
    if (!(e instanceof SigmaLedgerError)) throw e;
    if (!e.path) return { ...base, blocked: { message: e.message } };
    return { ...base, blocked: { message: e.message.slice(e.path.length + 2), path: documentPathOf(e.path, sheet.indexMap) } };
  }
}

function reportEvery(budget: BudgetResult, report: { every?: number; maxPoints?: number } = {}): number {
  if (report.maxPoints) return Math.max(report.every ?? 1, Math.ceil(budget.trajectory.tS.length / report.maxPoints));
  return report.every ?? 1;
}

/** Evaluates the cells, then leaves out (in place, like cell errors) the items the engine refuses, e.g. a unit of the wrong kind for its row. */
function evaluateDroppingRefused(doc: BudgetDocument): SheetEvaluation {
  return dropRefusedItems(doc, evaluateBudgetDocument(doc), (input) => prepareBudget(input));
}
