#!/usr/bin/env node
// Start-up of the compiled command line (`npm run build` first; `npm run bench` does):
// median wall time of `--help`, of `run` on a trivial budget (the orchard rover cut to
// its first 10 s), and of bare `node` on the same machine in the same run, so that the
// ratio shows what the command adds when the machine is busy. Target: under 0.3 s.
// The bundle (dist/cli/, the package's bin) is timed beside the same code loaded module
// by module (dist/src/cli/, tsc's output), and beside BASELINE_CLI when it is set (the
// CLI of an older checkout, e.g. `git archive <commit> | tar -x -C /tmp/base`, built there),
// so old/new ratios come from one run. The trivial budget has formulas (HyperFormula's
// engine is built); a copy with every formula frozen to its number shows the run without it.
import { spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

const CLI = 'dist/cli/sigma-ledger.js';
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
const numbersOnly = join(folder, 'numbers-only.json');
writeFileSync(numbersOnly, JSON.stringify(await frozen(doc)));

/** A copy of `document` with each formula cell replaced by the number it evaluates to (the compiled library). */
async function frozen(document) {
  const { BudgetWorkbook } = await import('../../dist/src/sheet/index.js');
  const { listCells } = await import('../../dist/src/sheet/cell-list.js');
  const copy = structuredClone(document);
  const workbook = new BudgetWorkbook(copy);
  const values = workbook.evaluate().cellValues;
  workbook.destroy();
  for (const c of listCells(copy)) if (typeof c.quantity.value === 'string') c.quantity.value = values.get(c.location.path);
  return copy;
}

// CPU time (user + system) of each run from GNU time when it is installed: less
// sensitive than wall time to other work on a shared machine.
const TIME = existsSync('/usr/bin/time') ? '/usr/bin/time' : undefined;

/** One run of `node ...args`: wall and CPU seconds (CPU NaN without GNU time). */
function once(args, expectCodes) {
  const t = process.hrtime.bigint();
  const r = TIME
    ? spawnSync(TIME, ['-f', 'cpu %U %S', process.execPath, ...args], { encoding: 'utf8' })
    : spawnSync(process.execPath, args, { encoding: 'utf8' });
  const wallS = Number(process.hrtime.bigint() - t) / 1e9;
  if (!expectCodes.includes(r.status)) throw new Error(`node ${args.join(' ')} exited ${r.status}: ${r.stderr}`);
  const cpu = /cpu (\d+\.\d+) (\d+\.\d+)\s*$/.exec(r.stderr ?? '');
  return { wallS, cpuS: cpu ? Number(cpu[1]) + Number(cpu[2]) : NaN };
}

const median = (xs) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];

try {
  const others = [['module by module', 'dist/src/cli/sigma-ledger.js'], ['baseline', process.env.BASELINE_CLI]];
  const cases = [{ label: 'node -e ""', args: ['-e', ''], codes: [0] }];
  for (const [name, cli] of [['', CLI], ...others.filter(([, cli]) => cli && existsSync(cli))]) {
    const of = name ? ` (${name})` : '';
    cases.push({ label: `sigma-ledger --help${of}`, args: [cli, '--help'], codes: [0], target: !name });
    cases.push({ label: `sigma-ledger run, 10 s, no requirements${of}`, args: [cli, 'run', trivial], codes: [0, 1], target: !name });
    cases.push({ label: `  the same, formulas frozen to numbers${of}`, args: [cli, 'run', numbersOnly], codes: [0, 1], target: !name });
  }
  // Round robin, one unmeasured round first, so drift in the machine's load hits every case alike.
  const runs = cases.map(() => []);
  for (let i = 0; i <= REPEATS; i++) {
    cases.forEach((c, j) => {
      const r = once(c.args, c.codes);
      if (i > 0) runs[j].push(r);
    });
  }
  const bare = median(runs[0].map((r) => r.wallS));
  console.log(`start-up, median of ${REPEATS} runs (${process.version}), wall and CPU (user + system):`);
  cases.forEach((c, j) => {
    const wallS = median(runs[j].map((r) => r.wallS)), cpuS = median(runs[j].map((r) => r.cpuS));
    const ratio = j === 0 ? '' : `  (${(wallS / bare).toFixed(1)}x bare node)`;
    const above = c.target && wallS >= TARGET_S ? `  ABOVE the ${TARGET_S} s target` : '';
    console.log(`${c.label.padEnd(58)} ${wallS.toFixed(3)} s wall, ${cpuS.toFixed(2)} s CPU${ratio}${above}`);
  });
} finally {
  rmSync(folder, { recursive: true, force: true });
}
