/**
 * A worker thread of `simulate`: loads the budget, simulates its block range
 * and posts progress every few runs and the resulting nodes (their buffers
 * transferred, not copied).
 */
import { parentPort, workerData } from 'node:worker_threads';
import { runBlocks, type BlockRange } from '../simulation/run-blocks';
import { loadBudget } from './load-budget';
import { simulationModelFor, SIMULATION_LOAD } from './simulation-model';

/** What the main thread sends a worker. */
export interface WorkerJob extends BlockRange {
  file: string;
}

const PROGRESS_EVERY_RUNS = 4;

const job = workerData as WorkerJob;
const loaded = loadBudget(job.file, SIMULATION_LOAD);
const model = simulationModelFor(loaded);
let done = 0;
const nodes = runBlocks(model, job, () => {
  if (++done % PROGRESS_EVERY_RUNS === 0) parentPort!.postMessage({ kind: 'progress', runs: PROGRESS_EVERY_RUNS });
});
parentPort!.postMessage({ kind: 'progress', runs: done % PROGRESS_EVERY_RUNS });
parentPort!.postMessage({ kind: 'done', nodes }, nodes.map((n) => n.sums.data.buffer as ArrayBuffer));
