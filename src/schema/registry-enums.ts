/**
 * The enums of the published budget schema (budgets/budget.schema.json) that
 * come from the registries: sensor and source kinds, the model options the
 * kinds declare, the quantities and the levels. The schema file is written
 * by hand except for these arrays; `npm run schema` rewrites them in place
 * (keeping the file's layout, so diffs stay small), and
 * test/schema/registry-enums.test.ts fails when the committed file differs
 * from what the registries say.
 *
 * Why generate the file rather than patch the schema at load: editors read
 * the file, so its enums must be right on disk; a test that compares the file
 * with the registries keeps the two from drifting.
 */
import { LEVELS } from '../budget/levels';
import { QUANTITY_NAMES } from '../inputs/quantities';
import { SENSOR_KIND_NAMES, SENSOR_KINDS } from '../sensors/registry';
import { SOURCE_KIND_NAMES, SOURCE_KINDS } from '../sources/registry';
import type { OptionField, RowOptionSpec } from '../sources/source-kind';
import { INERTIAL_SENSOR_KINDS } from '../document/inertial-document';
import { INERTIAL_REQUIREMENT_QUANTITIES } from '../inertial/inertial-quantities';

/** Both models' values, planar first, each once (the schema describes both; src/document/model-keys.ts tells them apart). */
const bothModels = (planar: readonly string[], inertial: readonly string[]) => [...new Set([...planar, ...inertial])];

/** One generated enum: where it sits in the schema and its values. */
export interface RegistryEnum {
  definition: string;
  property: string;
  values: readonly string[];
}

function optionChoices(field: OptionField): string[] {
  const specs: (RowOptionSpec | undefined)[] = [
    ...SOURCE_KIND_NAMES.map((k) => SOURCE_KINDS[k].option),
    ...SENSOR_KIND_NAMES.flatMap((k) => Object.values(SENSOR_KINDS[k].rowOptions ?? {})),
  ];
  return [...new Set(specs.filter((s) => s?.field === field).flatMap((s) => s!.choices.map((c) => c.value)))];
}

/** Every enum of the budget schema that the registries own, in a fixed order. Throws nothing. */
export function registryEnums(): RegistryEnum[] {
  const options: OptionField[] = ['biasForm', 'densitySides', 'quantum', 'multipathModel', 'component'];
  return [
    { definition: 'settings', property: 'level', values: LEVELS },
    { definition: 'sensor', property: 'kind', values: bothModels(SENSOR_KIND_NAMES, INERTIAL_SENSOR_KINDS) },
    { definition: 'source', property: 'kind', values: SOURCE_KIND_NAMES },
    ...options.map((field) => ({ definition: 'source', property: field, values: optionChoices(field) })),
    { definition: 'requirement', property: 'quantity', values: bothModels(QUANTITY_NAMES, INERTIAL_REQUIREMENT_QUANTITIES) },
    { definition: 'requirement', property: 'level', values: LEVELS },
  ];
}

/** Index of `needle` in `text` at or after `from`. @throws Error naming what is missing. */
function find(text: string, needle: string, from: number, what: string): number {
  const at = text.indexOf(needle, from);
  if (at < 0) throw new Error(`budget schema: ${what} not found (looked for ${needle})`);
  return at;
}

/**
 * The schema text with each registry enum's array replaced by the
 * registries' values, written on one line; everything else is kept byte for
 * byte. The enum must already exist in the property's node.
 * @throws Error when a definition, property or enum is missing.
 */
export function withRegistryEnums(schemaText: string): string {
  let text = schemaText;
  for (const e of registryEnums()) {
    const defs = find(text, '"definitions"', 0, 'the definitions');
    const def = find(text, `"${e.definition}": {`, defs, `definition ${e.definition}`);
    const props = find(text, '"properties"', def, `properties of ${e.definition}`);
    const prop = find(text, `"${e.property}": {`, props, `${e.definition}.${e.property}`);
    const start = find(text, '"enum": [', prop, `the enum of ${e.definition}.${e.property}`);
    const end = find(text, ']', start, `the end of the enum of ${e.definition}.${e.property}`);
    text = `${text.slice(0, start)}"enum": ${JSON.stringify(e.values).replaceAll('","', '", "')}${text.slice(end + 1)}`;
  }
  return text;
}
