import Ajv from 'ajv';
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { BUDGET_SCHEMA, budgetValidator } from '../../src/document';
import type { SchemaNode } from '../../src/document/budget-schema';
import { LEVELS, QUANTITY_NAMES } from '../../src/budget/levels';
import { SENSOR_KIND_NAMES } from '../../src/sensors/registry';
import { SOURCE_KIND_NAMES } from '../../src/sources/registry';
import { INERTIAL_SENSOR_KINDS } from '../../src/document/inertial-document';
import { INERTIAL_REQUIREMENT_QUANTITIES } from '../../src/inertial/inertial-quantities';
import { minimalDocument } from './minimal-document';

const defs = BUDGET_SCHEMA.definitions;

/** Every node of the schema that has `properties`, with its path in the schema. */
function objectNodes(node: SchemaNode, path: string): [string, SchemaNode][] {
  const own: [string, SchemaNode][] = node.properties ? [[path, node]] : [];
  const children = Object.entries(node.properties ?? {}).flatMap(([k, v]) => objectNodes(v, `${path}.${k}`));
  return [...own, ...children];
}

describe('the published budget schema', () => {
  it('is the file in budgets/, imported rather than copied', () => {
    const onDisk = JSON.parse(readFileSync(new URL('../../budgets/budget.schema.json', import.meta.url), 'utf8'));
    expect(BUDGET_SCHEMA).toEqual(onDisk);
  });

  it('is draft-07, which ajv 8 reads by default, and compiles in strict mode', () => {
    expect(BUDGET_SCHEMA.$schema).toBe('http://json-schema.org/draft-07/schema#');
    expect(() => new Ajv({ strict: true, allowUnionTypes: true }).compile(BUDGET_SCHEMA)).not.toThrow();
  });

  it('accepts the minimal document', () => {
    expect(budgetValidator()(minimalDocument())).toBe(true);
  });

  it('describes every property', () => {
    const nodes = [['', BUDGET_SCHEMA] as [string, SchemaNode], ...Object.entries(defs).flatMap(([name, node]) => objectNodes(node, `definitions.${name}`))];
    const undescribed = nodes.flatMap(([path, node]) =>
      Object.entries(node.properties ?? {}).filter(([, p]) => typeof p.description !== 'string').map(([k]) => `${path}.${k}`));
    expect(undescribed).toEqual([]);
  });

  it('lists the kinds and levels the engine knows', () => {
    // Both models' kinds and quantities, planar first (src/document/model-keys.ts tells them apart).
    expect(defs.sensor.properties!.kind.enum).toEqual([...new Set([...SENSOR_KIND_NAMES, ...INERTIAL_SENSOR_KINDS])]);
    expect(defs.source.properties!.kind.enum).toEqual(SOURCE_KIND_NAMES);
    expect(defs.requirement.properties!.quantity.enum).toEqual([...new Set([...QUANTITY_NAMES, ...INERTIAL_REQUIREMENT_QUANTITIES])]);
    expect(defs.requirement.properties!.level.enum).toEqual(LEVELS);
  });

  it('allows every form option of a row the engine reads', () => {
    // The engine's SourceInput fields besides id, kind and the quantities (src/inputs/budget-input.ts).
    const options = ['biasForm', 'densitySides', 'quantum', 'multipathModel', 'component', 'provenance', 'assumed'];
    expect(Object.keys(defs.source.properties!)).toEqual(expect.arrayContaining(options));
  });
});
