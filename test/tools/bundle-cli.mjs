#!/usr/bin/env node
// The command line as the package's `bin` runs it: src/cli/sigma-ledger.ts and the
// simulation worker bundled by esbuild (https://esbuild.github.io/api/) into
// dist/cli/, one file per command (each command's loader in command-table.ts is a
// split point) and shared chunks, dependencies included. Loading the ~350 modules
// of the compiled tree one by one (HyperFormula alone is 198) was about a third of
// a trivial run's start-up; one bundle is read and compiled in one go. The library
// (`exports`) stays the tsc output in dist/src/, with its type declarations.
// Part of `npm run build`.
import { build } from 'esbuild';

await build({
  entryPoints: { 'sigma-ledger': 'src/cli/sigma-ledger.ts', 'simulate-worker': 'src/cli/simulate-worker.ts' },
  outdir: 'dist/cli',
  bundle: true,
  splitting: true,
  format: 'esm',
  platform: 'node',
  target: 'node20',
  // No source maps: the chunks are not minified, so a --debug stack trace reads as it is.
  // A bundled CommonJS dependency that calls require (papaparse for Node streams) gets Node's own.
  banner: { js: "import { createRequire as sigmaLedgerRequire } from 'node:module'; const require = sigmaLedgerRequire(import.meta.url);" },
  logLevel: 'warning',
});
