/**
 * The published JSON Schema of budget documents (`budgets/budget.schema.json`),
 * imported rather than copied so editors and this code can never disagree,
 * and its compiled validator.
 */
import Ajv, { type ValidateFunction } from 'ajv';
import schemaJson from '../../budgets/budget.schema.json' with { type: 'json' };

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

let compiled: ValidateFunction | undefined;

/**
 * The schema's validator, compiled on first use (a few milliseconds) and
 * kept. Stops at the first error; `verbose` keeps the failing schema node
 * so messages can quote its description.
 * @throws Error only if the schema file itself is broken (a test guards this).
 */
export function budgetValidator(): ValidateFunction {
  // Union types (a cell is a number or a formula text) are deliberate, so strict mode allows them.
  compiled ??= new Ajv({ allowUnionTypes: true, verbose: true }).compile(BUDGET_SCHEMA);
  return compiled;
}

/** The schema node a `$ref` such as `#/definitions/quantity` points at, and its definition name. */
export function resolveRef(node: SchemaNode): { node: SchemaNode; definition?: string } {
  if (!node.$ref) return { node };
  const definition = node.$ref.replace('#/definitions/', '');
  const target = BUDGET_SCHEMA.definitions[definition];
  if (!target) throw new Error(`budget schema: unresolved $ref ${node.$ref}`);
  return { node: target, definition };
}
