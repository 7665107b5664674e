import type { ReactiveController, ReactiveControllerHost } from 'lit';
import type { AllanOutcome, CalibrationOutcome, LogHeader, LogJob, LogJobMessage, LogProgress } from './log-protocol';

/** Where the latest log job stands. */
export type LogJobStatus = 'idle' | 'pending' | 'complete' | 'error' | 'cancelled';

/** The answer a job type resolves with. */
type Answer<J extends LogJob> = J extends { type: 'header' } ? LogHeader : J extends { type: 'allan' } ? AllanOutcome : CalibrationOutcome;

/**
 * The one path from the sensor-log page to its worker: starts a fresh
 * worker per job (so Cancel can simply terminate it), relays progress and
 * exposes pending / complete / error / cancelled. A new job cancels the one
 * running. Fires nothing itself; it asks its host to update.
 */
export class LogJobController implements ReactiveController {
  status: LogJobStatus = 'idle';
  /** What the job is doing, for the progress line ("reading the header", "computing"). */
  activity = '';
  progress?: LogProgress;
  /** The message of the last failed job. */
  error?: string;

  private worker?: Worker;
  private settle?: (answer: unknown) => void;

  constructor(private readonly host: ReactiveControllerHost, private readonly makeWorker: () => Worker = defaultWorker) {
    host.addController(this);
  }

  hostConnected(): void {}

  hostDisconnected(): void {
    this.cancel();
  }

  /**
   * Runs `job` in a new worker.
   * @returns the answer, or undefined when the job failed (see `error`) or was cancelled. Never rejects.
   */
  run<J extends LogJob>(job: J, activity: string): Promise<Answer<J> | undefined> {
    this.cancel();
    this.status = 'pending';
    this.activity = activity;
    this.progress = undefined;
    this.error = undefined;
    const worker = this.makeWorker();
    this.worker = worker;
    const answer = new Promise<Answer<J> | undefined>((resolve) => (this.settle = resolve as (a: unknown) => void));
    worker.onmessage = (e: MessageEvent<LogJobMessage>) => this.received(worker, e.data);
    worker.onerror = (e: ErrorEvent) => {
      e.preventDefault();
      this.finish(worker, 'error', undefined, `the log worker failed (${e.message || 'could not start'})`);
    };
    worker.postMessage(job);
    this.host.requestUpdate();
    return answer;
  }

  /** Stops the running job, if any; its promise resolves with undefined. */
  cancel(): void {
    if (!this.worker) return;
    this.finish(this.worker, 'cancelled', undefined);
  }

  private received(worker: Worker, m: LogJobMessage): void {
    if (worker !== this.worker) return;
    switch (m.type) {
      case 'progress':
        this.progress = m.progress;
        if (m.progress.bytesRead >= m.progress.totalBytes && this.activity.startsWith('reading')) this.activity = 'computing';
        this.host.requestUpdate();
        return;
      case 'error': return this.finish(worker, 'error', undefined, m.message);
      case 'header': return this.finish(worker, 'complete', m.header);
      case 'allan':
      case 'calibration': return this.finish(worker, 'complete', m.outcome);
    }
  }

  private finish(worker: Worker, status: LogJobStatus, answer: unknown, error?: string): void {
    if (worker !== this.worker) return;
    worker.terminate();
    this.worker = undefined;
    this.status = status;
    this.error = error;
    const settle = this.settle;
    this.settle = undefined;
    settle?.(answer);
    this.host.requestUpdate();
  }
}

function defaultWorker(): Worker {
  return new Worker(new URL('./log-worker.ts', import.meta.url), { type: 'module' });
}
