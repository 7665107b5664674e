#!/usr/bin/env node
// Start-up of the compiled command line (`npm run build` first; `npm run bench` does):
// median wall time of `--help`, of `run` on a trivial budget (the orchard rover cut to
// its first 10 s), and of bare `node` on the same machine in the same run, so that the
// ratio shows what the command adds when the machine is busy. Target: under 0.3 s.
import { spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

const CLI = 'dist/src/cli/sigma-ledger.js';
const REPEATS = Number(process.env.BENCH_REPEATS) || 9;
const TARGET_S = 0.3;

if (!existsSync(CLI)) {
  console.error(`${CLI} is missing: run npm run build first`);
  process.exit(2);
}

const folder = mkdtempSync(join(tmpdir(), 'sigma-startup-'));
const trivial = join(folder, 'trivial.json');
const doc = JSON.parse(readFileSync('budgets/orchard-rover.json', 'utf8'));
doc.$schema = undefined;
doc.mission.segments = [{ ...doc.mission.segments[0], duration: { value: 10, unit: 's' } }];
doc.requirements = [];
doc.checkpoints = [];
for (const sensor of doc.sensors) delete sensor.outages;
writeFileSync(trivial, JSON.stringify(doc));

/** Median wall time of `node ...args` in seconds, after one unmeasured run. */
function medianS(args, expectCodes = [0]) {
  const times = [];
  for (let i = 0; i <= REPEATS; i++) {
    const t = process.hrtime.bigint();
    const r = spawnSync(process.execPath, args, { encoding: 'utf8' });
    const s = Number(process.hrtime.bigint() - t) / 1e9;
    if (!expectCodes.includes(r.status)) throw new Error(`node ${args.join(' ')} exited ${r.status}: ${r.stderr}`);
    if (i > 0) times.push(s);
  }
  times.sort((a, b) => a - b);
  return times[Math.floor(times.length / 2)];
}

try {
  const bare = medianS(['-e', '']);
  const help = medianS([CLI, '--help']);
  const run = medianS([CLI, 'run', trivial]);
  const line = (what, s) => `${what.padEnd(34)} ${s.toFixed(3)} s  (${(s / bare).toFixed(1)}x bare node)${s < TARGET_S ? '' : `  ABOVE the ${TARGET_S} s target`}`;
  console.log(`start-up, median of ${REPEATS} runs (${process.version}):`);
  console.log(`${'node -e ""'.padEnd(34)} ${bare.toFixed(3)} s`);
  console.log(line('sigma-ledger --help', help));
  console.log(line('sigma-ledger run (10 s, no requirements)', run));
} finally {
  rmSync(folder, { recursive: true, force: true });
}
