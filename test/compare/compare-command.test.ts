import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { serializeBudgetDocument } from '../../src/document';
import { runCli } from '../cli/run-cli';
import { gradeCandidates } from './grade-candidates';

const dir = mkdtempSync(join(tmpdir(), 'sl-compare-'));
function file(name: string, text: string): string {
  const path = join(dir, name);
  writeFileSync(path, text);
  return path;
}

describe('sigma-ledger compare', () => {
  it('prints the candidates side by side and names the cheapest that passes', async () => {
    const r = await runCli(['compare', file('grades.json', serializeBudgetDocument(gradeCandidates({ coarse: 0.5 })))]);
    expect(r.err).toContain('candidate 3 of 3 done');
    expect(r.code).toBe(0);
    const header = r.out.split('\n').find((l) => l.includes('consumerMems'))!;
    expect(header.trim().split(/\s+/)).toEqual(['consumerMems', 'tactical', 'navigation']);
    expect(r.out).toMatch(/coarse: heading 1σ ≤ 0\.5 deg: verdict\s+FAIL\s+PASS\s+PASS/);
    expect(r.out).toMatch(/price \(EUR\)\s+20\s+4000\s+90000\n/);
    expect(r.out).toContain('Cheapest candidate for gyro that passes every requirement: tactical (4000 EUR).');
    expect(r.out).toContain('not a safety case');
  }, 120_000);

  it('gives the comparison as JSON and exits 1 when no candidate passes', async () => {
    const r = await runCli([
      'compare',
      file('strict.json', serializeBudgetDocument(gradeCandidates({ coarse: 1e-4 }))),
      '--json',
    ]);
    expect(r.code).toBe(1);
    const json = JSON.parse(r.out);
    expect(json.slots[0].outcomes.map((o: { passesAll: boolean }) => o.passesAll)).toEqual([false, false, false]);
    expect(json.slots[0].cheapestPassing).toBeUndefined();
  }, 120_000);

  it('refuses a document without candidates, naming the file', async () => {
    const d = gradeCandidates();
    delete d.candidates;
    const r = await runCli(['compare', file('none.json', serializeBudgetDocument(d))]);
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/none\.json: has no candidates to compare/);
  }, 120_000);
});
