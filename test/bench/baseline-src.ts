/**
 * The code the benchmarks compare against, run beside the current code in
 * the same process (the machines are noisy, so old and new are timed in
 * alternation and quoted from one run). `BASELINE_SRC=<checkout>/src`
 * names any older tree; without it the tree of BASELINE_COMMIT (the last
 * commit before the performance work of issues #9 and #10) is extracted once
 * with `git archive` into the system's temporary folder, with this
 * checkout's node_modules linked in. `BASELINE=off` skips the comparison.
 */
import { execFileSync } from 'node:child_process';
import { existsSync, mkdirSync, symlinkSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { pathToFileURL } from 'node:url';

/** The frozen old code: the engine before the block update, the shared kernels in 3-D and the faster readers. */
export const BASELINE_COMMIT = 'e2bb88a';

const root = resolve(import.meta.dirname, '../..');

/** The old tree's src folder, or undefined when the comparison is switched off or git cannot give it. */
export function baselineSrc(): string | undefined {
  if (process.env.BASELINE === 'off') return undefined;
  if (process.env.BASELINE_SRC) return resolve(process.env.BASELINE_SRC);
  const dir = join(tmpdir(), `sigma-ledger-baseline-${BASELINE_COMMIT}`);
  try {
    if (!existsSync(join(dir, 'src'))) {
      mkdirSync(dir, { recursive: true });
      execFileSync('sh', ['-c', 'git -C "$1" archive "$2" src budgets package.json | tar -x -C "$3"', 'sh', root, BASELINE_COMMIT, dir]);
    }
    if (!existsSync(join(dir, 'node_modules'))) symlinkSync(join(root, 'node_modules'), join(dir, 'node_modules'));
    return join(dir, 'src');
  } catch (e) {
    console.log(`(no baseline: ${(e as Error).message.split('\n')[0]})`);
    return undefined;
  }
}

/** Imports a module of the old tree by its path under src/, e.g. `pipeline.ts`. */
export async function importBaseline<T>(path: string): Promise<T | undefined> {
  const src = baselineSrc();
  return src ? ((await import(pathToFileURL(join(src, path)).href)) as T) : undefined;
}

/** Medians of two functions timed in alternation (one call each per round), ms. */
export function alternatingMedians(newRun: () => void, oldRun: (() => void) | undefined, rounds: number, warmUps = 2): {
  newMs: number; oldMs: number | undefined;
} {
  for (let i = 0; i < warmUps; i++) { newRun(); oldRun?.(); }
  const a: number[] = [], b: number[] = [];
  for (let i = 0; i < rounds; i++) {
    let t = performance.now();
    newRun();
    a.push(performance.now() - t);
    if (oldRun) {
      t = performance.now();
      oldRun();
      b.push(performance.now() - t);
    }
  }
  const median = (x: number[]) => [...x].sort((p, q) => p - q)[Math.floor(x.length / 2)];
  return { newMs: median(a), oldMs: oldRun ? median(b) : undefined };
}

/** "; old 12.3 ms, new/old 0.45" or "" without a baseline. */
export function versusOld(newMs: number, oldMs: number | undefined): string {
  return oldMs === undefined ? '' : `; old code ${oldMs.toFixed(1)} ms, new/old ${(newMs / oldMs).toFixed(2)}`;
}
