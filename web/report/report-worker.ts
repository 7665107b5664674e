// The report worker: builds the design-review report off the page's thread
// (a full run with contributions, and any sizing the document asks for, can
// take seconds). It hashes the document as Save writes it, so the SHA-256 in
// the report matches the file a reviewer gets from Save.
import { buildReviewReport, renderReviewHtml, renderReviewMarkdown, serializeBudgetDocument, SigmaLedgerError, TOOL_VERSION } from '../../src/index';
import type { ReportRequest, ReportResponse } from './report-protocol';

async function sha256Hex(text: string): Promise<string> {
  const digest = await crypto.subtle.digest('SHA-256', new TextEncoder().encode(text));
  return [...new Uint8Array(digest)].map((b) => b.toString(16).padStart(2, '0')).join('');
}

self.onmessage = async (event: MessageEvent<ReportRequest>) => {
  const { document, fileName, format } = event.data;
  let response: ReportResponse;
  try {
    const documentSha256 = await sha256Hex(serializeBudgetDocument(document));
    const report = buildReviewReport(document, { fileName, documentSha256, toolVersion: TOOL_VERSION });
    response = { ok: true, text: format === 'md' ? renderReviewMarkdown(report) : renderReviewHtml(report) };
  } catch (e) {
    response = { ok: false, message: e instanceof SigmaLedgerError ? e.message : `unexpected failure: ${e instanceof Error ? e.message : String(e)}` };
  }
  self.postMessage(response);
};
