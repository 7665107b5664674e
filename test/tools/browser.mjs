// Shared by the screenshot and typing-benchmark scripts: build the page, serve
// it on 127.0.0.1 with `vite preview`, and drive Debian's Chromium with
// puppeteer-core (no browser download). Not a test file.
import { spawn, spawnSync } from 'node:child_process';
import { existsSync } from 'node:fs';
import puppeteer from 'puppeteer-core';

export const PORT = 4173;
export const URL = `http://127.0.0.1:${PORT}/`;

/** Builds dist/ with Vite; exits the process on failure. */
export function buildSite() {
  const r = spawnSync('./node_modules/.bin/vite', ['build', '--logLevel', 'warn'], { stdio: 'inherit' });
  if (r.status !== 0) process.exit(r.status ?? 1);
}

/** Starts `vite preview` on PORT; resolves with the child process once it answers. */
export async function startPreview() {
  if (await answers()) throw new Error(`something already serves ${URL}; stop it first (it would be measured instead of this build)`);
  const server = spawn('./node_modules/.bin/vite', ['preview', '--port', String(PORT), '--strictPort'], { stdio: 'ignore' });
  for (let i = 0; i < 100; i++) {
    try {
      if ((await fetch(URL)).ok) return server;
    } catch {
      await new Promise((r) => setTimeout(r, 100));
    }
  }
  server.kill();
  throw new Error(`vite preview did not answer on ${URL}`);
}

async function answers() {
  try {
    return (await fetch(URL)).ok;
  } catch {
    return false;
  }
}

/** Launches headless Chromium (CHROME_PATH or Debian's) with the flags this machine needs. */
export function launchBrowser() {
  const executablePath = process.env.CHROME_PATH || '/usr/bin/chromium';
  if (!existsSync(executablePath)) throw new Error("Chromium not found: apt-get install -y chromium, or set CHROME_PATH");
  return puppeteer.launch({
    executablePath,
    headless: true,
    args: ['--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'],
  });
}

/** Waits until the page's compute status says the results are up to date. */
export async function waitUntilComputed(page, timeoutMs = 30000) {
  await page.waitForFunction(
    () => document.querySelector('sl-app')?.shadowRoot?.querySelector('.status')?.textContent?.includes('up to date'),
    { timeout: timeoutMs },
  );
}
