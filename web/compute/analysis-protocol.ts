import type { BudgetDocument, RSweep, SensitivityEntry } from '../../src/index';
import type { JobMessage } from './worker-job-runner';

/** Page -> analysis worker: vary the assumptions, or sweep one aiding sensor's filter R. */
export type AnalysisJob =
  | { kind: 'sensitivity'; document: BudgetDocument; rows: string[]; range: [number, number] }
  | { kind: 'r-sweep'; document: BudgetDocument; sensorId: string };

/** The answer to a job: the ranked entries (largest relative change first), or the sweep. */
export type AnalysisAnswer =
  | { kind: 'sensitivity'; range: [number, number]; entries: SensitivityEntry[] }
  | { kind: 'r-sweep'; sweep: RSweep };

/** Analysis worker -> page: progress (analysis runs done of total), the answer, or why there is none. */
export type AnalysisMessage = JobMessage<AnalysisAnswer>;
