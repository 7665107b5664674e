/**
 * The Node side of the page-against-CLI check: test/fixtures/simulation/
 * linear-gnss-seed-3-runs-130.json is what `sigma-ledger simulate` prints
 * for that fixture, seed 3, 130 runs (three blocks of runs), and
 * test/web/monte-carlo/page-vs-node.test.ts runs the page's workers on the
 * same budget and seed in Chromium and compares with it. This test
 * recomputes the file in Node, so it cannot go stale: it fails when the
 * engine's numbers change (rewrite it then with UPDATE_GOLDEN=1, never
 * under CI).
 */
import { readFileSync, writeFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { runCli } from '../cli/run-cli';
import { fixturePath } from './fixture-model';

export const PAGE_REFERENCE = fileURLToPath(new URL('../fixtures/simulation/linear-gnss-seed-3-runs-130.json', import.meta.url));

describe('the reference study the page is compared with', () => {
  it('is what sigma-ledger simulate prints now for linear-gnss, seed 3, 130 runs', async () => {
    const r = await runCli(['simulate', fixturePath('linear-gnss'), '--runs', '130', '--seed', '3', '--workers', '2', '--json', '--every', '20']);
    expect(r.code, r.err).toBe(0);
    const fresh = JSON.parse(r.out);
    // The budget's path differs between machines; the page compares everything else.
    delete fresh.budget.file;
    if (process.env.UPDATE_GOLDEN === '1' && !process.env.CI) writeFileSync(PAGE_REFERENCE, JSON.stringify(fresh, null, 1) + '\n');
    expect(fresh).toEqual(JSON.parse(readFileSync(PAGE_REFERENCE, 'utf8')));
  }, 300_000);
});
