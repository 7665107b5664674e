import { blockCount, pushNode, RUNS_PER_BLOCK, type BlockNode } from './block-tree';
import type { MonteCarloModel } from './monte-carlo-model';
import { RunRandom } from './run-random';
import { emptySums, summingSink, sumLayout } from './study-sums';

/** Which runs of which study to simulate. */
export interface BlockRange {
  /** Study seed (an integer; taken modulo 2^32). */
  seed: number;
  /** Runs in the whole study. */
  runs: number;
  /** First block and one past the last (blocks of {@link RUNS_PER_BLOCK} runs). */
  firstBlock: number;
  endBlock: number;
}

/**
 * Simulates the runs of blocks [firstBlock, endBlock) in index order and
 * returns their sums as nodes of the study's fixed tree (see block-tree.ts).
 * `onRun` is told after each run (for progress) and may return true to stop:
 * then the nodes so far are returned, missing the rest (the caller discards them).
 */
export function runBlocks(model: MonteCarloModel, range: BlockRange, onRun?: (runIndex: number) => boolean | void): BlockNode[] {
  const layout = sumLayout(model);
  const blocks = blockCount(range.runs);
  const stack: BlockNode[] = [];
  const first = range.firstBlock * RUNS_PER_BLOCK;
  let rng = first < range.runs ? RunRandom.forRun(range.seed, first) : undefined;
  for (let b = range.firstBlock; b < Math.min(range.endBlock, blocks); b++) {
    const sums = emptySums(layout);
    const sink = summingSink(layout, sums);
    const end = Math.min(range.runs, (b + 1) * RUNS_PER_BLOCK);
    for (let i = b * RUNS_PER_BLOCK; i < end; i++) {
      // Each run draws from a copy, so the next run's generator is one jump from this run's start.
      model.simulate(rng!.clone(), sink);
      sums.runs++;
      rng = RunRandom.following(rng!);
      if (onRun?.(i)) return stack;
    }
    pushNode(stack, { level: 0, index: b, sums }, blocks);
  }
  return stack;
}
