/**
 * The published JSON Schema of budget documents (`budgets/budget.schema.json`),
 * imported rather than copied so editors and this code can never disagree,
 * and its validator, compiled ahead of time (budget-validator.generated.ts).
 */
import type { ValidateFunction } from 'ajv';
import schemaJson from '../../budgets/budget.schema.json' with { type: 'json' };
import { validate as precompiled } from './budget-validator.generated';

/** A JSON Schema node, as far as this code walks it. */
export interface SchemaNode {
  $ref?: string;
  description?: string;
  type?: string | string[];
  properties?: Record<string, SchemaNode>;
  additionalProperties?: boolean | SchemaNode;
  items?: SchemaNode;
  [keyword: string]: unknown;
}

/** The schema (draft-07). Its `properties` order is the order in which documents are written. */
export const BUDGET_SCHEMA: SchemaNode & { definitions: Record<string, SchemaNode> } = schemaJson as never;

/**
 * The schema's validator: ajv's standalone code, generated from the schema by
 * test/tools/write-budget-validator.mjs (`npm run schema`, `npm run build`), so
 * nothing is compiled at run time (no start-up cost, no `new Function` for the
 * page's Content-Security-Policy to allow). Stops at the first error;
 * `verbose` keeps the failing schema node so messages can quote its
 * description. test/document/budget-validator.test.ts checks that it is
 * current and gives what ajv's runtime compilation gives.
 */
export function budgetValidator(): ValidateFunction {
  return precompiled as ValidateFunction;
}

/** The schema node a `$ref` such as `#/definitions/quantity` points at, and its definition name. */
export function resolveRef(node: SchemaNode): { node: SchemaNode; definition?: string } {
  if (!node.$ref) return { node };
  const definition = node.$ref.replace('#/definitions/', '');
  const target = BUDGET_SCHEMA.definitions[definition];
  if (!target) throw new Error(`budget schema: unresolved $ref ${node.$ref}`);
  return { node: target, definition };
}
