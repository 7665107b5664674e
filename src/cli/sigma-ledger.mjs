#!/usr/bin/env node
// Launcher for the `sigma-ledger` command: Node 20 cannot run TypeScript, so
// register tsx's loader and hand over to the TypeScript entry point.
import { register } from 'tsx/esm/api';

register();
const { main } = await import('./main.ts');
process.exitCode = await main(process.argv.slice(2));
