import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { registryEnums, withRegistryEnums } from '../../src/schema/registry-enums';
import { BUDGET_SCHEMA } from '../../src/document/budget-schema';

const SCHEMA_PATH = 'budgets/budget.schema.json';

describe('the budget schema enums come from the registries', () => {
  it('the committed schema equals the one generated from the registries (run `npm run schema` if not)', () => {
    const committed = readFileSync(SCHEMA_PATH, 'utf8');
    expect(withRegistryEnums(committed)).toBe(committed);
  });

  it('the generator rewrites a stale enum and nothing else', () => {
    const committed = readFileSync(SCHEMA_PATH, 'utf8');
    const stale = committed.replace('"enum": ["yaw-gyro"', '"enum": ["old-kind", "yaw-gyro"');
    expect(stale).not.toBe(committed);
    expect(withRegistryEnums(stale)).toBe(committed);
  });

  it('every generated enum lands on its own property', () => {
    for (const e of registryEnums()) {
      const node = BUDGET_SCHEMA.definitions[e.definition].properties![e.property];
      expect(node.enum, `${e.definition}.${e.property}`).toEqual(e.values);
    }
  });
});
