import { describe, expect, it } from 'vitest';
import { readdirSync, readFileSync } from 'node:fs';
import Ajv from 'ajv';
import { main } from '../../src/cli/main';

/**
 * The published result schema (budgets/result.schema.json) describes what
 * `run --json` prints: every example budget's output validates against it
 * (ajv, draft-07), and the schema refuses an output with a key it does not know.
 */
const schema = JSON.parse(readFileSync('budgets/result.schema.json', 'utf8'));
const validate = new Ajv({ allErrors: true, strict: true }).compile(schema);
const budgets = readdirSync('budgets').filter((f) => f.endsWith('.json') && !f.endsWith('.schema.json'));

async function runJson(file: string): Promise<unknown> {
  let out = '';
  await main(['run', `budgets/${file}`, '--json', '--every', '20'], { out: (t) => (out += t), err: () => {} });
  return JSON.parse(out);
}

describe('result schema', () => {
  it('has an $id, as the budget schema does', () => {
    expect(schema.$id).toMatch(/result\.schema\.json$/);
    expect(JSON.parse(readFileSync('budgets/budget.schema.json', 'utf8')).$id).toMatch(/budget\.schema\.json$/);
  });

  it.each(budgets)('validates the run --json output of budgets/%s', async (file) => {
    const result = await runJson(file);
    expect(validate(result) ? [] : validate.errors).toEqual([]);
  }, 30_000);

  it('refuses a result with an unknown key or a wrong verdict', async () => {
    const result = (await runJson('orchard-rover.json')) as { requirements: { verdict: string }[]; extra?: number };
    expect(validate({ ...result, extra: 1 })).toBe(false);
    result.requirements[0].verdict = 'maybe';
    expect(validate(result)).toBe(false);
  }, 30_000);
});
