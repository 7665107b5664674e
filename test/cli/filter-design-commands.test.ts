/**
 * The command line with a filter design: `run` on the annotated example
 * (whose rows carry `tuning`), `sensitivity` and `r-sweep`.
 */
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { hasStackTrace, runCli } from './run-cli';

const BUDGETS = join(dirname(fileURLToPath(import.meta.url)), '..', '..', 'budgets');
const ANNOTATED = join(BUDGETS, 'annotated-example.json');
const ORCHARD = join(BUDGETS, 'orchard-rover.json');
const TUG = join(BUDGETS, 'warehouse-tug.json');

describe('run with a filter design', () => {
  it('prints believed against actual with a plain verdict per quantity', async () => {
    const r = await runCli(['run', ANNOTATED]);
    expect(r.out).toContain('FILTER AS TUNED VERSUS TRUTH');
    expect(r.out).toMatch(/heading: the filter believes [\d.]+ deg, the actual error is [\d.]+ deg: (overconfident|conservative) by [\d.]+×/);
    expect(r.out).toContain('gyro.sf: left out of the filter');
    expect(r.out).toContain('REQUIREMENTS ON THE ACTUAL ERROR');
  }, 60_000);

  it('carries both series in --json, the actual shares summing to the square of the actual sigma', async () => {
    const r = await runCli(['run', ANNOTATED, '--json', '--every', '50']);
    const fd = JSON.parse(r.out).filterDesign;
    expect(Object.keys(fd.tuning)).toContain('gnss.multipath');
    expect(fd.believed.series.t_s).toEqual(fd.actual.series.t_s);
    const sigma = fd.actual.series.drms_m as number[];
    const shares = Object.values(fd.actual.contributions.drms as Record<string, number[]>);
    sigma.forEach((s, k) => expect(Math.abs(shares.reduce((a, v) => a + v[k], 0) - s * s)).toBeLessThanOrEqual(1e-9 * s * s));
    expect(fd.actual.requirements.map((q: { id: string }) => q.id)).toEqual(['greenhousePosition', 'heading']);
    expect(fd.confidence[0]).toHaveProperty('verdict');
  }, 60_000);

  it('leaves a budget without tuning as it was (no filterDesign key)', async () => {
    const r = await runCli(['run', ORCHARD, '--json', '--every', '100']);
    expect(JSON.parse(r.out)).not.toHaveProperty('filterDesign');
  }, 60_000);
});

describe('sensitivity and r-sweep', () => {
  it('sensitivity ranks the assumed values of a budget, largest change first', async () => {
    const r = await runCli(['sensitivity', TUG, '--json', '--range', '0.5,2']);
    expect(r.code).toBe(0);
    const { entries } = JSON.parse(r.out);
    expect(entries.length).toBeGreaterThan(0);
    for (let i = 1; i < entries.length; i++) expect(entries[i].relativeChange).toBeLessThanOrEqual(entries[i - 1].relativeChange);
    expect(entries.every((e: { assumed: boolean }) => e.assumed)).toBe(true);
  }, 120_000);

  it('sensitivity refuses a bad --range naming the option, without a stack trace', async () => {
    const r = await runCli(['sensitivity', ANNOTATED, '--range', '2,1']);
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/--range: must be two scales/);
    expect(hasStackTrace(r.err)).toBe(false);
  });

  it('r-sweep prints actual / believed per scale and finds the smallest actual at x1 on a budget without tuning', async () => {
    const r = await runCli(['r-sweep', ORCHARD, '--sensor', 'gnss']);
    expect(r.code).toBe(0);
    expect(r.out).toMatch(/smallest actual worst at: .*×1(,|\n)/);
    const missing = await runCli(['r-sweep', ORCHARD]);
    expect(missing.code).toBe(2);
    expect(missing.err).toMatch(/--sensor: is required/);
  }, 120_000);
});
