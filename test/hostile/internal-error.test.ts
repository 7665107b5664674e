/**
 * An internal error (a fault of the tool, not of the file) exits 3, never 1
 * (a requirement fails) or 2 (bad input), with one line and no stack trace
 * unless --debug is given.
 */
import { describe, expect, it } from 'vitest';
import { main } from '../../src/cli/main';
import { EXIT } from '../../src/cli/exit-codes';
import { hasStackTrace } from '../cli/run-cli';

/** Runs main with a stdout that fails as a broken stream would (a fault outside any input). */
async function withFailingOutput(argv: string[]): Promise<{ code: number; err: string }> {
  let err = '';
  const code = await main(argv, { out: () => { throw new TypeError('stdout went away'); }, err: (t) => { err += t; } });
  return { code, err };
}

describe('an internal error', { timeout: 60_000 }, () => {
  it('exits 3 with one line and no stack trace', async () => {
    const r = await withFailingOutput(['run', 'test/malformed/valid-base.json']);
    expect(r.code).toBe(EXIT.internalError);
    expect(r.code).toBe(3);
    expect(r.err).toMatch(/^internal error: TypeError: stdout went away\nThis is a fault of sigma-ledger, not of your file; please report it \(run again with --debug for the stack trace\)\.\n$/);
    expect(hasStackTrace(r.err)).toBe(false);
  });

  it('prints the stack trace with --debug', async () => {
    const r = await withFailingOutput(['run', 'test/malformed/valid-base.json', '--debug']);
    expect(r.code).toBe(3);
    expect(hasStackTrace(r.err)).toBe(true);
  });

  it('is listed in the usage text', async () => {
    let out = '';
    await main(['help'], { out: (t) => { out += t; }, err: () => undefined });
    expect(out).toContain('3 internal error');
  });
});
