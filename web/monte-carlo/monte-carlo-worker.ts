// A Monte Carlo worker of the page: builds the planar model of the document
// (the budget's own analysis for the predicted σ), simulates its share of the
// study's blocks and posts progress every few runs, then the blocks' sums
// (their buffers transferred) and, when asked, the model's plain-data shape.
import { analyseParsedDocument, planarSimulation, runBlocks, SigmaLedgerError, type StudyShape } from '../../src/index';
import type { MonteCarloJob, MonteCarloMessage } from './monte-carlo-protocol';

const PROGRESS_EVERY_RUNS = 4;
const post = (m: MonteCarloMessage, transfer: Transferable[] = []) => self.postMessage(m, { transfer });

self.onmessage = (event: MessageEvent<MonteCarloJob>) => {
  const job = event.data;
  try {
    // The same evaluation as the command line's (refused items left out), so the same seed gives the same numbers.
    const analysis = analyseParsedDocument(job.document, [], { contributions: false, report: false });
    if (analysis.blocked) throw new SigmaLedgerError('', analysis.blocked.message);
    if (analysis.partial || !analysis.sheet.input) throw new SigmaLedgerError('', 'a budget with cell errors cannot be simulated; fix the cells first');
    const model = planarSimulation(analysis.sheet.input);
    let done = 0;
    const nodes = runBlocks(model, job, () => {
      if (++done % PROGRESS_EVERY_RUNS === 0) post({ kind: 'progress', runs: PROGRESS_EVERY_RUNS });
    });
    post({ kind: 'progress', runs: done % PROGRESS_EVERY_RUNS });
    const shape: StudyShape | undefined = job.wantShape
      ? { stepTimesS: model.stepTimesS, quantities: model.quantities, neesGroups: model.neesGroups, budgetVariance: model.budgetVariance, outages: model.outages }
      : undefined;
    post({ kind: 'done', nodes, shape }, nodes.map((n) => n.sums.data.buffer as ArrayBuffer));
  } catch (e) {
    post({ kind: 'failed', message: e instanceof SigmaLedgerError ? e.message : `unexpected failure: ${e instanceof Error ? e.message : String(e)}` });
  }
};
