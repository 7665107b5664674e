/**
 * `sigma-ledger run FILE`: the summary (or the JSON result) of a budget. A
 * budget with cell errors is still computed where it can be, marked partial,
 * and exits 2: its verdicts leave out the failed rows and cannot be trusted.
 */
import { MAX_STEPS } from '../pipeline';
import type { BudgetInput } from '../inputs/budget-input';
import { quantityToSI } from '../inputs/checks';
import { resolveMission } from '../mission/resolve-mission';
import { formatSummary } from '../report/text-summary';
import { jsonChunks } from '../report/json-chunks';
import { EXIT, writePieces, type Io } from './commands';
import { JSON_OPTION, textOption, type CliCommand, type ParsedValues } from './cli-command';
import { loadAnyBudget, reportProblems, throwIfBlocked, type LoadedInertialBudget } from './load-budget';
import { formatInertialSummary } from '../report/inertial-text-summary';
import { integerOption, positiveOption } from './number-options';
import { filterDesignReport } from './filter-design-report';
import { withDocumentPaths } from './load-budget';

/** Options of `run`. */
export interface RunOptions {
  json: boolean;
  /** Keep every n-th step (and the last) in the JSON series. */
  every: number;
  /** Significant digits of the JSON numbers (1-17); all when absent. */
  significant?: number;
  output?: string;
}

/** Runs `run` on one file (`-`: standard input); returns the exit code. @throws SigmaLedgerError for bad input. */
export async function runCommand(file: string, opts: RunOptions, io: Io): Promise<number> {
  let started: number | undefined;
  const loaded = loadAnyBudget(file, {
    beforeCompute: (input) => {
      if (announceLongRun(input, io)) started = Date.now();
    },
    report: opts.json ? { every: opts.every } : false,
  });
  const problems = reportProblems(loaded, io);
  if (loaded.sheet.blocked) return EXIT.badInput;
  throwIfBlocked(loaded);
  if (loaded.model === 'inertial') return runInertial(loaded, problems, opts, io);
  const budget = loaded.budget!;
  if (started !== undefined) io.err(`computed ${budget.trajectory.tS.length} steps in ${((Date.now() - started) / 1000).toFixed(1)} s\n`);
  const design = withDocumentPaths(loaded, (input) => filterDesignReport(input, budget));
  const report = loaded.report && design ? { ...loaded.report, filterDesign: design.json(opts.every) } : loaded.report;
  const pieces = report
    ? withNewline(jsonChunks(report, { significantDigits: opts.significant }))
    : [formatSummary(budget, { title: loaded.title, fileName: loaded.fileName }) + (design ? `\n${design.text()}` : '')];
  await writePieces(pieces, io, opts.output);
  if (problems) return EXIT.badInput;
  // With a filter design the verdict is the actual error's, not the optimal filter's.
  const holds = design ? design.holds : budget.requirements.every((r) => r.verdict === 'pass');
  return holds ? EXIT.pass : EXIT.fail;
}

/** The 3-D branch of run: the summary or the JSON result, and the exit code from the verdicts. */
async function runInertial(loaded: LoadedInertialBudget, problems: boolean, opts: RunOptions, io: Io): Promise<number> {
  const budget = loaded.budget!;
  const pieces = loaded.report
    ? withNewline(jsonChunks(loaded.report, { significantDigits: opts.significant }))
    : [formatInertialSummary(budget, { title: loaded.title, fileName: loaded.fileName })];
  await writePieces(pieces, io, opts.output);
  if (problems) return EXIT.badInput;
  return budget.requirements.every((r) => r.verdict === 'pass') ? EXIT.pass : EXIT.fail;
}

function* withNewline(pieces: Iterable<string>): Generator<string> {
  yield* pieces;
  yield '\n';
}

/** Steps above which `run` says on stderr that it is working (about a second of computing). */
const LONG_RUN_STEPS = 50_000;

/** Says on stderr that a long run is starting (depends on the step count only, so the output is reproducible); true when it did. */
function announceLongRun(input: BudgetInput, io: Io): boolean {
  try {
    const steps = resolveMission(input.mission).durationS / quantityToSI(input.step, 'time', 'step');
    if (steps <= LONG_RUN_STEPS || steps > MAX_STEPS) return false;
    io.err(`computing ${Math.ceil(steps)} steps with ${input.sensors.reduce((a, s) => a + s.sources.length, 2)} sources...\n`);
    return true;
  } catch {
    return false; // computeBudget reports the problem with its path.
  }
}

export const RUN_COMMAND: CliCommand = {
  operands: ['FILE'],
  synopsis: '[--json] [--every N] [--significant N] [--output OUT]',
  description: [
    "the budget's summary: requirement verdicts, margins, time to exceed per",
    'outage, budgets at checkpoints, the R, Q and P0 used; --json prints the',
    'full result (format sigma-ledger-result, budgets/result.schema.json)',
  ].join('\n'),
  options: {
    ...JSON_OPTION,
    every: { type: 'string', value: 'N', help: 'keep every N-th step (and the last) in the --json series' },
    significant: { type: 'string', value: 'N', help: 'significant digits of --json numbers, 1-17 (default: all, exact)' },
    output: { type: 'string', value: 'OUT', help: 'write to the file OUT instead of standard output' },
  },
  run: ([file], values: ParsedValues, io) => runCommand(file, {
    json: values.json === true,
    every: positiveOption(values, 'every', 1),
    significant: integerOption(values, 'significant', 1, 17),
    output: textOption(values, 'output'),
  }, io),
};
