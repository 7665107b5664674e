import type { BlockNode, BudgetDocument, StudyShape } from '../../src/index';

/** Page -> Monte Carlo worker: simulate blocks [firstBlock, endBlock) of a study of `runs` runs seeded `seed`. */
export interface MonteCarloJob {
  document: BudgetDocument;
  seed: number;
  runs: number;
  firstBlock: number;
  endBlock: number;
  /** Send the model's shape (times, quantities, the budget's variances, outages) with the answer. */
  wantShape: boolean;
}

/** Monte Carlo worker -> page: runs finished since the last message, the answer, or why there is none. */
export type MonteCarloMessage =
  | { kind: 'progress'; runs: number }
  | { kind: 'done'; nodes: BlockNode[]; shape?: StudyShape }
  | { kind: 'failed'; message: string };
