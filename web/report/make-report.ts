import type { BudgetDocument } from '../../src/index';
import type { ReportFormat, ReportRequest, ReportResponse } from './report-protocol';

/**
 * Builds the design-review report of `document` in a worker of its own (the
 * same pure builder as `sigma-ledger report`), resolving with its text.
 * @throws Error with the engine's message when the budget cannot be computed.
 */
export function makeReviewReport(document: BudgetDocument, fileName: string, format: ReportFormat = 'html'): Promise<string> {
  const worker = new Worker(new URL('./report-worker.ts', import.meta.url), { type: 'module' });
  return new Promise<string>((resolve, reject) => {
    worker.onmessage = (e: MessageEvent<ReportResponse>) => {
      worker.terminate();
      if (e.data.ok) resolve(e.data.text);
      else reject(new Error(e.data.message));
    };
    worker.onerror = (e) => {
      worker.terminate();
      reject(new Error(`the report worker failed: ${e.message}`));
    };
    const request: ReportRequest = { document, fileName, format };
    worker.postMessage(request);
  });
}

/** The report's download name: the budget's file name with .review.html (or .review.md). */
export function reportFileName(fileName: string, format: ReportFormat): string {
  return `${fileName.replace(/\.json$/i, '')}.review.${format}`;
}
