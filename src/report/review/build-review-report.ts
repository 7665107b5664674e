import type { BudgetDocument, SizingRunEntry } from '../../document/budget-document';
import { evaluateBudgetDocument } from '../../sheet';
import { computeBudget, type BudgetResult } from '../../pipeline';
import { computeFilterDesign } from '../../suboptimal/compute-filter-design';
import { hasFilterDesign } from '../../suboptimal/filter-rows';
import { sweepFilterR } from '../../suboptimal/r-sweep';
import { assumptionSensitivity, type SensitivityOptions } from '../../sensitivity/assumption-sensitivity';
import { buildFilterDesignJson } from '../filter-design-json';
import type { BudgetInput } from '../../inputs/budget-input';
import { sizeSource } from '../../budget/sizing';
import { InputError, SigmaLedgerError } from '../../errors';
import { buildJsonResult } from '../json-result';
import type { ReviewReport } from './review-report';
import type { ReportProvenance, ReviewContext, SizingOutcome } from './review-context';
import { REVIEW_SECTIONS } from './review-sections';

/** Analyses the report adds when asked (the CLI's --sensitivity and --r-sweep; the document has no key for them yet). */
export interface ReviewAnalyses {
  /** Run the assumption sensitivity with these options (rows picked, range). */
  sensitivity?: SensitivityOptions;
  /** Sweep the filter's R of each of these aiding sensors from ×0.1 to ×10. */
  rSweepSensors?: string[];
}

/** A sizing run to include: the row `vary` (`sensorId.rowId`) against requirement `requirement` (the document's `sizing[]`). */
export type SizingRequest = Pick<SizingRunEntry, 'requirement' | 'vary'>;

/**
 * Evaluates a document and builds its design-review report (pure: the CLI and
 * the page's worker call the same function). Cells that fail are listed and
 * the report is marked partial; sizing runs are bisections (each a full
 * covariance run of the totals); by default the runs the document's
 * `sizing[]` asks for. A run that cannot be made (an unknown row) is listed
 * with its message rather than stopping the report.
 * @throws InputError when nothing can be computed (a start-pose or step cell
 *   failed, or the engine refuses the input); the message names the field.
 */
export function buildReviewReport(
  document: BudgetDocument, provenance: ReportProvenance, sizing: SizingRequest[] = document.sizing ?? [], analyses: ReviewAnalyses = {},
): ReviewReport {
  const sheet = evaluateBudgetDocument(document);
  if (!sheet.input) throw new InputError(provenance.fileName, sheet.blocked ?? 'nothing can be computed');
  const input = sheet.input;
  const result = computeBudget(input);
  const problems = [...sheet.cellErrors.map((e) => `${e.location.path}: ${e.message}`), ...sheet.omitted.map((o) => `${o.path}: left out (${o.what})`)];
  const ctx: ReviewContext = {
    ...provenance, document, input, result, problems,
    json: buildJsonResult(result, document.title),
    cellValues: sheet.cellValues,
    sizing: sizing.map((s) => runSizing(input, s)),
    ...filterAnalyses(input, result, analyses),
  };
  return {
    title: document.title + (problems.length ? ' (PARTIAL)' : ''),
    subtitle: `${provenance.fileName} · SHA-256 ${provenance.documentSha256} · Sigma Ledger ${provenance.toolVersion}`,
    sections: REVIEW_SECTIONS.map((build) => build(ctx)).filter((s) => s !== undefined),
  };
}

/** The filter design (when rows are tuned), the sensitivity and the R sweeps asked for; a run that cannot be made keeps its message. */
function filterAnalyses(input: BudgetInput, result: BudgetResult, analyses: ReviewAnalyses): Pick<ReviewContext, 'filterDesign' | 'sensitivity' | 'rSweeps'> {
  const design = hasFilterDesign(input.sensors) ? computeFilterDesign(input, result) : undefined;
  const range = analyses.sensitivity?.range ?? [0.5, 2];
  return {
    ...(design && { filterDesign: { result: design, json: buildFilterDesignJson(design, result.model, input) } }),
    ...(analyses.sensitivity && { sensitivity: attempt(() => ({ range, entries: assumptionSensitivity(input, analyses.sensitivity) }), (problem) => ({ problem })) }),
    rSweeps: (analyses.rSweepSensors ?? []).map((id) => attempt(() => sweepFilterR(input, result, id), (problem) => ({ sensorId: id, problem }))),
  };
}

function attempt<T, F>(run: () => T, failed: (problem: string) => F): T | F {
  try {
    return run();
  } catch (e) {
    if (!(e instanceof SigmaLedgerError)) throw e;
    return failed(e.message);
  }
}

function runSizing(input: BudgetInput, s: SizingRequest): SizingOutcome {
  try {
    return sizeSource(input, s.requirement, s.vary);
  } catch (e) {
    if (!(e instanceof SigmaLedgerError)) throw e;
    return { requirementId: s.requirement, sourceId: s.vary, problem: e.message };
  }
}
