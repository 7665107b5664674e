import { readFileSync } from 'node:fs';
import { readBudgetText } from './read-budget-text';
import { documentPathOf } from '../sheet';
import { InputError, SigmaLedgerError } from '../errors';
import type { BudgetInput } from '../inputs/budget-input';
import type { InertialBudgetInput } from '../inertial/inertial-input';
import { analyseDocument, type AnalyseOptions, type DocumentAnalysis, type InertialDocumentAnalysis } from '../analyse-document';
import { parseAnyBudgetDocument } from '../document/parse-budget-document';
import { inertialDocumentPathOf } from '../sheet/inertial-input-paths';
import type { Io } from './commands';

/** The operand that reads the budget from standard input. */
export const STDIN_OPERAND = '-';

/** A budget file read and analysed (as far as `analyseDocument` got), with the name messages start with. */
export interface LoadedBudget extends DocumentAnalysis {
  /** The file's path, or `stdin` for `-`. */
  fileName: string;
}

/** A 3-D budget file read and analysed. */
export interface LoadedInertialBudget extends InertialDocumentAnalysis {
  fileName: string;
}

/** Commands that read 3-D budgets, for the message other commands give. */
const INERTIAL_COMMANDS = 'run, check and size';

/**
 * Reads a planar budget file (`-`: standard input) and analyses it.
 * @param command the command's name, for the message a 3-D budget gets.
 * @throws InputError naming the file for an unreadable, oversize or malformed
 *   file, and naming `model` for a 3-D budget (before any computing).
 */
export function loadBudget(file: string, options: AnalyseOptions = {}, command = 'this command'): LoadedBudget {
  const loaded = loadAnyBudget(file, options, (model) => {
    if (model === 'inertial') {
      throw new InputError(`${file === STDIN_OPERAND ? 'stdin' : file}: model`, `is "inertial": ${command} reads planar budgets only; 3-D budgets work with ${INERTIAL_COMMANDS}`);
    }
  });
  return loaded as LoadedBudget;
}

/**
 * Reads a budget file of either model and analyses it.
 * @param check called with the document's model before anything is computed (it may throw).
 * @throws InputError naming the file for an unreadable, oversize or malformed file.
 */
export function loadAnyBudget(
  file: string, options: AnalyseOptions = {}, check?: (model: 'planar' | 'inertial') => void,
): LoadedBudget | LoadedInertialBudget {
  const fileName = file === STDIN_OPERAND ? 'stdin' : file;
  const text = file === STDIN_OPERAND ? readStdin() : readBudgetText(file);
  const parsed = parseAnyBudgetDocument(text, fileName);
  check?.(parsed.document.model === 'inertial' ? 'inertial' : 'planar');
  const analysis = analyseDocument(parsed.document, { ...options, name: fileName });
  return { ...analysis, notes: parsed.notes, fileName };
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
export function sheetProblems(loaded: LoadedBudget | LoadedInertialBudget): string[] {
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
export function throwIfBlocked(loaded: LoadedBudget | LoadedInertialBudget): void {
  const b = loaded.blocked;
  if (b) throw new InputError(`${loaded.fileName}${b.path ? `: ${b.path}` : ''}`, b.message);
}

/** Runs an engine call, turning an engine input error's path into the document's path and prefixing the file name. */
export function withDocumentPaths<T>(loaded: LoadedBudget, fn: (input: BudgetInput) => T): T {
  return withPaths(loaded, loaded.sheet.input, fn, (path) => documentPathOf(path, loaded.sheet.indexMap));
}

/** {@link withDocumentPaths} for a 3-D budget: inertial engine paths become document paths. */
export function withInertialDocumentPaths<T>(loaded: LoadedInertialBudget, fn: (input: InertialBudgetInput) => T): T {
  return withPaths(loaded, loaded.sheet.input, fn, (path) => inertialDocumentPathOf(path, loaded.sheet.indexMap));
}

function withPaths<I, T>(loaded: LoadedBudget | LoadedInertialBudget, input: I | undefined, fn: (input: I) => T, toDocument: (path: string) => string): T {
  if (!input) throw new InputError(loaded.fileName, loaded.sheet.blocked ?? 'no budget could be evaluated');
  try {
    return fn(input);
  } catch (e) {
    if (e instanceof SigmaLedgerError && !(e.message.startsWith(loaded.fileName))) {
      const docPath = e.path ? toDocument(e.path) : '';
      const detail = e.path ? e.message.slice(e.path.length + 2) : e.message;
      throw new InputError(`${loaded.fileName}: ${docPath}`.replace(/: $/, ''), detail);
    }
    throw e;
  }
}

/** Prints a loaded budget's migration notes, cell errors and omitted items; true when there were problems. */
export function reportProblems(loaded: LoadedBudget | LoadedInertialBudget, io: Io): boolean {
  for (const note of loaded.notes) io.err(`${loaded.fileName}: ${note}\n`);
  const problems = sheetProblems(loaded);
  for (const p of problems) io.err(`${p}\n`);
  return problems.length > 0;
}

