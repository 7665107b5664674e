/**
 * What the command line says when Sigma Ledger itself fails (a bug, not bad
 * input): one line naming the fault and how to get details, exit code 3;
 * the stack trace only when `--debug` is given.
 */
import { EXIT } from './exit-codes';

/** The option that asks for stack traces. */
export const DEBUG_OPTION = '--debug';

/** True when the arguments ask for stack traces (read before option parsing, so it works even when that fails). */
export function wantsDebug(argv: readonly string[]): boolean {
  return argv.includes(DEBUG_OPTION);
}

/** Reports an unexpected error on `err`; returns {@link EXIT.internalError}. Throws nothing. */
export function reportInternalError(e: unknown, debug: boolean, err: (text: string) => void): number {
  const what = e instanceof Error ? `${e.name}: ${e.message}` : String(e);
  err(`internal error: ${what}\nThis is a fault of sigma-ledger, not of your file; please report it${debug ? '' : ` (run again with ${DEBUG_OPTION} for the stack trace)`}.\n`);
  if (debug && e instanceof Error && e.stack) err(`${e.stack}\n`);
  return EXIT.internalError;
}
