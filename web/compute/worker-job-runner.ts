/** What a job worker posts back: progress (runs done of total), the answer, or why there is none. */
export type JobMessage<Answer> =
  | { kind: 'progress'; done: number; total: number }
  | { kind: 'done'; answer: Answer }
  | { kind: 'failed'; message: string };

/**
 * Runs one long job at a time in a worker of its own (sizing, the
 * sensitivity, the R sweep): a new job or `cancel()` ends the one before by
 * terminating its worker. Reports progress while it works.
 */
export class WorkerJobRunner<Job, Answer> {
  private worker?: Worker;
  private reject?: (e: Error) => void;

  /**
   * @param makeWorker makes a fresh worker per job (tests pass their own).
   * @param what names the worker in the message of a worker that fails to run.
   */
  constructor(private readonly makeWorker: () => Worker, private readonly what: string) {}

  /** True while a job runs. */
  get running(): boolean {
    return this.worker !== undefined;
  }

  /**
   * Starts `job`; resolves with its answer.
   * @throws Error with the engine's message, or "cancelled" when a newer job or cancel() ended it.
   */
  run(job: Job, onProgress: (done: number, total: number) => void): Promise<Answer> {
    this.cancel();
    const worker = this.makeWorker();
    this.worker = worker;
    return new Promise((resolve, reject) => {
      this.reject = reject;
      worker.onmessage = (e: MessageEvent<JobMessage<Answer>>) => {
        const m = e.data;
        if (m.kind === 'progress') return onProgress(m.done, m.total);
        this.finish(worker);
        if (m.kind === 'done') resolve(m.answer);
        else reject(new Error(m.message));
      };
      worker.onerror = (e) => {
        this.finish(worker);
        reject(new Error(`the ${this.what} worker failed: ${e.message}`));
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

  private finish(worker: Worker): void {
    worker.terminate();
    if (this.worker === worker) this.worker = undefined;
    this.reject = undefined;
  }
}
