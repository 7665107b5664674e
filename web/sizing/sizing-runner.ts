import type { CompareAnswer, CompareJob, OutageAnswer, RowAnswer, SizeJob, SizingJob, SizingMessage } from './sizing-protocol';

/**
 * Runs one sizing job at a time in its own worker: a new job or `cancel()`
 * ends the one before. Reports progress (runs done of total) while it works.
 */
export class SizingRunner {
  private worker?: Worker;

  /**
   * Starts `job`; resolves with its answer.
   * @throws Error with the engine's message, or "cancelled" when a newer job or cancel() ended it.
   */
  run(job: CompareJob, onProgress: (done: number, total: number) => void): Promise<CompareAnswer>;
  run(job: SizeJob, onProgress: (done: number, total: number) => void): Promise<RowAnswer | OutageAnswer>;
  run(job: SizingJob, onProgress: (done: number, total: number) => void): Promise<RowAnswer | OutageAnswer | CompareAnswer> {
    this.cancel();
    const worker = new Worker(new URL('./sizing-worker.ts', import.meta.url), { type: 'module' });
    this.worker = worker;
    return new Promise((resolve, reject) => {
      this.reject = reject;
      worker.onmessage = (e: MessageEvent<SizingMessage>) => {
        const m = e.data;
        if (m.kind === 'progress') return onProgress(m.done, m.total);
        this.finish(worker);
        if (m.kind === 'done') resolve(m.answer);
        else reject(new Error(m.message));
      };
      worker.onerror = (e) => {
        this.finish(worker);
        reject(new Error(`the sizing worker failed: ${e.message}`));
      };
      worker.postMessage(job);
    });
  }

  /** Ends the running job (its promise rejects with "cancelled"). */
  cancel(): void {
    if (!this.worker) return;
    this.worker.terminate();
    this.worker = undefined;
    this.reject?.(new Error('cancelled'));
  }

  private reject?: (e: Error) => void;

  private finish(worker: Worker): void {
    worker.terminate();
    if (this.worker === worker) this.worker = undefined;
    this.reject = undefined;
  }
}
