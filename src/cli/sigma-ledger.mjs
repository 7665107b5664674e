#!/usr/bin/env node
// Launcher for the `sigma-ledger` command: Node 20 cannot run TypeScript, so
// register tsx's loader and hand over to the TypeScript entry point. A fault
// that escapes main (or a failure to load it) is an internal error: exit 3,
// with the stack trace only under --debug (see internal-error.ts).
import { register } from 'tsx/esm/api';

register();
try {
  const { main } = await import('./main.ts');
  process.exitCode = await main(process.argv.slice(2));
} catch (e) {
  const { reportInternalError, wantsDebug } = await import('./internal-error.ts');
  process.exitCode = reportInternalError(e, wantsDebug(process.argv), (t) => process.stderr.write(t));
}
