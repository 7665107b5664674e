/**
 * The budget validator compiled ahead of time (src/document/budget-validator.generated.ts,
 * ajv's standalone code) against the same schema compiled by ajv at run time, the way
 * it was before: same verdict and the same first error, field by field, on every
 * bundled budget, on every file of the malformed corpus, and on systematic damage of
 * the corpus's valid base (each field removed, or given a value of every other type).
 */
import Ajv from 'ajv';
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { BUDGET_SCHEMA, budgetValidator } from '../../src/document/budget-schema';
import { GENERATED_PATH, VALIDATOR_OPTIONS, generatedValidatorText } from '../tools/write-budget-validator.mjs';

const ROOT = new URL('../../', import.meta.url);
const runtime = new Ajv(VALIDATOR_OPTIONS).compile(BUDGET_SCHEMA);
const precompiled = budgetValidator();

/** JSON files of a folder that parse (the malformed corpus also has files that are not JSON). */
function jsonFiles(folder: string): [string, unknown][] {
  const dir = new URL(folder, ROOT);
  return readdirSync(dir).filter((f) => f.endsWith('.json') && f !== 'expected.json').flatMap((f): [string, unknown][] => {
    try {
      return [[`${folder}${f}`, JSON.parse(readFileSync(join(dir.pathname, f), 'utf8'))]];
    } catch {
      return [];
    }
  });
}

/** Every path of a JSON value (objects' keys and lists' indices). */
function paths(value: unknown, at: (string | number)[] = []): (string | number)[][] {
  if (value === null || typeof value !== 'object') return [];
  const keys = Array.isArray(value) ? value.map((_, i) => i) : Object.keys(value);
  return keys.flatMap((k) => [[...at, k], ...paths((value as Record<string | number, unknown>)[k], [...at, k])]);
}

/** A copy of `doc` with the field at `path` removed (`undefined`) or replaced. */
function damaged(doc: unknown, path: (string | number)[], replacement: unknown): unknown {
  const copy = structuredClone(doc) as Record<string | number, unknown>;
  let parent = copy;
  for (const k of path.slice(0, -1)) parent = parent[k] as Record<string | number, unknown>;
  const last = path[path.length - 1];
  if (replacement === undefined && !Array.isArray(parent)) delete parent[last];
  else parent[last] = replacement;
  return copy;
}

/** Verdict and errors of a validator on a value (errors are null after a pass). */
function outcome(validate: typeof runtime, value: unknown): { valid: boolean; errors: unknown } {
  const valid = validate(value);
  return { valid, errors: validate.errors ?? null };
}

describe('the precompiled budget validator', () => {
  it(`is what test/tools/write-budget-validator.mjs writes from the current schema (else run npm run schema)`, async () => {
    expect(readFileSync(new URL(GENERATED_PATH, ROOT), 'utf8')).toBe(await generatedValidatorText());
  });

  it('needs no code compiled at run time (the page drops unsafe-eval)', () => {
    const text = readFileSync(new URL(GENERATED_PATH, ROOT), 'utf8');
    expect(text).not.toMatch(/new Function|\beval\(|require\(/);
  });

  const corpus = [...jsonFiles('budgets/'), ...jsonFiles('test/malformed/')];

  it('reads a corpus of bundled budgets and malformed files, valid and not', () => {
    expect(corpus.length).toBeGreaterThan(100);
    const verdicts = corpus.map(([, doc]) => runtime(doc));
    expect(verdicts).toContain(true);
    expect(verdicts).toContain(false);
  });

  it('gives the runtime validator\'s verdict and first error on every file', () => {
    for (const [name, doc] of corpus) expect(outcome(precompiled, doc), name).toEqual(outcome(runtime, doc));
  });

  it('gives the runtime validator\'s verdict and first error on every field of the valid base, removed or retyped', () => {
    const base = JSON.parse(readFileSync(new URL('test/malformed/valid-base.json', ROOT), 'utf8'));
    const replacements = [undefined, null, 'text', '=x', -1, 0.5, true, [], {}, ''.padEnd(3000, 'a')];
    let invalid = 0, checked = 0;
    for (const path of paths(base)) {
      for (const r of replacements) {
        const doc = damaged(base, path, r);
        const expected = outcome(runtime, doc);
        expect(outcome(precompiled, doc), `${path.join('.')} = ${JSON.stringify(r)?.slice(0, 20)}`).toEqual(expected);
        checked += 1;
        if (!expected.valid) invalid += 1;
      }
    }
    expect(checked).toBeGreaterThan(1000);
    expect(invalid).toBeGreaterThan(checked / 2);
  });
});
