/**
 * Budget text to a validated document: read the JSON safely, migrate an
 * older format version, check the shape against the published schema, then
 * the rules on ids and names. Each stage refuses the whole file with the
 * path of the first problem it finds.
 */
import { BudgetFileError } from './budget-file-error';
import type { BudgetDocument } from './budget-document';
import { budgetValidator } from './budget-schema';
import { checkIds } from './check-ids';
import type { AnyBudgetDocument } from './inertial-document';
import { checkModelKeys } from './model-keys';
import { migrateToCurrent, type MigrationRegistry } from './format-version';
import { readJson } from './read-json';
import { describeSchemaErrors } from './schema-errors';

/** A document that passed every check, with a note per migration applied (empty for a current file). */
export interface ParsedBudget<D extends AnyBudgetDocument = BudgetDocument> {
  document: D;
  notes: string[];
}

/** Options of {@link parseBudgetDocument}. */
export interface ParseOptions {
  /** Migrations by starting version; defaults to the project's (tests pass their own). */
  migrations?: MigrationRegistry;
}

/** Throws unless `raw` has the shape the schema describes. */
function requireShape(raw: unknown, fileName: string): asserts raw is AnyBudgetDocument {
  const validate = budgetValidator();
  if (validate(raw)) return;
  const problem = describeSchemaErrors(validate.errors ?? [], raw);
  throw new BudgetFileError(fileName, problem.path, problem.message);
}

/**
 * Parses and validates the text of a budget file of either model (planar or
 * 3-D). Cells are not evaluated here: a formula with a bad reference is a
 * valid document (its error is reported by the sheet, in place).
 * @param fileName shown at the start of every message (a file name or a tab title).
 * @throws BudgetFileError (an InputError) naming the file and the path of the
 *   first problem: text too large or nested too deep, invalid JSON, a key
 *   repeated or forbidden (`__proto__`, `constructor`, `prototype`), not a
 *   budget, a newer format version, an unknown key, a wrong type or value,
 *   a key of the other model, a duplicate id or an unusable name.
 */
export function parseAnyBudgetDocument(text: string, fileName: string, options: ParseOptions = {}): ParsedBudget<AnyBudgetDocument> {
  const value = readJson(text, fileName);
  const { raw, notes } = migrateToCurrent(value, fileName, options.migrations);
  requireShape(raw, fileName);
  checkModelKeys(raw as unknown as Record<string, unknown>, fileName);
  checkIds(raw, fileName);
  return { document: raw, notes };
}

/**
 * {@link parseAnyBudgetDocument} for callers that read planar budgets only
 * (the page's planar grid, `--into`).
 * @throws BudgetFileError as parseAnyBudgetDocument does, and naming `model`
 *   for a 3-D budget.
 */
export function parseBudgetDocument(text: string, fileName: string, options: ParseOptions = {}): ParsedBudget {
  const parsed = parseAnyBudgetDocument(text, fileName, options);
  if (parsed.document.model === 'inertial') {
    throw new BudgetFileError(fileName, 'model', 'this is a 3-D (inertial) budget, and this part of Sigma Ledger reads planar budgets only; use sigma-ledger run or size');
  }
  return { document: parsed.document, notes: parsed.notes };
}
