/** `sigma-ledger check FILE`: validate a budget and evaluate its cells (and its engine input), without reporting. */
import { EXIT, type Io } from './commands';
import type { CliCommand } from './cli-command';
import { loadAnyBudget, reportProblems, throwIfBlocked } from './load-budget';

/** Runs `check`; returns 0 for a valid budget, 2 otherwise. @throws SigmaLedgerError for bad input. */
export function checkCommand(file: string, io: Io): number {
  const loaded = loadAnyBudget(file, { report: false });
  if (reportProblems(loaded, io)) return EXIT.badInput;
  throwIfBlocked(loaded);
  io.out(`${loaded.fileName}: valid (${loaded.sheet.cellValues.size} cells evaluated)\n`);
  return EXIT.pass;
}

export const CHECK_COMMAND: CliCommand = {
  operands: ['FILE'],
  synopsis: '',
  description: 'validate the file and evaluate its cells without reporting the analysis',
  options: {},
  run: ([file], _values, io) => checkCommand(file, io),
};
