/**
 * Writes a budget document the one way Sigma Ledger writes it, so saving an
 * unchanged file changes nothing and a one-cell edit is a one-line diff:
 * keys in the schema's order (named values in the user's order), 2-space
 * indentation, every `{ value, unit }` pair on one line, a final newline.
 */
import type { BudgetDocument } from './budget-document';
import { BUDGET_SCHEMA, resolveRef, type SchemaNode } from './budget-schema';

const INDENT = '  ';

/** Definitions printed on one line: small and read as one thing. */
const INLINE_DEFINITIONS = new Set(['quantity']);

/** Keys of `value` in the order the schema lists them; keys the schema does not know keep their order, last. */
function orderedKeys(value: Record<string, unknown>, node: SchemaNode): string[] {
  const present = Object.keys(value).filter((k) => value[k] !== undefined);
  if (!node.properties) return present;
  const known = Object.keys(node.properties).filter((k) => present.includes(k));
  return [...known, ...present.filter((k) => !known.includes(k))];
}

/** The schema node for the value under `key` of an object described by `node`. */
function childNode(node: SchemaNode, key: string): SchemaNode {
  const own = node.properties?.[key];
  if (own) return own;
  return typeof node.additionalProperties === 'object' ? node.additionalProperties : {};
}

function printObject(value: Record<string, unknown>, node: SchemaNode, inline: boolean, indent: string): string {
  const keys = orderedKeys(value, node);
  if (keys.length === 0) return '{}';
  const inner = indent + INDENT;
  const entries = keys.map((k) => `${JSON.stringify(k)}: ${printValue(value[k], childNode(node, k), inline ? '' : inner)}`);
  return inline ? `{ ${entries.join(', ')} }` : `{\n${inner}${entries.join(`,\n${inner}`)}\n${indent}}`;
}

function printArray(value: unknown[], node: SchemaNode, indent: string): string {
  if (value.length === 0) return '[]';
  const inner = indent + INDENT;
  const items = value.map((item) => printValue(item, node.items ?? {}, inner));
  return `[\n${inner}${items.join(`,\n${inner}`)}\n${indent}]`;
}

function printValue(value: unknown, schemaNode: SchemaNode, indent: string): string {
  const { node, definition } = resolveRef(schemaNode);
  if (Array.isArray(value)) return printArray(value, node, indent);
  if (value !== null && typeof value === 'object') {
    return printObject(value as Record<string, unknown>, node, definition !== undefined && INLINE_DEFINITIONS.has(definition), indent);
  }
  return JSON.stringify(value);
}

/**
 * The canonical text of a document: parsing a canonical file and writing it
 * again gives the same bytes. Keys whose value is `undefined` are left out,
 * as `JSON.stringify` does. Throws nothing for a document that passed
 * {@link parseBudgetDocument}.
 */
export function serializeBudgetDocument(doc: BudgetDocument): string {
  return `${printValue(doc, BUDGET_SCHEMA, '')}\n`;
}
