import { InputError } from '../errors';
import { addSums, type StudySums } from './study-sums';

/** Runs per block: the unit that shards and workers own. */
export const RUNS_PER_BLOCK = 64;

/**
 * Sums of the aligned blocks [index·2^level, (index+1)·2^level) of a study.
 *
 * Why a fixed tree: floating-point addition is not associative, so sums that
 * must not depend on how the runs were split need one fixed order of
 * additions. Each block sums its runs in index order; a node is always
 * left + right of its two halves; a left half whose right half lies wholly
 * past the last block stands for the node unchanged. Any split into whole
 * blocks (shards, workers) computes some nodes of that same tree, and
 * {@link reduceNodes} finishes it: the result is bit for bit the same
 * (pairwise summation, Higham, Accuracy and Stability of Numerical
 * Algorithms, 2nd ed., 2002, §4.2, with a fixed shape).
 */
export interface BlockNode {
  level: number;
  index: number;
  sums: StudySums;
}

/** Number of blocks of a study of `runs` runs. */
export function blockCount(runs: number): number {
  return Math.ceil(runs / RUNS_PER_BLOCK);
}

/** First block and one past the last block of shard i of n (0-based), contiguous and as even as whole blocks allow. */
export function shardBlocks(runs: number, shard: number, shards: number): [number, number] {
  const b = blockCount(runs);
  return [Math.floor((b * shard) / shards), Math.floor((b * (shard + 1)) / shards)];
}

/**
 * Adds a node to a list kept in block order, combining siblings as far as
 * they go (a binary counter: at most 2 log₂ blocks nodes stay open).
 */
export function pushNode(stack: BlockNode[], node: BlockNode, blocks: number): void {
  stack.push(node);
  for (;;) {
    const top = stack[stack.length - 1];
    const below = stack[stack.length - 2];
    if (below && below.level === top.level && below.index % 2 === 0 && below.index + 1 === top.index) {
      stack.splice(stack.length - 2, 2, { level: top.level + 1, index: below.index / 2, sums: addSums(below.sums, top.sums) });
      continue;
    }
    if (top.index % 2 === 0 && (top.index + 1) * 2 ** top.level >= blocks && 2 ** top.level < blocks) {
      stack[stack.length - 1] = { level: top.level + 1, index: top.index / 2, sums: top.sums };
      continue;
    }
    return;
  }
}

/**
 * Combines nodes from any number of parts into the study's root.
 * @throws InputError when the parts overlap or leave blocks out (named by run index).
 */
export function reduceNodes(nodes: BlockNode[], blocks: number): StudySums {
  const sorted = nodes.slice().sort((a, b) => a.index * 2 ** a.level - b.index * 2 ** b.level);
  let next = 0;
  for (const n of sorted) {
    const start = n.index * 2 ** n.level;
    if (start !== next) {
      const what = start > next ? 'are missing' : 'appear twice';
      throw new InputError('parts', `runs from ${Math.min(start, next) * RUNS_PER_BLOCK} ${what}: the parts do not cover the study exactly once`);
    }
    next = Math.min(blocks, (n.index + 1) * 2 ** n.level);
  }
  if (next !== blocks) throw new InputError('parts', `runs from ${next * RUNS_PER_BLOCK} are missing: the parts do not cover the study`);
  const stack: BlockNode[] = [];
  for (const n of sorted) pushNode(stack, n, blocks);
  if (stack.length !== 1) throw new Error(`internal: ${stack.length} nodes left after reduction`);
  return stack[0].sums;
}
