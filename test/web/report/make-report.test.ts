import { expect } from '@open-wc/testing';
import { serializeBudgetDocument } from '../../../src/index';
import { EXAMPLES } from '../../../web/examples';
import { makeReviewReport, reportFileName } from '../../../web/report/make-report';

async function sha256Hex(text: string): Promise<string> {
  const digest = await crypto.subtle.digest('SHA-256', new TextEncoder().encode(text));
  return [...new Uint8Array(digest)].map((b) => b.toString(16).padStart(2, '0')).join('');
}

describe('the review report from the page', () => {
  it('is built in a worker by the same builder as the command line, hashed as Save writes the document', async () => {
    const { document, fileName } = EXAMPLES[0];
    const html = await makeReviewReport(document, fileName, 'html');
    expect(html).to.match(/^<!doctype html>/);
    expect(html).to.contain(`<h1>${document.title}</h1>`);
    for (const id of ['verdicts', 'time-to-exceed', 'noise-r', 'noise-q', 'noise-p0']) expect(html).to.contain(`<table id="${id}">`);
    expect(html).to.contain(`<dd>${await sha256Hex(serializeBudgetDocument(document))}</dd>`);
    expect(html).not.to.contain('<script');
  });

  it('makes Markdown too, and names the file after the budget', async () => {
    const md = await makeReviewReport(EXAMPLES[0].document, EXAMPLES[0].fileName, 'md');
    expect(md).to.match(/^# /);
    expect(reportFileName('orchard-rover.json', 'html')).to.equal('orchard-rover.review.html');
  });

  it('rejects with the engine\'s message when nothing can be computed', async () => {
    const broken = structuredClone(EXAMPLES[0].document);
    broken.settings.step = { value: 'oops', unit: 's' };
    let message = '';
    await makeReviewReport(broken, 'broken.json').catch((e: Error) => (message = e.message));
    expect(message).to.match(/step|settings/i);
  });
});
