/**
 * Every document of the malformed corpus (test/malformed/) is refused by
 * `run` and `check` with exit code 2 and a message that names the file and
 * the field, never with a stack trace. test/malformed/expected.json maps
 * each file to a pattern its message must match.
 */
import { closeSync, ftruncateSync, mkdtempSync, openSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { MAX_TEXT_CHARS } from '../../src/document';
import { hasStackTrace, runCli } from './run-cli';

const CORPUS = join(dirname(fileURLToPath(import.meta.url)), '..', 'malformed');
const BASE = 'valid-base.json';
/** The base document meets both its requirements, which are loose by construction. */
const BASE_EXIT = 0;
const BASE_EXIT_WHY = 'heading 2σ ≤ 5 deg while the start is known to 1 deg (2σ = 2 deg, the worst); position 95 % ≤ 5 m with GNSS aiding';
const INDEX_FILE = 'expected.json';
const INDEX: Record<string, string> = JSON.parse(readFileSync(join(CORPUS, INDEX_FILE), 'utf8'));
const NAMES = Object.keys(INDEX);

/** Documents too large to commit: each is written to a temporary folder before the tests run. */
const GENERATED: Record<string, (file: string) => void> = {
  'oversize.json': (file) => {
    const doc = JSON.parse(readFileSync(join(CORPUS, BASE), 'utf8'));
    doc.description = 'x'.repeat(MAX_TEXT_CHARS);
    writeFileSync(file, JSON.stringify(doc));
  },
  // A sparse file: its size is over the byte limit, but no disk space is used and nothing is read.
  'oversize-bytes.json': (file) => {
    const fd = openSync(file, 'w');
    ftruncateSync(fd, 4 * MAX_TEXT_CHARS + 1);
    closeSync(fd);
  },
};

const scratch = mkdtempSync(join(tmpdir(), 'sigma-ledger-malformed-'));
const pathOf = (name: string) => join(name in GENERATED ? scratch : CORPUS, name);

beforeAll(() => {
  for (const [name, write] of Object.entries(GENERATED)) write(join(scratch, name));
});
afterAll(() => rmSync(scratch, { recursive: true, force: true }));

describe('the malformed corpus', () => {
  it('holds at least 60 malformed documents', () => {
    expect(NAMES.length).toBeGreaterThanOrEqual(60);
  });

  it('lists every JSON file of its folder in the index', () => {
    const files = readdirSync(CORPUS).filter((f) => f.endsWith('.json') && f !== BASE && f !== INDEX_FILE);
    expect(files.filter((f) => !(f in INDEX))).toEqual([]);
  });

  it('has a file in its folder, or a generator, for every entry of the index', () => {
    const files = new Set(readdirSync(CORPUS));
    expect(NAMES.filter((n) => !files.has(n) && !(n in GENERATED))).toEqual([]);
  });

  it('has patterns that all compile as regular expressions', () => {
    for (const name of NAMES) expect(() => new RegExp(INDEX[name]), name).not.toThrow();
  });

  it('is based on a valid document that runs cleanly', async () => {
    const r = await runCli(['run', join(CORPUS, BASE)]);
    expect(r.err).toBe('');
    expect(r.code, BASE_EXIT_WHY).toBe(BASE_EXIT);
  });
});

describe.each(NAMES)('the malformed document %s', (name) => {
  it('is refused by run with exit code 2 and a message naming the file and the field', async () => {
    const r = await runCli(['run', pathOf(name)]);
    expect(r.code).toBe(2);
    expect(r.err).toContain(name);
    expect(r.err).toMatch(new RegExp(INDEX[name]));
    expect(hasStackTrace(r.err)).toBe(false);
    // Cell errors still let the rest compute; the summary then says it is partial.
    if (r.out !== '') expect(r.out).toContain('(PARTIAL: cells with errors were left out)');
  });

  it('is refused by check with exit code 2 and a message naming the file', async () => {
    const r = await runCli(['check', pathOf(name)]);
    expect(r.code).toBe(2);
    expect(r.err).toContain(name);
    expect(hasStackTrace(r.err)).toBe(false);
    expect(r.out).toBe('');
  });
});
