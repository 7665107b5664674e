/**
 * Turns the validator's first complaint into a path in the document's own
 * terms and a sentence that says how to fix it
 * ("sensors[2].sources[1].value: must be a number or a formula starting with '='").
 */
import type { ErrorObject } from 'ajv';
import { joinPath } from '../errors';
import type { SchemaNode } from './budget-schema';

/** A located problem, ready for a BudgetFileError. */
export interface SchemaProblem {
  path: string;
  message: string;
}

/** JSON pointer (`/sensors/2/id`) to path (`sensors[2].id`), using the data to tell list indices from keys. */
export function pointerToPath(pointer: string, data: unknown): string {
  let path = '';
  let at: unknown = data;
  for (const raw of pointer.split('/').slice(1)) {
    const key = raw.replace(/~1/g, '/').replace(/~0/g, '~');
    const isIndex = Array.isArray(at);
    path = isIndex ? joinPath(path, Number(key)) : joinPath(path, key);
    at = at !== null && typeof at === 'object' ? (at as Record<string, unknown>)[key] : undefined;
  }
  return path;
}

const TYPE_WORDS: Record<string, string> = {
  string: 'a text', number: 'a number', integer: 'a whole number', boolean: 'true or false', array: 'a list', object: 'an object',
};

/** The JSON type of a value, in words. */
function describeValue(value: unknown): string {
  if (Array.isArray(value)) return 'a list';
  if (value === null) return 'null';
  if (typeof value === 'string') return `the text ${JSON.stringify(value.length > 40 ? `${value.slice(0, 40)}…` : value)}`;
  if (typeof value === 'object') return 'an object';
  if (typeof value === 'number' && !Number.isFinite(value)) return 'a number too large for double precision';
  return JSON.stringify(value);
}

const CELL_MESSAGE = "must be a number or a formula starting with '='";

/** Messages for the keywords a cell can fail on. */
function cellMessage(e: ErrorObject): string {
  if (e.keyword === 'maxLength') return `the formula is longer than ${String(e.params.limit)} characters; split it using named values`;
  if (e.keyword === 'minLength') return `${CELL_MESSAGE}, and a formula needs something after '='`;
  return `${CELL_MESSAGE}, got ${describeValue(e.data)}`;
}

/** Messages for a text that does not fit its pattern. */
function patternMessage(e: ErrorObject): string {
  if (e.schemaPath.startsWith('#/definitions/id/')) {
    return `must be an id: a letter, then letters, digits or "_" (at most 64 characters); got ${describeValue(e.data)}`;
  }
  return `got ${describeValue(e.data)}, which does not match the pattern ${String(e.params.pattern)}`;
}

/** A schema description as a clause: "Where the number came from." -> "where the number came from". */
function asClause(description: string): string {
  return description.charAt(0).toLowerCase() + description.slice(1).replace(/\.$/, '');
}

/** The sentence for one error, by keyword. */
function messageFor(e: ErrorObject): string {
  if (e.schemaPath.startsWith('#/definitions/cell/')) return cellMessage(e);
  const p = e.params as Record<string, unknown>;
  switch (e.keyword) {
    case 'type': {
      const types = ([] as string[]).concat(p.type as string | string[]);
      return `must be ${types.map((t) => TYPE_WORDS[t] ?? t).join(' or ')}, got ${describeValue(e.data)}`;
    }
    case 'enum': return `must be one of ${(p.allowedValues as unknown[]).map((v) => JSON.stringify(v)).join(', ')}; got ${describeValue(e.data)}`;
    case 'const': return `must be ${JSON.stringify(p.allowedValue)}, got ${describeValue(e.data)}`;
    case 'pattern': return patternMessage(e);
    case 'maxItems': return `has ${(e.data as unknown[]).length} entries; at most ${String(p.limit)} are allowed`;
    case 'minItems': return `needs at least ${String(p.limit)} ${p.limit === 1 ? 'entry' : 'entries'}`;
    case 'maxProperties': return `has ${Object.keys(e.data as object).length} entries; at most ${String(p.limit)} are allowed`;
    case 'maxLength': return `is ${(e.data as string).length} characters long; at most ${String(p.limit)} are allowed`;
    case 'minLength': return 'must not be empty';
    case 'not': return `${describeValue(e.data)} is not allowed here`;
    default: return e.message ?? 'is not valid here';
  }
}

/** A missing required key: the path of the key, and what it is for. */
function missingProblem(e: ErrorObject, path: string): SchemaProblem {
  const key = String(e.params.missingProperty);
  const property = (e.parentSchema as SchemaNode | undefined)?.properties?.[key];
  const what = property?.description ? ` (${asClause(property.description)})` : '';
  return { path: joinPath(path, key), message: `is missing; add it${what}` };
}

/** An unknown key: its path, and the keys allowed in that place. */
function unknownKeyProblem(e: ErrorObject, path: string): SchemaProblem {
  const key = String(e.params.additionalProperty);
  const allowed = Object.keys((e.parentSchema as SchemaNode | undefined)?.properties ?? {});
  return { path: joinPath(path, key), message: `"${key}" is not a key this format knows; the keys allowed here are ${allowed.join(', ')} (check the spelling)` };
}

/**
 * The first of `errors` (from the compiled validator, `verbose` on) as a
 * path and a plain sentence. Throws nothing.
 * @param data the validated document, to tell list indices from keys.
 */
export function describeSchemaErrors(errors: ErrorObject[], data: unknown): SchemaProblem {
  // The validator stops at the first failing keyword, so every error listed belongs to one failure; for a
  // bad key in `values` the inner pattern error comes first but only the propertyNames error names the key.
  const first = errors.find((e) => e.keyword === 'propertyNames') ?? errors[0];
  const path = pointerToPath(first.instancePath, data);
  if (first.keyword === 'required') return missingProblem(first, path);
  if (first.keyword === 'additionalProperties') return unknownKeyProblem(first, path);
  if (first.keyword === 'propertyNames') {
    const name = String(first.params.propertyName);
    return { path: joinPath(path, name), message: `"${name}" cannot be a name: use a letter or "_", then letters, digits or "_" (no dots or spaces, at most 64 characters), and not __proto__, constructor or prototype` };
  }
  return { path, message: messageFor(first) };
}
