/**
 * `sigma-ledger sensitivity FILE [--rows A.B,C.D] [--range LOW,HIGH] [--json]`:
 * every value marked assumed (and the rows picked) scaled over the range,
 * ranked by the change it makes to each requirement's worst value.
 */
import { InputError } from '../errors';
import { assumptionSensitivity } from '../sensitivity/assumption-sensitivity';
import { formatSensitivity } from '../report/sensitivity-text';
import type { ParsedValues } from './allan-command';
import { EXIT, type Io } from './commands';
import { loadBudget, sheetProblems, withDocumentPaths } from './load-budget';

/** The options `sensitivity` adds (besides `--json`). */
export const SENSITIVITY_CLI_OPTIONS = {
  rows: { type: 'string' },
  range: { type: 'string' },
} as const;

/**
 * Runs the command; exit 0 with the table, 2 for bad input.
 * @throws InputError naming the option or the file's field.
 */
export function sensitivityCommand(file: string, values: ParsedValues, io: Io): number {
  const range = parseRange(values.range);
  const rows = parseRows(values.rows);
  // The sensitivity runs its own analyses (the base one included): the cells are all it needs loaded.
  const loaded = loadBudget(file, { compute: false });
  const problems = sheetProblems(loaded);
  for (const p of problems) io.err(`${p}\n`);
  if (problems.length) return EXIT.badInput;
  const entries = withDocumentPaths(loaded, (input) => assumptionSensitivity(input, { rows, range }));
  io.out(values.json === true ? JSON.stringify({ range, entries }) + '\n' : formatSensitivity(entries, range));
  return EXIT.pass;
}

/** `--rows A.B,C.D` as a list (empty when not given). */
export function parseRows(text: string | boolean | undefined): string[] {
  return typeof text === 'string' ? text.split(',').map((r) => r.trim()).filter(Boolean) : [];
}

/**
 * `--range LOW,HIGH` (default 0.5,2).
 * @throws InputError at --range for anything but two scales 0 < LOW < HIGH.
 */
export function parseRange(text: string | boolean | undefined): [number, number] {
  if (typeof text !== 'string') return [0.5, 2];
  const parts = text.split(',').map(Number);
  if (parts.length !== 2 || !parts.every((v) => v > 0 && Number.isFinite(v)) || !(parts[1] > parts[0])) {
    throw new InputError('--range', `must be two scales LOW,HIGH with 0 < LOW < HIGH, e.g. 0.5,2; got "${text}"`);
  }
  return [parts[0], parts[1]];
}
