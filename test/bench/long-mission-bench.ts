/**
 * `npm run bench` (part): a 10-hour mission at 0.1 s with 14 sources (R2
 * with every duration scaled by 60), each run in a fresh process to read its
 * peak resident memory. Target (issue "Long missions and large suites"):
 * under 1 GB peak, the JSON result built, the verdicts those of the
 * whole-series run. With BASELINE_SRC=<older checkout>/src the same run of
 * that code is printed beside it (the old engine keeps every step).
 */
import { execFileSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import { dirname, resolve } from 'node:path';

const here = dirname(fileURLToPath(import.meta.url));
const child = resolve(here, 'long-mission-child.ts');
const FACTOR = 60;

interface LongRun { engineMs: number; totalMs: number; peakMB: number; jsonChars: number; verdict: unknown }

function run(srcDir: string, every: number, factor = FACTOR, landmarks = 0): LongRun | string {
  try {
    const out = execFileSync(process.execPath, ['--import', 'tsx', child, srcDir, String(factor), String(every), String(landmarks)], { encoding: 'utf8', stdio: ['ignore', 'pipe', 'pipe'] });
    return JSON.parse(out.trim().split('\n').pop()!) as LongRun;
  } catch (e) {
    return `failed: ${(e as Error).message.split('\n')[0]}`;
  }
}

function line(label: string, r: LongRun | string): string {
  if (typeof r === 'string') return `  ${label}: ${r}`;
  const json = r.jsonChars < 0 ? 'JSON string over the limit' : `JSON ${(r.jsonChars / 1e6).toFixed(0)} MB`;
  return `  ${label}: engine ${(r.engineMs / 1000).toFixed(2)} s, with JSON ${(r.totalMs / 1000).toFixed(2)} s, peak RSS ${r.peakMB.toFixed(0)} MB, ${json}`;
}

console.log('10-hour mission at 0.1 s (360,001 steps, 11 states, 14 sources), one process each (target < 1024 MB peak):');
const baseline = process.env.BASELINE_SRC;
const oldRun = baseline ? run(baseline, 0) : undefined;
if (oldRun) console.log(line('old code (every step kept)', oldRun));
const auto = run(resolve(here, '../../src'), 0);
console.log(line('new, default (stride chosen to bound memory)', auto));
const every10 = run(resolve(here, '../../src'), 10);
console.log(line('new, every 10th step', every10));
if (typeof auto !== 'string' && typeof every10 !== 'string') {
  const same = JSON.stringify(auto.verdict) === JSON.stringify(every10.verdict)
    && (oldRun === undefined || typeof oldRun === 'string' || JSON.stringify(oldRun.verdict) === JSON.stringify(auto.verdict));
  console.log(`  verdicts and times-to-exceed identical across runs: ${same}`);
}

console.log('64 visible landmarks (range-bearing at 10 Hz, 128 scalar measurements a step, R2\'s 10 minutes; target < 300 MB peak):');
if (baseline) console.log(line('old code (schedule built up front)', run(baseline, 0, 1, 64)));
console.log(line('new (schedule generated as the run goes)', run(resolve(here, '../../src'), 0, 1, 64)));
