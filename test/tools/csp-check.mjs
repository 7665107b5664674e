#!/usr/bin/env node
// The built page under its Content-Security-Policy in Chromium: builds the site into a
// scratch folder, serves it with `vite preview` on a free port, opens the page, opens a
// budget file through the Open button (the schema validator runs), reloads (the autosave
// is restored and validated again), and fails on any policy violation or console error.
// Also says whether the compute worker may use `new Function` (its generated kernels).
// `node test/tools/csp-check.mjs`; exits 1 on a violation.
import { spawn, spawnSync } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { launchBrowser, waitUntilComputed } from './browser.mjs';

const outDir = mkdtempSync(join(tmpdir(), 'sigma-csp-'));
const port = await new Promise((done) => {
  const s = createServer().listen(0, '127.0.0.1', () => {
    const free = s.address().port;
    s.close(() => done(free));
  });
});
const url = `http://127.0.0.1:${port}/`;
const built = spawnSync('./node_modules/.bin/vite', ['build', '--logLevel', 'warn', '--outDir', outDir], { stdio: 'inherit' });
if (built.status !== 0) process.exit(built.status ?? 1);
const server = spawn('./node_modules/.bin/vite', ['preview', '--outDir', outDir, '--port', String(port), '--strictPort'], { stdio: 'ignore' });
const problems = [];
let browser;
try {
  for (let i = 0; i < 100 && !(await fetch(url).then((r) => r.ok, () => false)); i++) await new Promise((r) => setTimeout(r, 100));
  browser = await launchBrowser();
  const page = await browser.newPage();
  page.on('console', (m) => {
    if (m.type() === 'error') problems.push(`console: ${m.text()}`);
  });
  page.on('pageerror', (e) => problems.push(`page error: ${e.message}`));
  await page.evaluateOnNewDocument(() => {
    document.addEventListener('securitypolicyviolation', (e) => console.error(`CSP violation: ${e.violatedDirective} ${e.blockedURI}`));
  });
  await page.goto(url, { waitUntil: 'load' });
  await waitUntilComputed(page, 60_000);
  const policy = await page.$eval('meta[http-equiv="Content-Security-Policy"]', (m) => m.getAttribute('content'));
  console.log(`policy: ${policy}`);
  const input = await page.evaluateHandle(() => document.querySelector('sl-app').shadowRoot.querySelector('input[type=file]'));
  await input.uploadFile(resolve('budgets/warehouse-tug.json'));
  await page.waitForFunction(() => document.querySelector('sl-app').shadowRoot.textContent.includes('Warehouse tug'), { timeout: 30_000 });
  await waitUntilComputed(page, 60_000);
  console.log('opened budgets/warehouse-tug.json');
  await page.reload({ waitUntil: 'load' });
  await waitUntilComputed(page, 60_000);
  console.log('reloaded: the autosave restored');
  for (const worker of page.workers()) {
    const verdict = await worker.evaluate(() => {
      try {
        // eslint-disable-next-line no-new-func -- the check is whether the worker's policy allows it.
        return new Function('return 1')() === 1 ? 'allowed' : 'refused';
      } catch {
        return 'refused';
      }
    });
    console.log(`new Function in the worker ${worker.url().replace(url, '')}: ${verdict}`);
  }
} catch (e) {
  problems.push(`check failed: ${e.message}`);
} finally {
  await browser?.close();
  server.kill();
  rmSync(outDir, { recursive: true, force: true });
}
for (const p of problems) console.error(p);
console.log(problems.length ? `${problems.length} problem(s)` : 'no policy violation, no console error');
process.exitCode = problems.length ? 1 : 0;
