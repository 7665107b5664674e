import { writeFileSync } from 'node:fs';
import { computeBudget, MAX_STEPS } from '../pipeline';
import type { BudgetInput } from '../inputs/budget-input';
import { quantityToSI } from '../inputs/checks';
import { resolveMission } from '../mission/resolve-mission';
import { sizeSource, type SizingResult } from '../budget/sizing';
import { InputError, SigmaLedgerError } from '../errors';
import { formatSummary } from '../report/text-summary';
import { buildJsonResult } from '../report/json-result';
import { formatSignificant } from '../units';
import { loadBudget, sheetProblems, withDocumentPaths, type LoadedBudget } from './load-budget';

/** Exit codes: every requirement holds, some requirement fails, bad input. */
export const EXIT = { pass: 0, fail: 1, badInput: 2 } as const;

/**
 * Runs a command body, turning a {@link SigmaLedgerError} into one line on
 * stderr and exit code 2 (for commands called directly, not through main).
 */
export async function exitOnInputError(io: Io, run: () => Promise<number>): Promise<number> {
  try {
    return await run();
  } catch (e) {
    if (e instanceof SigmaLedgerError) {
      io.err(`error: ${e.message}\n`);
      return EXIT.badInput;
    }
    throw e;
  }
}

/** Output streams, injectable for tests. */
export interface Io {
  out: (text: string) => void;
  err: (text: string) => void;
}

/** Options of `run`. */
export interface RunOptions {
  json: boolean;
  every: number;
  output?: string;
}

/**
 * `run FILE`: the summary (or JSON) of a budget. A budget with cell errors is
 * still computed where it can be, marked partial, and exits 2: its verdicts
 * leave out the failed rows and cannot be trusted.
 */
export function runCommand(file: string, opts: RunOptions, io: Io): number {
  const loaded = loadBudget(file);
  const problems = reportProblems(loaded, io);
  if (loaded.sheet.blocked) return EXIT.badInput;
  const started = Date.now();
  const result = withDocumentPaths(loaded, (input) => {
    announceLongRun(input, io);
    return computeBudget(input, { every: opts.every });
  });
  if (Date.now() - started > 2000) io.err(`computed ${result.trajectory.tS.length} steps in ${((Date.now() - started) / 1000).toFixed(1)} s\n`);
  const title = loaded.document.title + (problems ? ' (PARTIAL: cells with errors were left out)' : '');
  const text = opts.json
    ? JSON.stringify(buildJsonResult(result, title)) + '\n'
    : formatSummary(result, { title, fileName: file });
  if (opts.output) writeOutput(opts.output, text);
  else io.out(text);
  if (problems) return EXIT.badInput;
  return result.requirements.every((r) => r.verdict === 'pass') ? EXIT.pass : EXIT.fail;
}

/** `size FILE --requirement ID --vary ROW`: the largest allowable value of one row. */
export function sizeCommand(file: string, requirementId: string, rowId: string, tolerance: number, json: boolean, io: Io): number {
  const loaded = loadBudget(file);
  if (reportProblems(loaded, io)) return EXIT.badInput;
  const result = withDocumentPaths(loaded, (input) => {
    const [sensorId, ...rest] = rowId.split('.');
    if (!input.sensors.find((s) => s.id === sensorId)?.sources.some((r) => r.id === rest.join('.'))) {
      throw new InputError('--vary', `no row "${rowId}"; give it as sensorId.rowId, e.g. ${input.sensors[0]?.id}.${input.sensors[0]?.sources[0]?.id}`);
    }
    if (!input.requirements?.some((r) => r.id === requirementId)) {
      throw new InputError('--requirement', `no requirement "${requirementId}"; the file has ${(input.requirements ?? []).map((r) => r.id).join(', ') || 'none'}`);
    }
    return sizeSource(input, requirementId, rowId, {
      relativeTolerance: tolerance,
      onTrial: (n, value, verdict) => io.err(`trial ${n}: ${rowId} = ${formatSignificant(value, 6)} -> ${verdict}\n`),
    });
  });
  io.out(json ? JSON.stringify(result) + '\n' : formatSizing(result));
  return result.outcome === 'never-passes' ? EXIT.fail : EXIT.pass;
}

/** `check FILE`: validate and evaluate the cells without running the analysis. */
export function checkCommand(file: string, io: Io): number {
  const loaded = loadBudget(file);
  if (reportProblems(loaded, io)) return EXIT.badInput;
  withDocumentPaths(loaded, (input) => computeBudget(input));
  io.out(`${file}: valid (${loaded.sheet.cellValues.size} cells evaluated)\n`);
  return EXIT.pass;
}

function writeOutput(path: string, text: string): void {
  try {
    writeFileSync(path, text);
  } catch (e) {
    throw new InputError('--output', `cannot write ${path} (${(e as NodeJS.ErrnoException).code ?? 'error'}): check that its folder exists and is writable`);
  }
}

/** Steps above which `run` says on stderr that it is working (about a second of computing). */
const LONG_RUN_STEPS = 50_000;

function announceLongRun(input: BudgetInput, io: Io): void {
  try {
    const steps = resolveMission(input.mission).durationS / quantityToSI(input.step, 'time', 'step');
    if (steps > LONG_RUN_STEPS && steps <= MAX_STEPS) io.err(`computing ${Math.ceil(steps)} steps with ${input.sensors.reduce((a, s) => a + s.sources.length, 2)} sources...\n`);
  } catch {
    // computeBudget reports the problem with its path.
  }
}

function reportProblems(loaded: LoadedBudget, io: Io): boolean {
  for (const note of loaded.notes) io.err(`${loaded.fileName}: ${note}\n`);
  const problems = sheetProblems(loaded);
  for (const p of problems) io.err(`${p}\n`);
  return problems.length > 0;
}

function formatSizing(r: SizingResult): string {
  const at = (x: SizingResult['atLargestPassing']) => (x ? `${formatSignificant(x.worstValue, 5)} ${x.limit.unit} (limit ${x.limit.value} ${x.limit.unit})` : 'n/a');
  switch (r.outcome) {
    case 'never-passes':
      return `${r.requirementId} fails even with ${r.sourceId} = 0 ${r.unit}: worst ${at(r.atSmallestFailing)}. Other sources must improve first.\n`;
    case 'always-passes':
      return `${r.requirementId} holds for every ${r.sourceId} tried, up to ${formatSignificant(r.largestPassing, 6)} ${r.unit} (${r.stoppedBecause}).\n`;
    default:
      return [
        `largest ${r.sourceId} meeting ${r.requirementId}: ${formatSignificant(r.largestPassing, 6)} ${r.unit} (± ${formatSignificant(r.tolerance, 2)} ${r.unit}, ${r.trials} runs)`,
        `  at ${formatSignificant(r.largestPassing, 6)} ${r.unit}: worst ${at(r.atLargestPassing)}`,
        `  at ${formatSignificant(r.smallestFailing!, 6)} ${r.unit}: worst ${at(r.atSmallestFailing)}`,
        '',
      ].join('\n');
  }
}
