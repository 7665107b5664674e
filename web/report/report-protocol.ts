import type { BudgetDocument } from '../../src/index';

/** The report's file formats on the page (as `sigma-ledger report --format`). */
export type ReportFormat = 'html' | 'md';

/** Page -> report worker: build the review report of this document. */
export interface ReportRequest {
  document: BudgetDocument;
  fileName: string;
  format: ReportFormat;
}

/** Report worker -> page: the report's text, or why it could not be made. */
export type ReportResponse = { ok: true; text: string } | { ok: false; message: string };
