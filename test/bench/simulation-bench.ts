/**
 * `npm run bench` (simulation part): Monte Carlo runs of the orchard rover.
 *
 * Target (issue 13): 1,000 runs of budgets/orchard-rover.json in under 20 s
 * on 2 cores; report runs per second per core. Prints
 * - the median of one thread's runs per second (wall and CPU time, since the
 *   machine is shared), alternating with the old code when BASELINE_SRC=<older
 *   checkout>/src is set (both from source, in this process, same seed);
 * - the wall time of the compiled command with one worker per core (npm run
 *   bench builds dist/ first) and its runs per second per core;
 * - peak memory of one worker thread for 64 and 512 runs (running sums: it
 *   must not grow with the number of runs).
 */
import { execFileSync } from 'node:child_process';
import { availableParallelism } from 'node:os';
import { resolve } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { loadBudget } from '../../src/cli/load-budget';
import type { MonteCarloModel } from '../../src/simulation/monte-carlo-model';
import { planarSimulation } from '../../src/simulation/planar-study';
import { runBlocks } from '../../src/simulation/run-blocks';

const budget = fileURLToPath(new URL('../../budgets/orchard-rover.json', import.meta.url));
const input = loadBudget(budget).sheet.input!;
const RUNS = 16;

type Runner = (model: MonteCarloModel, range: { seed: number; runs: number; firstBlock: number; endBlock: number }) => unknown;
interface Code { name: string; model: MonteCarloModel; run: Runner; wall: number[]; cpu: number[] }
const codes: Code[] = [{ name: 'this code', model: planarSimulation(input), run: runBlocks, wall: [], cpu: [] }];
const baseline = process.env.BASELINE_SRC;
if (baseline) {
  const study = await import(pathToFileURL(resolve(baseline, 'simulation/planar-study.ts')).href);
  const blocks = await import(pathToFileURL(resolve(baseline, 'simulation/run-blocks.ts')).href);
  codes.push({ name: 'old code', model: study.planarSimulation(input), run: blocks.runBlocks, wall: [], cpu: [] });
}
for (let i = 0; i < 8; i++) {
  for (const code of codes) {
    const t = performance.now(), c = process.cpuUsage();
    code.run(code.model, { seed: 1, runs: RUNS, firstBlock: 0, endBlock: 1 });
    const d = process.cpuUsage(c);
    if (i === 0) continue; // warm-up
    code.wall.push(performance.now() - t);
    code.cpu.push((d.user + d.system) / 1000);
  }
}
const median = (xs: number[]) => xs.slice().sort((a, b) => a - b)[Math.floor(xs.length / 2)];
for (const code of codes) {
  const wallMs = median(code.wall), cpuMs = median(code.cpu);
  console.log(`orchard rover, one thread, ${code.name}: median ${(RUNS / (wallMs / 1000)).toFixed(1)} runs/s wall, ${(RUNS / (cpuMs / 1000)).toFixed(1)} runs/s of CPU time (${(wallMs / RUNS).toFixed(1)} ms and ${(cpuMs / RUNS).toFixed(1)} ms CPU per run)`);
}
if (codes.length === 2) console.log(`old/new CPU time per run: ${(median(codes[1].cpu) / median(codes[0].cpu)).toFixed(2)}`);

const cores = availableParallelism();
const cli = fileURLToPath(new URL('../../dist/src/cli/sigma-ledger.js', import.meta.url));
const t = performance.now();
execFileSync(process.execPath, [cli, 'simulate', budget, '--runs', '1000', '--workers', String(cores), '--json', '--every', '1000'], { stdio: ['ignore', 'ignore', 'ignore'] });
const s = (performance.now() - t) / 1000;
console.log(`sigma-ledger simulate orchard-rover --runs 1000 on ${cores} workers (compiled): ${s.toFixed(1)} s wall, ${(1000 / s / cores).toFixed(1)} runs/s per core (target < 20 s on 2 cores)`);

// Peak memory of one thread for two run counts, each in a fresh process.
const peakScript = (runs: number) => [
  `const { loadBudget } = await import(${JSON.stringify(pathToFileURL(resolve(cli, '../load-budget.js')).href)});`,
  `const { planarSimulation } = await import(${JSON.stringify(pathToFileURL(resolve(cli, '../../simulation/planar-study.js')).href)});`,
  `const { runBlocks } = await import(${JSON.stringify(pathToFileURL(resolve(cli, '../../simulation/run-blocks.js')).href)});`,
  `const m = planarSimulation(loadBudget(${JSON.stringify(budget)}).sheet.input);`,
  `runBlocks(m, { seed: 1, runs: ${runs}, firstBlock: 0, endBlock: ${Math.ceil(runs / 64)} });`,
  'console.log(process.resourceUsage().maxRSS);',
].join('\n');
const peaks = [64, 512].map((runs) => Number(execFileSync(process.execPath, ['--input-type=module', '-e', peakScript(runs)], { encoding: 'utf8' }).trim()) / 1024);
console.log(`peak memory of one thread: ${peaks[0].toFixed(0)} MB for 64 runs, ${peaks[1].toFixed(0)} MB for 512 runs (running sums)`);
