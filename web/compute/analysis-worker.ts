// The analysis worker: the assumption sensitivity and the R sweep are tens of
// covariance runs each, so they run here, off the page's thread (and apart
// from the compute worker, so an edit's recompute never waits for them), with
// progress after every run.
import { assumptionSensitivity, computeBudget, evaluateBudgetDocument, SigmaLedgerError, sweepFilterR, DEFAULT_R_SCALES, type BudgetInput } from '../../src/index';
import type { AnalysisAnswer, AnalysisJob, AnalysisMessage } from './analysis-protocol';

const post = (m: AnalysisMessage) => self.postMessage(m);
const progress = (done: number, total: number) => post({ kind: 'progress', done, total });

function inputOf(job: AnalysisJob): BudgetInput {
  const sheet = evaluateBudgetDocument(job.document);
  if (!sheet.input) throw new SigmaLedgerError('', sheet.blocked ?? 'nothing can be computed');
  return sheet.input;
}

function answer(job: AnalysisJob): AnalysisAnswer {
  const input = inputOf(job);
  if (job.kind === 'sensitivity') {
    return { kind: 'sensitivity', range: job.range, entries: assumptionSensitivity(input, { rows: job.rows, range: job.range, onRun: progress }) };
  }
  const base = computeBudget(input, { contributions: false });
  return { kind: 'r-sweep', sweep: sweepFilterR(input, base, job.sensorId, DEFAULT_R_SCALES, progress) };
}

self.onmessage = (event: MessageEvent<AnalysisJob>) => {
  try {
    post({ kind: 'done', answer: answer(event.data) });
  } catch (e) {
    post({ kind: 'failed', message: e instanceof SigmaLedgerError ? e.message : `unexpected failure: ${e instanceof Error ? e.message : String(e)}` });
  }
};
