// The sizing worker: bisections and sweeps are tens of full covariance runs,
// so they run here, off the page's thread, with progress after every run.
import {
  compareCandidates, evaluateBudgetDocument, longestOutage, requirementsWithOutage, outageSpan, sizeSource, sweepRow, sweepValues,
  SigmaLedgerError, type BudgetInput,
} from '../../src/index';
import type { CompareAnswer, CompareJob, OutageAnswer, RowAnswer, SizingJob, SizingMessage } from './sizing-protocol';

const post = (m: SizingMessage) => self.postMessage(m);

function inputOf(job: SizingJob): BudgetInput {
  const sheet = evaluateBudgetDocument(job.document);
  if (!sheet.input) throw new SigmaLedgerError('', sheet.blocked ?? 'nothing can be computed');
  return sheet.input;
}

function sizeRow(job: Extract<SizingJob, { kind: 'row' }>): RowAnswer {
  const input = inputOf(job);
  let runs = 0;
  const total = job.requirementIds.length * 20 + job.points;
  const tick = () => post({ kind: 'progress', done: ++runs, total });
  const sized = job.requirementIds.map((id) => {
    const r = sizeSource(input, id, job.rowId, { onTrial: tick });
    return { requirementId: id, outcome: r.outcome, largestPassing: r.largestPassing, tolerance: r.tolerance };
  });
  const bounded = sized.filter((s) => s.outcome !== 'always-passes');
  const binding = bounded.length ? bounded.reduce((a, b) => (b.largestPassing < a.largestPassing ? b : a)) : undefined;
  const current = currentValue(input, job.rowId);
  const top = 2 * Math.max(binding?.largestPassing ?? 0, current, ...sized.map((s) => (s.outcome === 'always-passes' ? s.largestPassing / 2 : 0))) || 1;
  const sweep = sweepRow(input, job.rowId, sweepValues(0, top, job.points), job.requirementIds, tick);
  return { kind: 'row', rowId: job.rowId, unit: sweep.unit, sized, binding: binding?.requirementId, sweep };
}

function currentValue(input: BudgetInput, rowId: string): number {
  const dot = rowId.indexOf('.');
  return input.sensors.find((s) => s.id === rowId.slice(0, dot))?.sources.find((r) => r.id === rowId.slice(dot + 1))?.value.value ?? 0;
}

function sizeOutage(job: Extract<SizingJob, { kind: 'outage' }>): OutageAnswer {
  const input = inputOf(job);
  const ref = { sensorId: job.sensorId, outageIndex: job.outageIndex };
  const { maxLengthS } = outageSpan(input, ref);
  const lengthsS = Array.from({ length: job.points }, (_, k) => (maxLengthS * k) / (job.points - 1));
  const runs = lengthsS.map((l, k) => {
    post({ kind: 'progress', done: k + 1, total: job.points + 1 });
    return requirementsWithOutage(input, ref, l).filter((r) => job.requirementIds.includes(r.id));
  });
  const limits = longestOutage(input, ref, job.requirementIds);
  const picked = job.requirementIds.map((id) => runs[0].find((r) => r.id === id)!);
  const outageId = input.sensors.find((s) => s.id === job.sensorId)?.outages?.[job.outageIndex]?.id ?? `outage ${job.outageIndex + 1}`;
  return {
    kind: 'outage', sensorId: job.sensorId, outageId, limits, lengthsS,
    worst: runs.map((rs) => job.requirementIds.map((id) => rs.find((r) => r.id === id)!.worstValue)),
    requirements: picked.map((r) => ({ id: r.id, limit: r.limit.value, unit: r.limit.unit })),
  };
}

function compare(job: CompareJob): CompareAnswer {
  const comparison = compareCandidates(job.document, { onRun: (done, total) => post({ kind: 'progress', done, total }) });
  return { kind: 'compare', comparison };
}

self.onmessage = (event: MessageEvent<SizingJob>) => {
  const job = event.data;
  try {
    post({ kind: 'done', answer: job.kind === 'row' ? sizeRow(job) : job.kind === 'outage' ? sizeOutage(job) : compare(job) });
  } catch (e) {
    post({ kind: 'failed', message: e instanceof SigmaLedgerError ? e.message : `unexpected failure: ${e instanceof Error ? e.message : String(e)}` });
  }
};
