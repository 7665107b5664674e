import { parseBudgetDocument, type BudgetDocument } from '../document';
import { readBudgetText } from './read-budget-text';
import { dropRefusedItems } from '../sheet/drop-refused-items';
import { prepareBudget } from '../pipeline';
import { evaluateBudgetDocument, documentPathOf, type SheetEvaluation } from '../sheet';
import { InputError, SigmaLedgerError } from '../errors';
import type { BudgetInput } from '../inputs/budget-input';

/** A budget file read, validated and evaluated. */
export interface LoadedBudget {
  fileName: string;
  document: BudgetDocument;
  notes: string[];
  sheet: SheetEvaluation;
}

/**
 * Reads a budget file and evaluates its cells.
 * @throws InputError naming the file for an unreadable, oversize or malformed file.
 */
export function loadBudget(fileName: string): LoadedBudget {
  const text = readBudgetText(fileName);
  const { document, notes } = parseBudgetDocument(text, fileName);
  // Items the engine refuses (a unit of the wrong kind for the row) are left out in place, like cell errors.
  return { fileName, document, notes, sheet: dropRefusedItems(document, evaluateBudgetDocument(document), (input) => prepareBudget(input)) };
}

/** Lines describing every cell error and omitted item, each with its location. */
export function sheetProblems(loaded: LoadedBudget): string[] {
  const lines = loaded.sheet.cellErrors.map((e) => `${loaded.fileName}: ${e.location.path}: ${e.message}`);
  if (loaded.sheet.blocked) {
    lines.push(`error: ${loaded.fileName}: nothing can be computed: ${loaded.sheet.blocked}`);
    return lines;
  }
  for (const o of loaded.sheet.omitted) lines.push(`${loaded.fileName}: ${o.path}: left out of the analysis (${o.what})`);
  return lines;
}

/** Runs an engine call, turning an engine input error's path into the document's path and prefixing the file name. */
export function withDocumentPaths<T>(loaded: LoadedBudget, fn: (input: BudgetInput) => T): T {
  const input = loaded.sheet.input;
  if (!input) throw new InputError(loaded.fileName, loaded.sheet.blocked ?? 'no budget could be evaluated');
  try {
    return fn(input);
  } catch (e) {
    if (e instanceof SigmaLedgerError && !(e.message.startsWith(loaded.fileName))) {
      const docPath = e.path ? documentPathOf(e.path, loaded.sheet.indexMap) : '';
      const detail = e.path ? e.message.slice(e.path.length + 2) : e.message;
      throw new InputError(`${loaded.fileName}: ${docPath}`.replace(/: $/, ''), detail);
    }
    throw e;
  }
}
