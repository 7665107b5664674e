/**
 * Runs the command line in-process and collects what it writes, for the
 * CLI tests. Not a test file itself.
 */
import { main } from '../../src/cli/main';

/** What one command-line call produced. */
export interface CliResult {
  code: number;
  out: string;
  err: string;
}

/** Calls `main(argv)` with streams that collect stdout and stderr. */
export async function runCli(argv: string[]): Promise<CliResult> {
  let out = '';
  let err = '';
  const code = await main(argv, { out: (t) => { out += t; }, err: (t) => { err += t; } });
  return { code, out, err };
}

/** True when `text` holds a line of a JavaScript stack trace. */
export function hasStackTrace(text: string): boolean {
  return /^ {4}at /m.test(text);
}
