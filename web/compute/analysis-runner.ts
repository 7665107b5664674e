import type { AnalysisAnswer, AnalysisJob } from './analysis-protocol';
import { WorkerJobRunner } from './worker-job-runner';

/**
 * Runs one analysis job (sensitivity or R sweep) at a time in the analysis
 * worker; a new job or `cancel()` ends the one before.
 */
export class AnalysisRunner extends WorkerJobRunner<AnalysisJob, AnalysisAnswer> {
  /** @param makeWorker makes the worker of each job (tests wrap the default to count them). */
  constructor(makeWorker: () => Worker = analysisWorker) {
    super(makeWorker, 'analysis');
  }
}

/** The analysis worker (web/compute/analysis-worker.ts) as a module worker. */
export function analysisWorker(): Worker {
  return new Worker(new URL('./analysis-worker.ts', import.meta.url), { type: 'module' });
}
