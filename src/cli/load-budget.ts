import { readFileSync } from 'node:fs';
import { readBudgetText } from './read-budget-text';
import { documentPathOf } from '../sheet';
import { InputError, SigmaLedgerError } from '../errors';
import type { BudgetInput } from '../inputs/budget-input';
import { analyseDocument, type AnalyseOptions, type DocumentAnalysis } from '../analyse-document';
import type { Io } from './commands';

/** The operand that reads the budget from standard input. */
export const STDIN_OPERAND = '-';

/** A budget file read and analysed (as far as `analyseDocument` got), with the name messages start with. */
export interface LoadedBudget extends DocumentAnalysis {
  /** The file's path, or `stdin` for `-`. */
  fileName: string;
}

/**
 * Reads a budget file (`-`: standard input) and analyses it.
 * @throws InputError naming the file for an unreadable, oversize or malformed file.
 */
export function loadBudget(file: string, options: AnalyseOptions = {}): LoadedBudget {
  const fileName = file === STDIN_OPERAND ? 'stdin' : file;
  const text = file === STDIN_OPERAND ? readStdin() : readBudgetText(file);
  return { ...analyseDocument(text, { ...options, name: fileName }), fileName };
}

function readStdin(): string {
  try {
    // The parser refuses text over MAX_TEXT_CHARS with its own message.
    return readFileSync(0, 'utf8');
  } catch (e) {
    throw new InputError('stdin', `cannot be read (${(e as NodeJS.ErrnoException).code ?? 'error'}): pipe a budget into it, e.g. cat budget.json | sigma-ledger run -`);
  }
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

/**
 * Throws the analysis's engine input error, if any, with the file name and the document path.
 * @throws InputError naming the file and the document path.
 */
export function throwIfBlocked(loaded: LoadedBudget): void {
  const b = loaded.blocked;
  if (b) throw new InputError(`${loaded.fileName}${b.path ? `: ${b.path}` : ''}`, b.message);
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

/** Prints a loaded budget's migration notes, cell errors and omitted items; true when there were problems. */
export function reportProblems(loaded: LoadedBudget, io: Io): boolean {
  for (const note of loaded.notes) io.err(`${loaded.fileName}: ${note}\n`);
  const problems = sheetProblems(loaded);
  for (const p of problems) io.err(`${p}\n`);
  return problems.length > 0;
}
