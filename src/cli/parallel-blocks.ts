import { Worker } from 'node:worker_threads';
import { InputError } from '../errors';
import type { BlockNode } from '../simulation/block-tree';
import type { MonteCarloModel } from '../simulation/monte-carlo-model';
import { runBlocks, type BlockRange } from '../simulation/run-blocks';
import type { WorkerJob } from './simulate-worker';

const WORKER_URL = new URL('./simulate-worker.mjs', import.meta.url);

/**
 * Simulates a block range over `workers` threads, each a contiguous share of
 * whole blocks, so the nodes are the same as from one thread (block-tree.ts).
 * One worker runs in this thread with the model already built.
 * @param onRuns told how many runs have just finished (for a progress line).
 */
export async function simulateInParallel(
  file: string, model: MonteCarloModel, range: BlockRange, workers: number, onRuns: (runs: number) => void,
): Promise<BlockNode[]> {
  const blocks = range.endBlock - range.firstBlock;
  const count = Math.max(1, Math.min(workers, blocks));
  if (count === 1) return runBlocks(model, range, () => onRuns(1));
  const shares = Array.from({ length: count }, (_, w): WorkerJob => ({
    ...range, file,
    firstBlock: range.firstBlock + Math.floor((blocks * w) / count),
    endBlock: range.firstBlock + Math.floor((blocks * (w + 1)) / count),
  }));
  const results = await Promise.all(shares.map((job) => runWorker(job, onRuns)));
  return results.flat();
}

function runWorker(job: WorkerJob, onRuns: (runs: number) => void): Promise<BlockNode[]> {
  return new Promise((resolve, reject) => {
    const worker = new Worker(WORKER_URL, { workerData: job });
    let nodes: BlockNode[] | undefined;
    worker.on('message', (m: { kind: 'progress'; runs: number } | { kind: 'done'; nodes: BlockNode[] }) => {
      if (m.kind === 'progress') onRuns(m.runs);
      else nodes = m.nodes;
    });
    worker.on('error', reject);
    worker.on('exit', (code) => {
      if (nodes) resolve(nodes);
      else reject(new InputError('simulate', `a worker stopped (exit code ${code}) before finishing runs from ${job.firstBlock * 64}`));
    });
  });
}
