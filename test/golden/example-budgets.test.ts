import { describe, expect, it } from 'vitest';
import { readFileSync, readdirSync, writeFileSync } from 'node:fs';
import { main } from '../../src/cli/main';

/**
 * Every budget in budgets/ is a golden test of its summary: the checked-in
 * text is compared line by line, so any change in numbers shows in review.
 * After a deliberate change, regenerate with UPDATE_GOLDEN=1 npx vitest run test/golden
 * and read the diff before committing it.
 */
const budgets = readdirSync('budgets').filter((f) => f.endsWith('.json') && !f.endsWith('.schema.json'));

describe.each(budgets)('budgets/%s', (file) => {
  it('prints the checked-in summary', async () => {
    let out = '', err = '';
    const code = await main(['run', `budgets/${file}`], { out: (t) => (out += t), err: (t) => (err += t) });
    expect(err).toBe('');
    expect([0, 1]).toContain(code);
    const golden = `test/golden/${file.replace(/\.json$/, '')}.summary.txt`;
    if (process.env.UPDATE_GOLDEN) writeFileSync(golden, out);
    expect(out).toBe(readFileSync(golden, 'utf8'));
  });
});
