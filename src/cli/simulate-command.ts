/**
 * `sigma-ledger simulate FILE --runs N [--seed S] [--shard I/N] [--workers W]
 * [--json] [--every K] [--output OUT]`: the Monte Carlo check of a budget,
 * over the machine's cores. With --shard it runs only shard I of N (whole
 * blocks of 64 runs) and writes a part file for `merge`.
 */
import { availableParallelism } from 'node:os';
import { writeFileSync } from 'node:fs';
import { InputError } from '../errors';
import { blockCount, reduceNodes, shardBlocks } from '../simulation/block-tree';
import { sumLayout } from '../simulation/study-sums';
import { EXIT, exitOnInputError, type Io } from './commands';
import { loadBudget, sheetProblems } from './load-budget';
import { simulationModelFor, SIMULATION_LOAD } from './simulation-model';
import { simulateInParallel } from './parallel-blocks';
import { finishStudy } from './simulation-output';
import { studyIdentity, writePart } from './simulation-parts';
import { parseShard, type ShardSelection } from './shard-option';

/** The options `simulate` adds (besides --json, --every and --output, which main.ts has). */
export const SIMULATE_CLI_OPTIONS = {
  runs: { type: 'string' },
  seed: { type: 'string' },
  shard: { type: 'string' },
  workers: { type: 'string' },
} as const;

/** Options of `simulate`. */
export interface SimulateOptions {
  file: string;
  runs: number;
  seed: number;
  /** Only this shard (0-based index of count) and write a part file. */
  shard?: ShardSelection;
  workers: number;
  json: boolean;
  every: number;
  output?: string;
}

/** Most runs one study may have (keeps a typo from running for days). */
const MAX_RUNS = 100_000_000;

/**
 * Parses the command line's values (--shard by shard-option.ts, which reads
 * `auto/N` from a Kubernetes or Slurm job array).
 * @throws InputError naming the option.
 */
export function simulateOptionsFromArgs(file: string, values: Record<string, unknown>, env: Record<string, string | undefined>): SimulateOptions {
  const int = (key: string, fallback: number | undefined, min: number, max: number): number => {
    const text = values[key];
    if (text === undefined && fallback !== undefined) return fallback;
    const v = Number(text);
    if (text === undefined || !Number.isInteger(v) || v < min || v > max) {
      throw new InputError(`--${key}`, `must be a whole number from ${min} to ${max}, got ${text === undefined ? 'nothing' : `"${String(text)}"`}`);
    }
    return v;
  };
  return {
    file,
    runs: int('runs', undefined, 1, MAX_RUNS),
    seed: int('seed', 1, 0, 2 ** 32 - 1),
    shard: values.shard === undefined ? undefined : parseShard(String(values.shard), env),
    workers: int('workers', availableParallelism(), 1, 1024),
    json: values.json === true,
    every: int('every', 1, 1, 1e9),
    output: typeof values.output === 'string' ? values.output : undefined,
  };
}

/** Runs `simulate`: exit 0 when consistent within bounds (or a part was written), 1 with warnings, 2 for bad input. */
export async function simulateCommand(opts: SimulateOptions, io: Io): Promise<number> {
  return exitOnInputError(io, async () => {
    const loaded = loadBudget(opts.file, SIMULATION_LOAD);
    const problems = sheetProblems(loaded);
    if (problems.length) {
      for (const p of problems) io.err(`${p}\n`);
      throw new InputError(opts.file, 'a budget with cell errors cannot be simulated; fix the cells first');
    }
    const model = simulationModelFor(loaded);
    const [firstBlock, endBlock] = opts.shard ? shardBlocks(opts.runs, opts.shard.index, opts.shard.count) : [0, blockCount(opts.runs)];
    const total = Math.max(0, Math.min(opts.runs, endBlock * 64) - firstBlock * 64);
    const started = Date.now();
    let done = 0, shownMs = started;
    const progress = (runs: number) => {
      done += runs;
      // One progress line every 2 s, each on its own line: stderr is escaped for the terminal
      // (terminal-text.ts), so a carriage return would print as \u000d, and logs of cluster jobs keep every line.
      if (Date.now() - shownMs < 2000 || done >= total) return;
      shownMs = Date.now();
      const rate = done / Math.max(1e-3, (Date.now() - started) / 1000);
      io.err(`simulate: ${done}/${total} runs (${Math.round((100 * done) / Math.max(1, total))} %), ${rate.toFixed(1)} runs/s\n`);
    };
    const nodes = await simulateInParallel(opts.file, model, { seed: opts.seed, runs: opts.runs, firstBlock, endBlock }, opts.workers, progress);
    io.err(`simulate: ${done}/${total} runs in ${((Date.now() - started) / 1000).toFixed(1)} s\n`);
    const id = studyIdentity(opts.file, opts.seed, opts.runs);
    if (opts.shard) {
      const path = opts.output ?? `simulation-part-${opts.shard.index}-of-${opts.shard.count}.json`;
      writePart(path, { id, shard: opts.shard, fieldsPerStep: sumLayout(model).fields, nodes });
      io.err(`wrote ${path} (runs ${firstBlock * 64} to ${firstBlock * 64 + total - 1}); combine the parts with sigma-ledger merge\n`);
      return EXIT.pass;
    }
    return finishStudy(model, id, reduceNodes(nodes, blockCount(opts.runs)), opts, io, (p, t) => writeFileSync(p, t));
  });
}
