/**
 * `sensitivity`, `r-sweep` and `size --sweep` run their own analyses; loading
 * the file must not run one more that nobody reads. The pipeline's
 * computeBudget is wrapped to count its calls.
 */
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { beforeEach, describe, expect, it, vi } from 'vitest';
import { runCli } from './run-cli';

const calls = vi.hoisted(() => ({ count: 0 }));
vi.mock('../../src/pipeline', async (importOriginal) => {
  const real = await importOriginal<typeof import('../../src/pipeline')>();
  return { ...real, computeBudget: (...args: Parameters<typeof real.computeBudget>) => { calls.count++; return real.computeBudget(...args); } };
});

const BUDGETS = join(dirname(fileURLToPath(import.meta.url)), '..', '..', 'budgets');
const ORCHARD = join(BUDGETS, 'orchard-rover.json');
const TUG = join(BUDGETS, 'warehouse-tug.json');

describe('commands that run analyses of their own', () => {
  beforeEach(() => { calls.count = 0; });

  it('r-sweep runs the base analysis once (the sweep points are filter runs on it)', async () => {
    const r = await runCli(['r-sweep', ORCHARD, '--sensor', 'gnss', '--json']);
    expect(r.code).toBe(0);
    expect(calls.count).toBe(1);
  }, 120_000);

  it('sensitivity runs the base once and one analysis per varied value and scale', async () => {
    const r = await runCli(['sensitivity', TUG, '--json', '--range', '0.5,2']);
    expect(r.code).toBe(0);
    const { entries } = JSON.parse(r.out) as { entries: { target: string; byScale: unknown[] }[] };
    const targets = new Set(entries.map((e) => e.target)).size;
    expect(calls.count).toBe(1 + targets * entries[0].byScale.length);
  }, 120_000);

  it('size --sweep runs no full analysis (each point is a totals-only run of its own)', async () => {
    const r = await runCli(['size', TUG, '--vary', 'gyro.arw', '--sweep', '0.1:0.3:3']);
    expect(r.err).not.toMatch(/error/i);
    expect(r.code).toBe(0);
    expect(calls.count).toBe(0);
  }, 120_000);
});
