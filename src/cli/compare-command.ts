/** `sigma-ledger compare FILE [--json]`: every candidate of the document's `candidates` side by side. */
import { compareCandidates, formatComparison, type CandidateComparison } from '../compare';
import { InputError } from '../errors';
import { EXIT, type Io } from './commands';
import { JSON_OPTION, type CliCommand } from './cli-command';
import { loadBudget, reportProblems, throwIfBlocked } from './load-budget';
import { escapeTerminalText } from './terminal-text';

/**
 * Runs `compare`: 0 when every slot has a candidate that passes every
 * requirement, 1 when some slot has none, 2 for a bad file or a document as
 * written that has bad cells.
 * @throws SigmaLedgerError for bad input (no candidates, a slot naming a missing sensor).
 */
export function compareCommand(file: string, json: boolean, io: Io): number {
  const loaded = loadBudget(file, { contributions: false, report: false });
  if (reportProblems(loaded, io)) return EXIT.badInput;
  throwIfBlocked(loaded);
  if (!loaded.document.candidates?.length) {
    throw new InputError(
      loaded.fileName,
      'has no candidates to compare; add a "candidates" list (budgets/FORMAT.md, "Candidates")',
    );
  }
  const comparison = compareCandidates(loaded.document, {
    fileName: loaded.fileName,
    onRun: (done, total) => io.err(`candidate ${done} of ${total} done\n`),
  });
  io.out(
    escapeTerminalText(json ? `${JSON.stringify(comparison)}\n` : formatComparison(comparison, loaded.document.title)),
  );
  return everySlotHasAPass(comparison) ? EXIT.pass : EXIT.fail;
}

const everySlotHasAPass = (c: CandidateComparison) => c.slots.every((s) => s.outcomes.some((o) => o.passesAll));

export const COMPARE_COMMAND: CliCommand = {
  operands: ['FILE'],
  synopsis: '[--json]',
  description:
    'each candidate of the document\'s "candidates" in place of its sensor\'s rows, against the same\n' +
    'mission and requirements: verdicts, margins and times to exceed side by side, and the cheapest that passes',
  options: { ...JSON_OPTION },
  run: ([file], values, io) => compareCommand(file, values.json === true, io),
};
