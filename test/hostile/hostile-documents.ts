/**
 * The hostile corpus's harness (not a test file): each case is the valid
 * base of the malformed corpus (test/malformed/valid-base.json) with a few
 * fields changed, written to a scratch folder and given to the command line
 * and to the page's compute path. A case passes when both refuse it naming
 * the exact field, without a stack trace, and the file is left as written.
 */
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { expect } from 'vitest';
import { parseBudgetDocument } from '../../src/document';
import { computeView } from '../../src/report/view-result';
import { hasStackTrace, runCli } from '../cli/run-cli';

const BASE_FILE = join(dirname(fileURLToPath(import.meta.url)), '..', 'malformed', 'valid-base.json');

/** A fresh copy of the valid base document, as plain JSON. */
export function baseDocument(): any {
  return JSON.parse(readFileSync(BASE_FILE, 'utf8'));
}

/** Sets `doc` at a path such as `sensors[2].rate.value` (the parent must exist). */
export function setAt(doc: any, path: string, value: unknown): void {
  const keys = path.split(/\.|\[(\d+)\]/).filter((k) => k !== undefined && k !== '');
  let at = doc;
  for (const k of keys.slice(0, -1)) at = at[k];
  at[keys[keys.length - 1]] = value;
}

/** The base with `changes` applied (path -> value). */
export function patched(changes: Record<string, unknown>): any {
  const doc = baseDocument();
  for (const [path, value] of Object.entries(changes)) setAt(doc, path, value);
  return doc;
}

const scratch = mkdtempSync(join(tmpdir(), 'sigma-ledger-hostile-'));

/** Writes text (or a document) to the scratch folder; returns its path. */
export function writeCase(name: string, content: string | Buffer | object): string {
  const file = join(scratch, name);
  writeFileSync(file, typeof content === 'object' && !Buffer.isBuffer(content) ? JSON.stringify(content, null, 1) : content);
  return file;
}

/** Escapes a literal path for a regular expression. */
export function literal(text: string): RegExp {
  return new RegExp(text.replace(/[.*+?^${}()|[\]\\]/g, '\\$&'));
}

/**
 * Asserts that `run` and `check` refuse the document with exit code 2, a
 * message matching `field: ...` (and `detail` when given), no stack trace,
 * and the file unchanged afterwards.
 */
export async function expectCliRefusal(name: string, doc: object | string, field: string, detail?: RegExp): Promise<string> {
  const file = writeCase(name, doc);
  const before = readFileSync(file);
  const run = await runCli(['run', file]);
  expect(run.code, run.err).toBe(2);
  expect(run.err).toMatch(literal(`${field}: `));
  if (detail) expect(run.err).toMatch(detail);
  expect(hasStackTrace(run.err)).toBe(false);
  const check = await runCli(['check', file]);
  expect(check.code).toBe(2);
  expect(check.err).toMatch(literal(`${field}: `));
  expect(readFileSync(file).equals(before)).toBe(true);
  return run.err;
}

/**
 * Asserts that the page's compute path (the worker's computeView) reports
 * the problem at `field`, either as the reason nothing was computed or as a
 * cell error in place, and leaves the document as typed.
 */
export function expectViewRefusal(doc: object, field: string): void {
  const text = JSON.stringify(doc);
  const { document } = parseBudgetDocument(text, 'case.json');
  const view = computeView(document);
  const places = [view.blocked?.path, ...view.cellErrors.map((e) => e.location.path)];
  expect(places.some((p) => p === field || p?.startsWith(`${field}.`)), JSON.stringify({ blocked: view.blocked, errors: view.cellErrors })).toBe(true);
  expect(JSON.stringify(document)).toBe(JSON.stringify(JSON.parse(text)));
}
