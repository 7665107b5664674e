// The compute worker: evaluates the sheet and runs the budget off the page's
// thread, so typing never waits for the engine. The controller keeps at most
// one request in flight, so every request here is the newest it had.
import { computeView } from '../../src/report/view-result';
import type { ComputeRequest, ComputeResponse } from './protocol';

self.onmessage = (event: MessageEvent<ComputeRequest>) => {
  const { seq, document } = event.data;
  const started = performance.now();
  let response: ComputeResponse;
  try {
    response = { seq, ok: true, view: computeView(document), elapsedMs: performance.now() - started };
  } catch (e) {
    response = { seq, ok: false, message: e instanceof Error ? e.message : String(e) };
  }
  (self as unknown as Worker).postMessage(response);
};
