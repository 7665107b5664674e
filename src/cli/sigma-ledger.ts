#!/usr/bin/env node
/**
 * The `sigma-ledger` command, compiled to dist/src/cli/sigma-ledger.js (the
 * package's `bin`) so it starts under plain node. A reader that closes the
 * pipe early (`| head`) ends the command quietly instead of with an EPIPE
 * stack trace.
 */
import { main } from './main';

process.stdout.on('error', (e: NodeJS.ErrnoException) => {
  if (e.code === 'EPIPE') process.exit(0);
  throw e;
});
process.exitCode = await main(process.argv.slice(2));
