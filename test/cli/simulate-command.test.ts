import { mkdtempSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { simulateOptionsFromArgs } from '../../src/cli/simulate-command';
import { fixturePath } from '../simulation/fixture-model';
import { runCli } from './run-cli';

const FILE = fixturePath('linear-gnss');

describe('sigma-ledger simulate and merge', () => {
  it('merging 3 shard parts prints exactly what one machine prints, and 2 worker threads give the same numbers as one', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'sl-sim-'));
    const one = await runCli(['simulate', FILE, '--runs', '150', '--seed', '9', '--workers', '1', '--json', '--every', '50']);
    expect(one.code, one.err).toBe(0);
    const parts = [0, 1, 2].map((i) => join(dir, `part-${i}.json`));
    for (const [i, p] of parts.entries()) {
      const r = await runCli(['simulate', FILE, '--runs', '150', '--seed', '9', '--workers', '1', '--shard', `${i}/3`, '--output', p]);
      expect(r.code, r.err).toBe(0);
    }
    const merged = await runCli(['merge', ...parts.reverse(), '--json', '--every', '50']);
    expect(merged.code, merged.err).toBe(0);
    expect(merged.out).toBe(one.out);
    const threads = await runCli(['simulate', FILE, '--runs', '150', '--seed', '9', '--workers', '2', '--json', '--every', '50']);
    expect(threads.out).toBe(one.out);
    const json = JSON.parse(one.out);
    expect(json.format).toBe('sigma-ledger-simulation');
    expect(json.verdict).toBe('checked by 150 Monte Carlo runs: consistent within bounds');
    expect(one.err).toMatch(/simulate: 150\/150 runs/);
    expect(JSON.parse(readFileSync(parts[0], 'utf8')).shard).toEqual({ index: 2, count: 3 });
  }, 300_000);

  it('refuses a merge that leaves a shard out, naming the missing runs', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'sl-sim-'));
    const p = join(dir, 'part-1.json');
    await runCli(['simulate', FILE, '--runs', '130', '--workers', '1', '--shard', '1/3', '--output', p]);
    const r = await runCli(['merge', p]);
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/runs from 0 are missing/);
  }, 300_000);

  it('reads the shard index from Kubernetes or Slurm and explains bad shard options', () => {
    const base = { runs: '100' };
    expect(simulateOptionsFromArgs('f', { ...base, shard: 'auto/8' }, { JOB_COMPLETION_INDEX: '5' }).shard).toEqual({ index: 5, count: 8 });
    expect(simulateOptionsFromArgs('f', { ...base, shard: 'auto/8' }, { SLURM_ARRAY_TASK_ID: '4', SLURM_ARRAY_TASK_MIN: '1' }).shard).toEqual({ index: 3, count: 8 });
    expect(() => simulateOptionsFromArgs('f', { ...base, shard: 'auto/8' }, {})).toThrow(/JOB_COMPLETION_INDEX/);
    expect(() => simulateOptionsFromArgs('f', { ...base, shard: '8/8' }, {})).toThrow(/index 8 is not in 0 to 7/);
    expect(() => simulateOptionsFromArgs('f', { ...base, shard: 'two' }, {})).toThrow(/INDEX\/COUNT/);
    expect(() => simulateOptionsFromArgs('f', {}, {})).toThrow(/--runs: must be a whole number/);
  });
});
