import type { OutageAnswer, RowAnswer, SizingJob } from './sizing-protocol';
import { WorkerJobRunner } from '../compute/worker-job-runner';

/**
 * Runs one sizing job at a time in its own worker: a new job or `cancel()`
 * ends the one before. Reports progress (runs done of total) while it works.
 */
export class SizingRunner extends WorkerJobRunner<SizingJob, RowAnswer | OutageAnswer> {
  constructor() {
    super(() => new Worker(new URL('./sizing-worker.ts', import.meta.url), { type: 'module' }), 'sizing');
  }
}
