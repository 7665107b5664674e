import type { BudgetDocument } from '../../src';
import type { ViewResult } from '../../src';

/** Page -> worker: compute this document; `seq` orders requests. */
export interface ComputeRequest {
  seq: number;
  document: BudgetDocument;
}

/** Worker -> page: the view for request `seq` (first totals only, then `final` with contributions), or an unexpected failure. */
export type ComputeResponse =
  | { seq: number; ok: true; view: ViewResult; elapsedMs: number; final: boolean }
  | { seq: number; ok: false; message: string };
