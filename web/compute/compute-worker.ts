// The compute worker: evaluates the sheet and runs the budget off the page's
// thread, so typing never waits for the engine. Each request is answered
// twice: first with the totals alone (several times faster, so the plots move
// at once), then with every source's contribution. The controller keeps at
// most one request in flight, so every request here is the newest it had.
// One ViewSession keeps the document's workbook between edits.
import { ViewSession } from '../../src';
import type { ViewResult } from '../../src';
import type { ComputeRequest, ComputeResponse } from './protocol';

const session = new ViewSession();

function answer(seq: number, run: () => ViewResult, final: boolean): void {
  const started = performance.now();
  let response: ComputeResponse;
  try {
    response = { seq, ok: true, view: run(), elapsedMs: performance.now() - started, final };
  } catch (e) {
    response = { seq, ok: false, message: e instanceof Error ? e.message : String(e) };
  }
  self.postMessage(response);
}

self.onmessage = (event: MessageEvent<ComputeRequest>) => {
  const { seq, document } = event.data;
  answer(seq, () => session.view(document, { contributions: false }), false);
  answer(seq, () => session.view(document), true);
};
