import {
  blockCount, findFlags, reduceNodes, studyStatistics, type BlockNode, type BudgetDocument, type SimulationFlag,
  type StudyShape, type StudyStatistics,
} from '../../src/index';
import type { MonteCarloJob, MonteCarloMessage } from './monte-carlo-protocol';

/** A finished study: its statistics, flags and the model's shape (for outages and units). */
export interface MonteCarloStudy {
  seed: number;
  runs: number;
  shape: StudyShape;
  stats: StudyStatistics;
  flags: SimulationFlag[];
}

/** How many workers a study of `runs` runs uses: one per core the browser reports (2 if it says nothing), at most one per block. */
export function workerCount(runs: number, cores = globalThis.navigator?.hardwareConcurrency): number {
  return Math.max(1, Math.min(cores && cores > 0 ? cores : 2, blockCount(runs)));
}

/**
 * Runs a Monte Carlo study of a document in several workers, each a
 * contiguous share of whole blocks of runs, and sums them in the study's fixed
 * tree (block-tree.ts), so the numbers are those of `sigma-ledger simulate`
 * with the same seed, bit for bit, however many workers ran. One study at a
 * time: a new one or `cancel()` ends the one before.
 */
export class MonteCarloRunner {
  private workers: Worker[] = [];
  private reject?: (e: Error) => void;

  /**
   * Starts a study; resolves with its statistics.
   * @param onProgress runs done of the total, after every few runs.
   * @throws Error with the engine's message, or "cancelled" when a newer study or cancel() ended it.
   */
  run(document: BudgetDocument, seed: number, runs: number, onProgress: (done: number, total: number) => void, cores?: number): Promise<MonteCarloStudy> {
    this.cancel();
    const blocks = blockCount(runs);
    const count = workerCount(runs, cores);
    let done = 0;
    return new Promise((resolve, reject) => {
      this.reject = reject;
      const answers: { nodes: BlockNode[]; shape?: StudyShape }[] = [];
      const fail = (message: string) => {
        this.stopAll();
        reject(new Error(message));
      };
      this.workers = Array.from({ length: count }, (_, w) => {
        const worker = new Worker(new URL('./monte-carlo-worker.ts', import.meta.url), { type: 'module' });
        const job: MonteCarloJob = {
          document, seed, runs, wantShape: w === 0,
          firstBlock: Math.floor((blocks * w) / count), endBlock: Math.floor((blocks * (w + 1)) / count),
        };
        worker.onmessage = (e: MessageEvent<MonteCarloMessage>) => {
          const m = e.data;
          if (m.kind === 'progress') {
            done += m.runs;
            onProgress(done, runs);
            return;
          }
          if (m.kind === 'failed') return fail(m.message);
          answers[w] = { nodes: m.nodes, shape: m.shape };
          worker.terminate();
          if (answers.filter(Boolean).length < count) return;
          this.workers = [];
          this.reject = undefined;
          try {
            const shape = answers[0].shape!;
            const stats = studyStatistics(shape, reduceNodes(answers.flatMap((a) => a.nodes), blocks));
            resolve({ seed, runs, shape, stats, flags: findFlags(stats, shape.outages) });
          } catch (err) {
            reject(err instanceof Error ? err : new Error(String(err)));
          }
        };
        worker.onerror = (e) => fail(`a Monte Carlo worker failed: ${e.message}`);
        worker.postMessage(job);
        return worker;
      });
    });
  }

  /** Ends the running study (its promise rejects with "cancelled"). */
  cancel(): void {
    if (this.workers.length === 0) return;
    const reject = this.reject;
    this.stopAll();
    reject?.(new Error('cancelled'));
  }

  private stopAll(): void {
    for (const w of this.workers) w.terminate();
    this.workers = [];
    this.reject = undefined;
  }
}
