#!/usr/bin/env node
/**
 * The `sigma-ledger` command, bundled into dist/cli/sigma-ledger.js (the
 * package's `bin`) so it starts under plain node. A reader that closes the
 * pipe early (`| head`) ends the command quietly instead of with an EPIPE
 * stack trace.
 */
import { main } from './main';
import { reportInternalError, wantsDebug } from './internal-error';

process.stdout.on('error', (e: NodeJS.ErrnoException) => {
  if (e.code === 'EPIPE') process.exit(0);
  throw e;
});
try {
  process.exitCode = await main(process.argv.slice(2));
} catch (e) {
  // A fault that escapes main is an internal error: exit 3, the stack trace only under --debug.
  process.exitCode = reportInternalError(e, wantsDebug(process.argv), (t) => process.stderr.write(t));
}
