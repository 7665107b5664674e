import type { BudgetDocument, CandidateComparison, OutageLimit, RowSweep } from '../../src/index';

/** Page -> sizing worker: size one row's magnitude, or one outage's length, against some requirements. */
export type SizingJob =
  | { kind: 'row'; document: BudgetDocument; rowId: string; requirementIds: string[]; points: number }
  | { kind: 'outage'; document: BudgetDocument; sensorId: string; outageIndex: number; requirementIds: string[]; points: number }
  | CompareJob;

/** A job that sizes a row or an outage (not a comparison). */
export type SizeJob = Exclude<SizingJob, CompareJob>;

/** Page -> sizing worker: run every candidate of the document's `candidates` (src/compare/). */
export interface CompareJob {
  kind: 'compare';
  document: BudgetDocument;
}

/** The answer to a compare job. */
export interface CompareAnswer {
  kind: 'compare';
  comparison: CandidateComparison;
}

/** One requirement's largest allowable value of the row, in the row's unit. */
export interface SizedRow {
  requirementId: string;
  outcome: 'bounded' | 'always-passes' | 'never-passes';
  largestPassing: number;
  tolerance: number;
}

/** The answer to a row job: each requirement's largest value, the binding one, and the swept curve. */
export interface RowAnswer {
  kind: 'row';
  rowId: string;
  unit: string;
  sized: SizedRow[];
  /** The requirement with the smallest largest allowable value (undefined when none bounds the row). */
  binding?: string;
  sweep: RowSweep;
}

/** The answer to an outage job: each requirement's longest outage, and the worst value against length. */
export interface OutageAnswer {
  kind: 'outage';
  sensorId: string;
  outageId: string;
  limits: OutageLimit[];
  lengthsS: number[];
  /** worst[k][i]: requirement i's worst value at lengthsS[k], in its limit's unit. */
  worst: number[][];
  requirements: { id: string; limit: number; unit: string }[];
}

/** Sizing worker -> page: progress, the answer, or why there is none. */
export type SizingMessage =
  | { kind: 'progress'; done: number; total: number }
  | { kind: 'done'; answer: RowAnswer | OutageAnswer | CompareAnswer }
  | { kind: 'failed'; message: string };
