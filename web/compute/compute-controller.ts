import type { ReactiveController, ReactiveControllerHost } from 'lit';
import type { BudgetDocument } from '../../src';
import type { ViewResult } from '../../src';
import type { ComputeRequest, ComputeResponse } from './protocol';

/** Where the latest recompute stands. */
export type ComputeStatus = 'idle' | 'pending' | 'complete' | 'error';

/** Quiet time after an edit before recomputing, ms: cells commit on Enter, so this only merges bursts (a paste, undo held down). */
export const DEBOUNCE_MS = 40;

/**
 * A computation running longer than this when the document changes is
 * abandoned: the worker is terminated and a fresh one takes the new
 * document (a restart costs about a workbook build, so a short run is left
 * to finish instead).
 */
export const CANCEL_AFTER_MS = 250;

/**
 * The one path from the page to the engine: debounces edits, keeps at most
 * one request in the worker (abandoning a long one when the document
 * changes, so a budget that computes for minutes never holds the page), and
 * exposes the latest view with its status.
 * `stale` is true while the shown view is older than the document.
 * Fires nothing itself; it asks its host to update.
 */
export class ComputeController implements ReactiveController {
  status: ComputeStatus = 'idle';
  view?: ViewResult;
  error?: string;
  stale = false;
  /** Worker compute time of the last view, ms. */
  elapsedMs = 0;
  /** Called after each new view arrives (tests and the benchmark listen here). */
  onView?: (view: ViewResult, seq: number) => void;

  private worker?: Worker;
  private seq = 0;
  private inFlight?: number;
  private inFlightSinceMs = 0;
  /** Workers terminated because the document changed under a long computation. */
  restarts = 0;
  private queued?: BudgetDocument;
  private timer?: ReturnType<typeof setTimeout>;
  private waiting = false;

  constructor(private readonly host: ReactiveControllerHost, private readonly makeWorker: () => Worker = defaultWorker) {
    host.addController(this);
  }

  hostConnected(): void {
    this.startWorker();
  }

  private startWorker(): void {
    const worker = this.makeWorker();
    worker.onmessage = (e: MessageEvent<ComputeResponse>) => {
      if (worker === this.worker) this.received(e.data);
    };
    this.worker = worker;
  }

  /** Abandons the running computation: terminates its worker and starts a fresh one. */
  private cancelRunning(): void {
    this.worker?.terminate();
    this.inFlight = undefined;
    this.restarts++;
    this.startWorker();
  }

  hostDisconnected(): void {
    this.worker?.terminate();
    this.worker = undefined;
  }

  /** Schedules a recompute of `doc` (debounced); `immediate` skips the wait. */
  request(doc: BudgetDocument, immediate = false): void {
    this.queued = doc;
    if (this.inFlight !== undefined && this.worker && performance.now() - this.inFlightSinceMs > CANCEL_AFTER_MS) this.cancelRunning();
    this.stale = this.view !== undefined;
    this.status = 'pending';
    clearTimeout(this.timer);
    this.waiting = true;
    this.timer = setTimeout(() => {
      this.waiting = false;
      this.flush();
    }, immediate ? 0 : DEBOUNCE_MS);
    this.host.requestUpdate();
  }

  private flush(): void {
    if (this.inFlight !== undefined || !this.queued || !this.worker) return;
    const request: ComputeRequest = { seq: ++this.seq, document: this.queued };
    this.queued = undefined;
    this.inFlight = request.seq;
    this.inFlightSinceMs = performance.now();
    this.worker.postMessage(request);
  }

  private received(r: ComputeResponse): void {
    if (r.ok && !r.final) {
      // The quick totals-only answer: show it now (unless a newer edit is waiting); the full one follows.
      if (this.queued === undefined) {
        this.view = r.view;
        this.elapsedMs = r.elapsedMs;
        this.stale = false;
        this.host.requestUpdate();
        this.onView?.(r.view, r.seq);
      }
      return;
    }
    this.inFlight = undefined;
    if (r.ok) {
      this.view = r.view;
      this.elapsedMs = r.elapsedMs;
      this.error = undefined;
    } else {
      this.error = r.message;
    }
    const more = this.queued !== undefined;
    this.stale = more;
    this.status = more ? 'pending' : r.ok ? 'complete' : 'error';
    // A newer document arrived while computing: send it now, unless its debounce is still running.
    if (more && !this.waiting) this.flush();
    this.host.requestUpdate();
    if (r.ok) this.onView?.(r.view, r.seq);
  }
}

function defaultWorker(): Worker {
  return new Worker(new URL('./compute-worker.ts', import.meta.url), { type: 'module' });
}
