import type { BudgetDocument, SizingRunEntry } from '../../document/budget-document';
import { evaluateBudgetDocument } from '../../sheet';
import { computeBudget } from '../../pipeline';
import type { BudgetInput } from '../../inputs/budget-input';
import { sizeSource } from '../../budget/sizing';
import { InputError, SigmaLedgerError } from '../../errors';
import { buildJsonResult } from '../json-result';
import type { ReviewReport } from './review-report';
import type { ReportProvenance, ReviewContext, SizingOutcome } from './review-context';
import { REVIEW_SECTIONS } from './review-sections';

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
export function buildReviewReport(document: BudgetDocument, provenance: ReportProvenance, sizing: SizingRequest[] = document.sizing ?? []): ReviewReport {
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
  };
  return {
    title: document.title + (problems.length ? ' (PARTIAL)' : ''),
    subtitle: `${provenance.fileName} · SHA-256 ${provenance.documentSha256} · Sigma Ledger ${provenance.toolVersion}`,
    sections: REVIEW_SECTIONS.map((build) => build(ctx)).filter((s) => s !== undefined),
  };
}

function runSizing(input: BudgetInput, s: SizingRequest): SizingOutcome {
  try {
    return sizeSource(input, s.requirement, s.vary);
  } catch (e) {
    if (!(e instanceof SigmaLedgerError)) throw e;
    return { requirementId: s.requirement, sourceId: s.vary, problem: e.message };
  }
}
