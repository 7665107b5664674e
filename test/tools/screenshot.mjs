#!/usr/bin/env node
// `npm run screenshot`: builds the page, serves it, loads the demo budget in
// headless Chromium and saves full-page screenshots of each results tab to
// .test-results/ so anyone can look at the page without a desktop.
import { mkdirSync } from 'node:fs';
import { buildSite, launchBrowser, startPreview, URL, waitUntilComputed } from './browser.mjs';

const [width, height] = (process.env.SIZE ?? '1280x800').split('x').map(Number);
buildSite();
const server = await startPreview();
const browser = await launchBrowser();
try {
  mkdirSync('.test-results', { recursive: true });
  const page = await browser.newPage();
  await page.setViewport({ width, height });
  await page.goto(URL);
  await waitUntilComputed(page);
  // With EXAMPLE=<file name> (e.g. survey-drone.json), that example from the menu instead of the demo.
  if (process.env.EXAMPLE) {
    await page.evaluate((name) => {
      const app = document.querySelector('sl-app');
      const select = app.shadowRoot.querySelector('select[aria-label="Load an example budget"]');
      const option = [...select.options].find((o) => o.dataset.file === name);
      if (!option) throw new Error(`no example ${name} in the menu`);
      select.value = option.value;
      select.dispatchEvent(new Event('change'));
    }, process.env.EXAMPLE);
    await new Promise((r) => setTimeout(r, 500));
    await waitUntilComputed(page, 120000);
  }
  await new Promise((r) => setTimeout(r, 300)); // let charts draw
  const file = `.test-results/screenshot-${width}x${height}${process.env.EXAMPLE ? `-${process.env.EXAMPLE.replace(/\.json$/, '')}` : ''}.png`;
  await page.screenshot({ path: file, fullPage: true });
  console.log(`saved ${file}`);
  // With TABS=1, one more shot per tab pair: workbench tab i beside findings tab i.
  if (process.env.TABS) {
    for (let i = 1; i < 5; i++) {
      await page.evaluate((index) => {
        const app = document.querySelector('sl-app').shadowRoot;
        for (const host of ['sl-workbench', 'sl-findings']) {
          const tabs = app.querySelector(host)?.shadowRoot?.querySelectorAll('[role="tab"]') ?? [];
          tabs[Math.min(index, tabs.length - 1)]?.click();
        }
      }, i);
      await new Promise((r) => setTimeout(r, 400));
      const tabFile = `.test-results/screenshot-${width}x${height}-tab${i}.png`;
      await page.screenshot({ path: tabFile });
      console.log(`saved ${tabFile}`);
    }
  }
} finally {
  await browser.close();
  server.kill();
}
