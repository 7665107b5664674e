/**
 * `npm run bench` (simulation part): Monte Carlo runs of the orchard rover.
 *
 * Target (issue 13): 1,000 runs of budgets/orchard-rover.json in under 20 s
 * on 2 cores; report runs per second per core. Prints the median of one
 * thread's runs per second (wall and CPU time, since the machine is shared)
 * and the wall time of the whole command with one worker per core.
 */
import { execFileSync } from 'node:child_process';
import { availableParallelism } from 'node:os';
import { fileURLToPath } from 'node:url';
import { loadBudget } from '../../src/cli/load-budget';
import { planarSimulation } from '../../src/simulation/planar-study';
import { runBlocks } from '../../src/simulation/run-blocks';
import { medianMs } from './median-time';

const budget = fileURLToPath(new URL('../../budgets/orchard-rover.json', import.meta.url));
const model = planarSimulation(loadBudget(budget).sheet.input!);
const RUNS = 16;
let cpuMs: number[] = [];
const wallMs = medianMs(() => {
  const c = process.cpuUsage();
  runBlocks(model, { seed: 1, runs: RUNS, firstBlock: 0, endBlock: 1 });
  const d = process.cpuUsage(c);
  cpuMs.push((d.user + d.system) / 1000);
}, 7, 1);
cpuMs = cpuMs.sort((a, b) => a - b);
const cpu = cpuMs[Math.floor(cpuMs.length / 2)];
console.log(`orchard rover, one thread: median ${(RUNS / (wallMs / 1000)).toFixed(1)} runs/s wall, ${(RUNS / (cpu / 1000)).toFixed(1)} runs/s of CPU time (${(wallMs / RUNS).toFixed(1)} ms and ${(cpu / RUNS).toFixed(1)} ms CPU per run)`);

const cores = availableParallelism();
const cli = fileURLToPath(new URL('../../src/cli/sigma-ledger.mjs', import.meta.url));
const t = performance.now();
execFileSync(process.execPath, [cli, 'simulate', budget, '--runs', '1000', '--workers', String(cores), '--json', '--every', '1000'], { stdio: ['ignore', 'ignore', 'ignore'] });
const s = (performance.now() - t) / 1000;
console.log(`sigma-ledger simulate orchard-rover --runs 1000 on ${cores} workers: ${s.toFixed(1)} s wall, ${(1000 / s / cores).toFixed(1)} runs/s per core (target < 20 s on 2 cores)`);
