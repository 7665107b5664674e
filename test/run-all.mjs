#!/usr/bin/env node
// `npm test`: type checks, the Node tests (vitest), the packed package
// installed and used elsewhere, the browser tests (web-test-runner in Debian's
// Chromium), then one closing line "N passed, N failed" so CI's record shows
// the count. Every stage's failures count there, including a stage that
// could not start (a runner that dies before reporting counts as one failure).
import { spawnSync } from 'node:child_process';
import { existsSync, mkdirSync, readFileSync } from 'node:fs';
import { packCheck } from './tools/pack-check.mjs';

let passed = 0, failed = 0, ok = true;
const run = (cmd, args, opts = {}) => spawnSync(cmd, args, { stdio: 'inherit', ...opts }).status ?? 1;

for (const project of ['tsconfig.json', 'src/tsconfig.json', 'web/tsconfig.json']) {
  console.log(`\n== type check: ${project}`);
  if (run('npx', ['tsc', '-p', project]) === 0) passed += 1;
  else { ok = false; failed += 1; }
}

console.log('\n== node tests (vitest)');
mkdirSync('.test-results', { recursive: true });
const vitest = run('npx', ['vitest', 'run', '--reporter=default', '--reporter=json', '--outputFile.json=.test-results/vitest.json']);
try {
  const report = JSON.parse(readFileSync('.test-results/vitest.json', 'utf8'));
  passed += report.numPassedTests;
  failed += report.numFailedTests;
  // A file that fails to load has no failed test but a failed suite.
  if (vitest !== 0 && report.numFailedTests === 0) failed += Math.max(1, report.numFailedTestSuites ?? 0);
} catch {
  failed += 1;
}
if (vitest !== 0) ok = false;

console.log('\n== package (npm pack, install the tarball elsewhere, run the CLI and one import)');
const pack = packCheck();
passed += pack.passed;
failed += pack.failed;
if (pack.failed) ok = false;

console.log('\n== browser tests (web-test-runner, Chromium)');
const chrome = ensureChromium();
if (!chrome) {
  ok = false;
  failed += 1;
} else {
  const wtr = spawnSync('npx', ['web-test-runner'], { encoding: 'utf8', env: { ...process.env, CHROME_PATH: chrome }, maxBuffer: 64 * 1024 * 1024 });
  process.stdout.write(wtr.stdout ?? '');
  process.stderr.write(wtr.stderr ?? '');
  const counts = [...(wtr.stdout ?? '').matchAll(/(\d+) passed, (\d+) failed/g)].pop();
  if (counts) {
    passed += Number(counts[1]);
    failed += Number(counts[2]);
    if (wtr.status !== 0 && Number(counts[2]) === 0) failed += 1;
  } else {
    failed += 1;
  }
  if (wtr.status !== 0) ok = false;
}

console.log(`\n${passed} passed, ${failed} failed`);
process.exit(ok && failed === 0 ? 0 : 1);

/** Path of a Chromium to test in: CHROME_PATH, Debian's, or Debian's installed now (as root); undefined with a message otherwise. */
function ensureChromium() {
  for (const candidate of [process.env.CHROME_PATH, '/usr/bin/chromium']) {
    if (candidate && existsSync(candidate)) return candidate;
  }
  const isRoot = typeof process.getuid === 'function' && process.getuid() === 0;
  if (isRoot && existsSync('/usr/bin/apt-get')) {
    console.log("Chromium not found: installing Debian's chromium package (apt-get)...");
    const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
    if (run('apt-get', ['update', '-qq'], { env }) === 0 && run('apt-get', ['install', '-y', '-qq', 'chromium'], { env }) === 0 && existsSync('/usr/bin/chromium')) {
      return '/usr/bin/chromium';
    }
  }
  console.error("The browser tests need Chromium: install Debian's package (sudo apt-get install -y chromium) or set CHROME_PATH to a Chromium binary.");
  return undefined;
}
