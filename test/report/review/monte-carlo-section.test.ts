import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { runCli } from '../../cli/run-cli';
import { fixturePath } from '../../simulation/fixture-model';
import { jstatChiSquareInv } from '../../simulation/chi-square-reference';

/** simulate --json of a fixture into a temporary file; returns its path. */
async function study(name: string, runs: number): Promise<string> {
  const path = join(mkdtempSync(join(tmpdir(), 'sl-mc-report-')), `${name}.json`);
  const r = await runCli(['simulate', fixturePath(name), '--runs', String(runs), '--seed', '5', '--workers', '1', '--json', '--every', '10', '--output', path]);
  expect(r.code, r.err).toBeLessThan(2);
  return path;
}

/** The Markdown of the report's Monte Carlo section (up to the next section). */
function section(markdown: string): string {
  const start = markdown.indexOf('## Monte Carlo check');
  expect(start, 'the report has a Monte Carlo section').toBeGreaterThan(-1);
  const end = markdown.indexOf('\n## ', start + 1);
  return markdown.slice(start, end < 0 ? undefined : end);
}

describe('the review report shows a Monte Carlo study of the same file', () => {
  it('a consistent study: the verdict line, RMS/σ per quantity with the χ² band, a chart and the caution', async () => {
    const sim = await study('linear-gnss', 128);
    const r = await runCli(['report', fixturePath('linear-gnss'), '--format', 'md', '--simulation', sim]);
    expect(r.code, r.err).toBeLessThan(2);
    const text = section(r.out);
    expect(text).toContain('checked by 128 Monte Carlo runs: consistent within bounds');
    expect(text).toMatch(/Design estimates from linearised models, not a safety case/);
    // Upper end of the 95 % band of the RMS of N runs over σ: √(χ²_N(0.975)/N) (Bar-Shalom, Li and
    // Kirubarajan 2001, §5.4.2), from jstat; the report prints 4 significant digits.
    const high = Math.sqrt(jstatChiSquareInv(0.975, 128) / 128);
    expect(text).toContain(high.toPrecision(4));
    const without = await runCli(['report', fixturePath('linear-gnss'), '--format', 'md']);
    expect(without.out).not.toContain('## Monte Carlo check');
    const html = await runCli(['report', fixturePath('linear-gnss'), '--simulation', sim]);
    expect(html.out).toMatch(/<svg[^>]*>[\s\S]*RMS of 128 runs/);
  }, 300_000);

  it('a flagged study shows its warnings; a study of another file, a part file or another format is refused by name', async () => {
    const sim = await study('close-landmark', 128);
    const r = await runCli(['report', fixturePath('close-landmark'), '--format', 'md', '--simulation', sim]);
    const text = section(r.out);
    expect(text).toMatch(/checked by 128 Monte Carlo runs: \d+ warnings?; first: linearisation breaks down/);
    expect(text).toMatch(/- linearisation breaks down at [\d.]+ s: /);
    const other = await runCli(['report', fixturePath('linear-gnss'), '--format', 'md', '--simulation', sim]);
    expect(other.code).toBe(2);
    expect(other.err).toMatch(/--simulation .*close-landmark\.json: was simulated from another version of the budget/);
    const part = join(mkdtempSync(join(tmpdir(), 'sl-mc-report-')), 'part.json');
    writeFileSync(part, JSON.stringify({ ...JSON.parse(readFileSync(sim, 'utf8')), format: 'sigma-ledger-simulation-part' }));
    expect((await runCli(['report', fixturePath('close-landmark'), '--simulation', part])).err).toMatch(/part of a sharded study: combine the parts/);
    const broken = JSON.parse(readFileSync(sim, 'utf8'));
    broken.quantities[0].rms.pop();
    writeFileSync(part, JSON.stringify(broken));
    expect((await runCli(['report', fixturePath('close-landmark'), '--simulation', part])).err).toMatch(/quantities\[0\]\.rms: must be \d+ numbers/);
  }, 300_000);
});
