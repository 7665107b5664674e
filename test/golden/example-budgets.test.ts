import { describe, expect, it } from 'vitest';
import { readFileSync, readdirSync, writeFileSync } from 'node:fs';
import { main } from '../../src/cli/main';

/**
 * Every budget in budgets/ is a golden test of its summary: the checked-in
 * text is compared line by line, so any change in numbers shows in review.
 * After a deliberate change, regenerate with UPDATE_GOLDEN=1 npx vitest run test/golden
 * and read the diff before committing it. Under CI (CI set) UPDATE_GOLDEN is
 * refused: a test run must never rewrite what it checks.
 */
const budgets = readdirSync('budgets').filter((f) => f.endsWith('.json') && !f.endsWith('.schema.json'));

/** The exit code each example is written to give, and why (README's table of examples). */
const EXPECTED_EXIT: Record<string, { code: number; why: string }> = {
  'annotated-example.json': { code: 0, why: 'both requirements hold (its summary: greenhouse position and heading PASS)' },
  'harbour-launch.json': { code: 0, why: 'both heading requirements hold under the bridge (its summary: PASS, PASS)' },
  'orchard-rover.json': { code: 1, why: 'the cross-track requirement breaks on purpose in the 90 s canopy outage (README)' },
  'warehouse-tug.json': { code: 1, why: 'lane keeping breaks 39 s after the pallets hide the reflectors (its summary)' },
  'survey-drone.json': { code: 0, why: '3-D: R95 drift in the quarry-face outage, height and yaw all hold (its summary: PASS x3)' },
};

describe('golden summaries', () => {
  it('have an expected exit code for every example budget', () => {
    expect(Object.keys(EXPECTED_EXIT).sort()).toEqual([...budgets].sort());
  });

  it('refuse UPDATE_GOLDEN under CI', () => {
    expect(process.env.CI && process.env.UPDATE_GOLDEN ? 'UPDATE_GOLDEN set under CI' : 'ok').toBe('ok');
  });
});

describe.each(budgets)('budgets/%s', (file) => {
  it('prints the checked-in summary and its expected exit code', async () => {
    let out = '', err = '';
    const code = await main(['run', `budgets/${file}`], { out: (t) => (out += t), err: (t) => (err += t) });
    expect(err).toBe('');
    expect(code, EXPECTED_EXIT[file]?.why).toBe(EXPECTED_EXIT[file]?.code);
    const golden = `test/golden/${file.replace(/\.json$/, '')}.summary.txt`;
    if (process.env.UPDATE_GOLDEN && !process.env.CI) writeFileSync(golden, out);
    expect(out).toBe(readFileSync(golden, 'utf8'));
  });
});
