// The sensor-log worker: one job per worker (see log-protocol.ts). It reads
// the file in slices, posting progress at most every PROGRESS_MS, and answers
// with one result or one error message. The page cancels a job by
// terminating the worker, so nothing here needs to watch for cancellation.
import { SigmaLedgerError } from '../../src';
import { peekLogHeader } from './log-header-peek';
import { runAllanJob, runCalibrationJob } from './log-jobs';
import type { LogJob, LogJobMessage, LogProgress } from './log-protocol';

/** Least time between two progress messages, ms. */
const PROGRESS_MS = 100;

const post = (m: LogJobMessage) => self.postMessage(m);

function throttled(): (p: LogProgress) => void {
  let last = -Infinity;
  return (progress) => {
    const now = performance.now();
    if (now - last < PROGRESS_MS && progress.bytesRead < progress.totalBytes) return;
    last = now;
    post({ type: 'progress', progress });
  };
}

async function run(job: LogJob): Promise<LogJobMessage> {
  switch (job.type) {
    case 'header': return { type: 'header', header: await peekLogHeader(job.file) };
    case 'allan': return { type: 'allan', outcome: await runAllanJob(job.file, job.options, throttled()) };
    case 'calibration': return { type: 'calibration', outcome: await runCalibrationJob(job.file, job.options, throttled()) };
  }
}

self.onmessage = async (event: MessageEvent<LogJob>) => {
  try {
    post(await run(event.data));
  } catch (e) {
    // Engine errors carry a message for the user; anything else is a fault worth reporting as such.
    const message = e instanceof SigmaLedgerError ? e.message : `unexpected failure while reading the log (${e instanceof Error ? e.message : String(e)})`;
    post({ type: 'error', message });
  }
};
