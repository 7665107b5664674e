import { mkdtempSync, writeFileSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { parseShard, shardSlice } from '../../src/cli/shard-option';
import { runCli } from './run-cli';

const BUDGET = 'budgets/orchard-rover.json';
const SWEEP = ['size', BUDGET, '--vary', 'gyro.bi', '--sweep', '0:8:7'];

describe('sharded size --sweep and merge', () => {
  it('merging 3 sweep parts prints exactly, bit for bit, the CSV of the whole sweep on one machine', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'sl-sweep-'));
    const one = await runCli(SWEEP);
    expect(one.code, one.err).toBe(0);
    expect(one.out.split('\n').length).toBe(7 + 2); // header, 7 points, final newline
    const parts = [0, 1, 2].map((i) => join(dir, `part-${i}.json`));
    for (const [i, p] of parts.entries()) {
      const r = await runCli([...SWEEP, '--shard', `${i}/3`, '--output', p]);
      expect(r.code, r.err).toBe(0);
      expect(r.out).toBe('');
    }
    // Shard 0 of 3 owns points 0 and 1 of 7 (floor(7·i/3)).
    expect(JSON.parse(readFileSync(parts[0], 'utf8')).result.points).toHaveLength(2);
    const merged = await runCli(['merge', ...parts.slice().reverse()]);
    expect(merged.code, merged.err).toBe(0);
    expect(merged.out).toBe(one.out);
  }, 300_000);

  it('refuses a missing or repeated shard and parts of another sweep, naming the file', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'sl-sweep-'));
    const p0 = join(dir, 'a.json'), p1 = join(dir, 'b.json');
    await runCli([...SWEEP, '--shard', '0/2', '--output', p0]);
    expect((await runCli(['merge', p0])).err).toMatch(/shard 1 of 2 is missing/);
    expect((await runCli(['merge', p0, p0])).err).toMatch(/repeats shard 0 of 2/);
    const other = JSON.parse(readFileSync(p0, 'utf8'));
    writeFileSync(p1, JSON.stringify({ ...other, sweep: '0:9:7', shard: { index: 1, count: 2 } }));
    const r = await runCli(['merge', p0, p1]);
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/b\.json: is from another sweep/);
    expect((await runCli([...SWEEP.slice(0, 4), '--shard', '0/2'])).err).toMatch(/--shard splits a sweep/);
  }, 300_000);

  it('one shard parser for every command: I/N, auto/N from Kubernetes or Slurm, and a share of any list', () => {
    expect(parseShard('auto/4', { SLURM_ARRAY_TASK_ID: '3', SLURM_ARRAY_TASK_MIN: '1' })).toEqual({ index: 2, count: 4 });
    expect(parseShard('auto/4', { JOB_COMPLETION_INDEX: '0' })).toEqual({ index: 0, count: 4 });
    expect(() => parseShard('4/4', {}, '--part')).toThrow(/--part: index 4 is not in 0 to 3/);
    expect(() => parseShard('1/0', {})).toThrow(/COUNT must be from 1/);
    // Every item in exactly one shard, shares differing by at most one, for many sizes.
    for (const items of [0, 1, 5, 7, 64, 1000]) {
      for (const count of [1, 2, 3, 7, 10]) {
        const slices = Array.from({ length: count }, (_, index) => shardSlice(items, { index, count }));
        expect(slices[0][0]).toBe(0);
        expect(slices[count - 1][1]).toBe(items);
        for (let i = 1; i < count; i++) expect(slices[i][0]).toBe(slices[i - 1][1]);
        const sizes = slices.map(([a, b]) => b - a);
        expect(Math.max(...sizes) - Math.min(...sizes)).toBeLessThanOrEqual(1);
      }
    }
  });
});
