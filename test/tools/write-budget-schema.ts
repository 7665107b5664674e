/**
 * `npm run schema`: rewrites the registry-owned enums of
 * budgets/budget.schema.json from the sensor and source kinds, the quantity
 * table and the levels (src/schema/registry-enums.ts). Run it after adding
 * a kind; test/schema/registry-enums.test.ts fails until you do.
 */
import { readFileSync, writeFileSync } from 'node:fs';
import { withRegistryEnums } from '../../src/schema/registry-enums';

const path = 'budgets/budget.schema.json';
const before = readFileSync(path, 'utf8');
const after = withRegistryEnums(before);
JSON.parse(after);
if (after === before) console.log(`${path}: enums already match the registries`);
else {
  writeFileSync(path, after);
  console.log(`${path}: enums rewritten from the registries`);
}
