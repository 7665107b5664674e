import { describe, expect, it } from 'vitest';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { hasStackTrace, runCli } from './run-cli';

describe('file and option problems', () => {
  it('refuse a folder given as the budget file, without a stack trace', async () => {
    const r = await runCli(['check', 'budgets']);
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/budgets: is not a file/);
    expect(hasStackTrace(r.err)).toBe(false);
  });

  it('refuse an --output path that cannot be written, naming the option', async () => {
    const r = await runCli(['run', 'budgets/harbour-launch.json', '--output', '/nonexistent-folder/out.txt']);
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/--output: cannot write \/nonexistent-folder\/out.txt/);
  });

  it('refuse a relative tolerance of 0.5 or more', async () => {
    const r = await runCli(['size', 'budgets/warehouse-tug.json', '--requirement', 'laneKeeping', '--vary', 'gyro.bi', '--tolerance', '5']);
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/--tolerance: .*below 0.5/);
  });

  it('refuse a volatile formula such as RAND() in a cell, because a budget must be reproducible', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'sl-'));
    const doc = JSON.parse(readFileSync('budgets/harbour-launch.json', 'utf8'));
    doc.sensors[0].sources[0].value = '=0.02*(1+RAND())';
    const file = join(dir, 'volatile.json');
    writeFileSync(file, JSON.stringify(doc));
    const r = await runCli(['run', file]);
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/sensors\[0\]\.sources\[0\]\.value: uses RAND\(\)/);
  });

  it('print the usage on stderr and exit 2 when no command is given', async () => {
    const r = await runCli([]);
    expect(r.code).toBe(2);
    expect(r.out).toBe('');
    expect(r.err).toMatch(/usage:/);
  });
});
