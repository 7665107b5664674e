#!/usr/bin/env node
// `npm test`: type checks, then every test suite, then one closing line
// "N passed, N failed" so CI's record shows the count (vitest prints none of its own).
// Browser suites join here once the web app exists (they need Debian's Chromium;
// see ensureChromium below when they do).
import { spawnSync } from 'node:child_process';
import { mkdirSync, readFileSync } from 'node:fs';

const run = (cmd, args) => spawnSync(cmd, args, { stdio: 'inherit', shell: false }).status ?? 1;
let passed = 0, failed = 0, ok = true;

for (const project of ['tsconfig.json', 'src/tsconfig.json']) {
  console.log(`\n== type check: ${project}`);
  if (run('npx', ['tsc', '-p', project]) !== 0) { ok = false; failed += 1; }
}

console.log('\n== node tests (vitest)');
mkdirSync('.test-results', { recursive: true });
const status = run('npx', ['vitest', 'run', '--reporter=default', '--reporter=json', '--outputFile.json=.test-results/vitest.json']);
try {
  const report = JSON.parse(readFileSync('.test-results/vitest.json', 'utf8'));
  passed += report.numPassedTests;
  failed += report.numFailedTests;
} catch {
  failed += 1;
}
if (status !== 0) ok = false;

console.log(`\n${passed} passed, ${failed} failed`);
process.exit(ok && failed === 0 ? 0 : 1);
