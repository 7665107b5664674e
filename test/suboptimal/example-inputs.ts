import { readFileSync, readdirSync } from 'node:fs';
import { parseBudgetDocument } from '../../src/document';
import { evaluateBudgetDocument } from '../../src/sheet';
import type { BudgetInput } from '../../src/inputs/budget-input';

/** Every planar example budget in budgets/ (3-D ones have no planar input), evaluated to the engine's input (invented scenarios). */
export function exampleInputs(): [string, BudgetInput][] {
  return readdirSync('budgets')
    .filter((f) => f.endsWith('.json') && !f.endsWith('.schema.json'))
    .filter((f) => (JSON.parse(readFileSync(`budgets/${f}`, 'utf8')) as { model?: string }).model !== 'inertial')
    .map((f) => {
      const { document } = parseBudgetDocument(readFileSync(`budgets/${f}`, 'utf8'), f);
      return [f, evaluateBudgetDocument(document).input!] as [string, BudgetInput];
    });
}

/** The input with every row's `tuning` removed: the filter is the truth. */
export function withoutTuning(input: BudgetInput): BudgetInput {
  return { ...input, sensors: input.sensors.map((s) => ({ ...s, sources: s.sources.map(({ tuning: _t, ...row }) => row) })) };
}
