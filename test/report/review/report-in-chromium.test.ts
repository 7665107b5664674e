/**
 * The review report in a real browser (Debian's Chromium through
 * puppeteer-core): it loads with no network request and no console error,
 * and printing it to PDF cuts no table row and no chart across a page break.
 * The PDF is read back with pdfjs-dist (Mozilla's PDF.js).
 */
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser } from 'puppeteer-core';
import { getDocument } from 'pdfjs-dist/legacy/build/pdf.mjs';
import { launchBrowser } from '../../tools/browser.mjs';
import { runCli } from '../../cli/run-cli';

/** The little of a DOM element the marking step uses. */
interface MarkedElement {
  tagName: string;
  firstElementChild: MarkedElement | null;
  lastElementChild: MarkedElement | null;
  querySelector(s: string): MarkedElement | null;
  prepend(text: string): void;
  append(text: string): void;
}

let browser: Browser;
let url: string;

beforeAll(async () => {
  const html = (await runCli(['report', 'budgets/orchard-rover.json'])).out;
  const file = join(mkdtempSync(join(tmpdir(), 'sl-report-')), 'orchard-rover.html');
  writeFileSync(file, html);
  url = pathToFileURL(file).href;
  browser = await launchBrowser();
}, 60_000);

afterAll(async () => {
  await browser?.close();
});

describe('the review report in Chromium', () => {
  it('loads with zero network requests and zero console errors', async () => {
    const page = await browser.newPage();
    const requests: string[] = [];
    const errors: string[] = [];
    page.on('request', (r) => { if (r.url() !== url) requests.push(r.url()); });
    page.on('console', (m) => { if (m.type() === 'error') errors.push(m.text()); });
    page.on('pageerror', (e) => errors.push(String(e)));
    await page.goto(url, { waitUntil: 'load' });
    expect(await page.$$eval('svg.chart', (s) => s.length)).toBeGreaterThan(3);
    expect(requests).toEqual([]);
    expect(errors).toEqual([]);
    await page.close();
  }, 60_000);

  it('prints to several A4 pages with no table row and no chart cut across a page break', async () => {
    const page = await browser.newPage();
    await page.goto(url, { waitUntil: 'load' });
    // A marker at the top of each row's first cell and at the end of its last cell (and around each chart):
    // an element cut by a page break has its two markers on different pages.
    const count = await page.evaluate(() => {
      // Runs in the page: the test's tsconfig has no DOM types, so the document is reached through globalThis.
      const doc = (globalThis as unknown as { document: { querySelectorAll(s: string): ArrayLike<MarkedElement> } }).document;
      const items = Array.from(doc.querySelectorAll('tr, figure'));
      items.forEach((el, n) => {
        const first = el.tagName === 'TR' ? el.firstElementChild! : el;
        const last = el.tagName === 'TR' ? el.lastElementChild! : el.querySelector('figcaption')!;
        first.prepend(`[[m${n}a]] `);
        last.append(` [[m${n}b]]`);
      });
      return items.length;
    });
    const pdf = await page.pdf({ preferCSSPageSize: true });
    await page.close();
    const doc = await getDocument({ data: new Uint8Array(pdf) }).promise;
    const pageOf = new Map<string, number>();
    for (let p = 1; p <= doc.numPages; p++) {
      const content = await (await doc.getPage(p)).getTextContent();
      const text = content.items.map((i) => ('str' in i ? i.str : '')).join('');
      for (const m of text.matchAll(/\[\[m(\d+[ab])\]\]/g)) pageOf.set(m[1], p);
    }
    expect(doc.numPages).toBeGreaterThan(3);
    expect(pageOf.size).toBe(2 * count);
    const cut = Array.from({ length: count }, (_, n) => n).filter((n) => pageOf.get(`${n}a`) !== pageOf.get(`${n}b`));
    expect(cut, 'elements whose start and end fall on different pages').toEqual([]);
  }, 120_000);
});
