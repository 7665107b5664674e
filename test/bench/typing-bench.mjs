#!/usr/bin/env node
// `npm run bench:web`: how long after Enter in a grid cell the page shows new
// plots, on the largest example budget, in headless Chromium. A benchmark,
// not a test: it prints medians (target: under 200 ms).
import { buildSite, launchBrowser, startPreview, URL, waitUntilComputed } from '../tools/browser.mjs';

const EDITS = 15;
buildSite();
const server = await startPreview();
const browser = await launchBrowser();
try {
  const page = await browser.newPage();
  await page.setViewport({ width: 1280, height: 800 });
  await page.goto(URL);
  await waitUntilComputed(page);
  // Largest example: the harbour launch (970 s at 0.1 s, 13 sources).
  await page.evaluate(() => {
    const app = document.querySelector('sl-app');
    const select = app.shadowRoot.querySelector('select[aria-label="Load an example budget"]');
    select.value = '1';
    select.dispatchEvent(new Event('change'));
  });
  await waitUntilComputed(page);
  await page.evaluate(() => {
    const app = document.querySelector('sl-app');
    window.__shown = [];
    window.__enter = [];
    window.addEventListener('keydown', (e) => { if (e.key === 'Enter') window.__enter.push(performance.now()); }, true);
    window.__quickMs = [];
    // Two frames after a view arrives, its plots are drawn.
    app.compute.onView = (view) => {
      if (view.contributionsPending) window.__quickMs.push(app.compute.elapsedMs);
      requestAnimationFrame(() => requestAnimationFrame(() => window.__shown.push(performance.now())));
    };
  });
  // The gyro's angle-random-walk magnitude cell, found through the shadow roots.
  const cell = await page.evaluateHandle(() => {
    const deep = (root, selector) => {
      const hit = root.querySelector(selector);
      if (hit) return hit;
      for (const e of root.querySelectorAll('*')) {
        const inner = e.shadowRoot && deep(e.shadowRoot, selector);
        if (inner) return inner;
      }
      return null;
    };
    const grid = deep(document, 'sl-source-grid');
    return grid.shadowRoot.querySelector('sl-cell[label="gyro.arw magnitude"]');
  });
  const latencies = [];
  const worker = [];
  for (let i = 0; i < EDITS; i++) {
    await cell.click();
    await page.keyboard.press('Enter'); // start editing
    await page.keyboard.down('Control'); await page.keyboard.press('a'); await page.keyboard.up('Control');
    await page.keyboard.type(String(0.025 + 0.001 * i)); // never the 0.02 deg/√h already there
    const shownBefore = await page.evaluate(() => window.__shown.length);
    await page.keyboard.press('Enter'); // commit
    await page.waitForFunction((n) => window.__shown.length > n, { timeout: 10000 }, shownBefore);
    const [enter, shown] = await page.evaluate((n) => [window.__enter.at(-1), window.__shown[n]], shownBefore);
    latencies.push(shown - enter);
    // Let the full answer (with every source's share) land before the next edit.
    await page.waitForFunction(() => document.querySelector('sl-app').compute.status === 'complete', { timeout: 10000 });
    worker.push(await page.evaluate(() => [window.__quickMs.at(-1), document.querySelector('sl-app').compute.elapsedMs]));
  }
  const median = (a) => [...a].sort((x, y) => x - y)[Math.floor(a.length / 2)];
  console.log(`Enter in a grid cell -> new plots drawn (harbour launch, ${EDITS} edits): median ${median(latencies).toFixed(0)} ms, ` +
    `min ${Math.min(...latencies).toFixed(0)} ms, max ${Math.max(...latencies).toFixed(0)} ms (target < 200 ms)`);
  console.log(`  worker time: totals first, median ${median(worker.map((w) => w[0])).toFixed(0)} ms; ` +
    `then with every source's contribution, median ${median(worker.map((w) => w[1])).toFixed(0)} ms`);
} finally {
  await browser.close();
  server.kill();
}
