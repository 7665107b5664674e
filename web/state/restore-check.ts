/**
 * Autosaved versions checked before they are restored, so a damaged record
 * (a browser crash mid-write, a disk error, an edit by other code) never
 * reaches the engine: the version shown is fully validated as a budget
 * file would be, the others in the history get a shape check.
 */
import { parseAnyBudgetDocument, type BudgetDocument } from '../../src';
import { SigmaLedgerError } from '../../src';

/** True when `doc` passes every check a budget file gets (schema, ids, names). Throws nothing. */
export function isValidBudget(doc: unknown): doc is BudgetDocument {
  try {
    parseAnyBudgetDocument(JSON.stringify(doc), 'autosave'); // either model: a 3-D budget is restored too
    return true;
  } catch (e) {
    if (e instanceof SigmaLedgerError || e instanceof TypeError) return false;
    throw e;
  }
}

/** A cheap shape check for versions in the undo history. Throws nothing. */
export function looksLikeBudget(doc: unknown): doc is BudgetDocument {
  const d = doc as Partial<BudgetDocument> | null;
  return typeof d === 'object' && d !== null && d.format === 'sigma-ledger-budget' && Array.isArray(d.sensors) && typeof d.mission === 'object' && d.mission !== null;
}
