import type { CompareAnswer, CompareJob, OutageAnswer, RowAnswer, SizeJob, SizingJob } from './sizing-protocol';
import { WorkerJobRunner } from '../compute/worker-job-runner';

type SizingAnswer = RowAnswer | OutageAnswer | CompareAnswer;

/**
 * Runs one sizing job at a time in its own worker: a new job or `cancel()`
 * ends the one before. Reports progress (runs done of total) while it works.
 */
export class SizingRunner extends WorkerJobRunner<SizingJob, SizingAnswer> {
  constructor() {
    super(() => new Worker(new URL('./sizing-worker.ts', import.meta.url), { type: 'module' }), 'sizing');
  }

  /**
   * Starts `job`; resolves with its answer (a comparison for a compare job).
   * @throws Error with the engine's message, or "cancelled" when a newer job or cancel() ended it.
   */
  override run(job: CompareJob, onProgress: (done: number, total: number) => void): Promise<CompareAnswer>;
  override run(job: SizeJob, onProgress: (done: number, total: number) => void): Promise<RowAnswer | OutageAnswer>;
  override run(job: SizingJob, onProgress: (done: number, total: number) => void): Promise<SizingAnswer> {
    return super.run(job, onProgress);
  }
}
