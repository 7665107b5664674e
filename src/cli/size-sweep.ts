/**
 * `sigma-ledger size FILE --vary SENSOR.ROW --sweep FROM:TO:N
 * [--requirement ID]`: the row's magnitude swept over N evenly spaced values
 * (in the row's unit), printed as CSV: the value, then each requirement's
 * worst value, limit and verdict. Without --requirement every requirement is
 * read. Progress goes to stderr.
 */
import { InputError } from '../errors';
import { sweepRow, sweepValues, type RowSweep } from '../budget/row-sweep';
import { formatSignificant } from '../units';
import { EXIT, type Io } from './commands';
import { loadBudget, sheetProblems, withDocumentPaths } from './load-budget';
import { checkSizingTarget } from './sizing-target';
import { shardSlice, type ShardSelection } from './shard-option';
import { fileSha256 } from './simulation-parts';
import { writeSweepPart } from './sweep-parts';

/** Options the sweep adds to the command line. */
export const SIZE_SWEEP_CLI_OPTIONS = { sweep: { type: 'string' } } as const;

/**
 * Reads FROM:TO:N.
 * @throws InputError at --sweep naming the expected form.
 */
export function parseSweep(text: string): { from: number; to: number; n: number } {
  const parts = text.split(':');
  const [from, to, n] = parts.map((p) => (p.trim() === '' ? NaN : Number(p)));
  if (parts.length !== 3 || [from, to, n].some((x) => !Number.isFinite(x))) {
    throw new InputError('--sweep', `must be FROM:TO:N in the row's unit, e.g. 0:2:21, got "${text}"`);
  }
  return { from, to, n };
}

/** Where a sharded sweep writes its part (--shard, --output). */
export interface SweepShardOptions {
  shard: ShardSelection;
  output?: string;
}

/**
 * Prints the sweep as CSV; exits 0, or 2 for bad input. With `sharded` it
 * computes only the shard's share of the values (shard-option.ts) and writes
 * a part file for `merge`, which prints the same CSV as the whole sweep.
 */
export function sizeSweepCommand(
  file: string, rowId: string, requirementId: string | undefined, sweepText: string, io: Io, sharded?: SweepShardOptions,
): number {
  const { from, to, n } = parseSweep(sweepText);
  const allValues = withSweepPath(() => sweepValues(from, to, n));
  if (sharded && file === '-') throw new InputError('--shard', 'needs a budget file (merge checks it by its SHA-256), not standard input');
  const [firstPoint, endPoint] = sharded ? shardSlice(allValues.length, sharded.shard) : [0, allValues.length];
  const values = allValues.slice(firstPoint, endPoint);
  // Every point is an analysis of its own: the cells are all the sweep needs loaded.
  const loaded = loadBudget(file, { compute: false });
  const problems = sheetProblems(loaded);
  for (const p of problems) io.err(`${p}\n`);
  if (problems.length) return EXIT.badInput;
  if (loaded.sheet.input) checkSizingTarget(loaded.sheet.input, rowId, requirementId);
  const sweep = withDocumentPaths(loaded, (input) =>
    sweepRow(input, rowId, values, requirementId === undefined ? undefined : [requirementId], (done, total) => io.err(`point ${done} of ${total}\n`)));
  if (!sharded) {
    io.out(sweepCsv(sweep));
    return EXIT.pass;
  }
  const { shard } = sharded;
  const path = sharded.output ?? `sweep-part-${shard.index}-of-${shard.count}.json`;
  const id = { budget: { file, sha256: fileSha256(file) }, vary: rowId, sweep: sweepText, requirement: requirementId ?? null };
  writeSweepPart(path, { id, shard, firstPoint, sweep });
  io.err(`wrote ${path} (points ${firstPoint + 1} to ${endPoint} of ${allValues.length}); combine the parts with sigma-ledger merge\n`);
  return EXIT.pass;
}

/** The sweep as CSV with a header naming units; numbers with 6 significant digits. */
export function sweepCsv(sweep: RowSweep): string {
  const header = [`${sweep.sourceId} (${sweep.unit})`, ...sweep.requirements.flatMap((r) => [`${r.id} worst (${r.unit})`, `${r.id} limit (${r.unit})`, `${r.id} verdict`])];
  const num = (x: number) => formatSignificant(x, 6);
  const lines = sweep.points.map((p) => [num(p.value), ...sweep.requirements.flatMap((r, i) => [num(p.worst[i]), num(r.limit), p.verdicts[i]])].join(','));
  return [header.map(csvField).join(','), ...lines, ''].join('\n');
}

function csvField(text: string): string {
  return /[",\n]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

function withSweepPath<T>(fn: () => T): T {
  try {
    return fn();
  } catch (e) {
    if (e instanceof InputError && e.path === 'sweep') throw new InputError('--sweep', e.message.slice('sweep: '.length));
    throw e;
  }
}
