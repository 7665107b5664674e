// The package as a user gets it: `npm pack`, install the tarball into an empty
// folder (dependencies from the registry, --prefer-offline), then run the
// installed command and import the library there. Catches a file missing from
// `files`, a broken `bin` or `exports`, or a build step that did not run.
// Used by test/run-all.mjs; prints one line per check and returns the counts.
import { spawnSync } from 'node:child_process';
import { copyFileSync, existsSync, mkdirSync, mkdtempSync, readdirSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';

/** Runs the checks; returns { passed, failed }. */
export function packCheck() {
  let passed = 0, failed = 0;
  const check = (what, ok, detail = '') => {
    console.log(`${ok ? 'ok  ' : 'FAIL'} ${what}${ok || !detail ? '' : `\n${detail}`}`);
    if (ok) passed += 1;
    else failed += 1;
    return ok;
  };
  const folder = mkdtempSync(join(tmpdir(), 'sigma-pack-'));
  try {
    const pack = spawnSync('npm', ['pack', '--silent', '--pack-destination', folder], { encoding: 'utf8' });
    const tarball = readdirSync(folder).find((f) => f.endsWith('.tgz'));
    if (!check('npm pack makes a tarball', pack.status === 0 && tarball !== undefined, pack.stderr)) return { passed, failed };
    const app = join(folder, 'app');
    mkdirSync(app);
    writeFileSync(join(app, 'package.json'), JSON.stringify({ name: 'pack-check', private: true, type: 'module' }));
    const install = spawnSync('npm', ['install', '--prefer-offline', '--no-audit', '--no-fund', '--ignore-scripts', join(folder, tarball)], { cwd: app, encoding: 'utf8' });
    if (!check('the tarball installs into an empty folder', install.status === 0, install.stderr)) return { passed, failed };
    const budget = join(app, 'orchard-rover.json');
    copyFileSync(resolve('budgets/orchard-rover.json'), budget);
    const bin = join(app, 'node_modules', '.bin', 'sigma-ledger');
    const version = spawnSync(bin, ['--version'], { cwd: app, encoding: 'utf8' });
    check('the installed sigma-ledger prints its version', version.status === 0 && /^sigma-ledger \d+\.\d+\.\d+/.test(version.stdout), version.stderr);
    // Exit 1: the orchard rover's cross-track requirement fails on purpose (README).
    const run = spawnSync(bin, ['run', budget], { cwd: app, encoding: 'utf8' });
    check('the installed sigma-ledger runs a budget (exit 1: a requirement fails on purpose)', run.status === 1 && run.stdout.includes('[FAIL] alleyKeeping'), run.stderr);
    const script = [
      "import { readFileSync } from 'node:fs';",
      "import { analyseDocument } from 'sigma-ledger';",
      "const a = analyseDocument(readFileSync('orchard-rover.json', 'utf8'), { name: 'orchard-rover.json', report: { every: 100 } });",
      "console.log(a.report.format, a.report.requirements.map((r) => r.verdict).join(','));",
    ].join('\n');
    writeFileSync(join(app, 'use.mjs'), script);
    const use = spawnSync(process.execPath, ['use.mjs'], { cwd: app, encoding: 'utf8' });
    check("import { analyseDocument } from 'sigma-ledger' works", use.status === 0 && use.stdout.startsWith('sigma-ledger-result '), use.stderr);
    const installed = join(app, 'node_modules', 'sigma-ledger');
    check('the package holds its type declarations and both schemas', ['dist/src/index.d.ts', 'budgets/budget.schema.json', 'budgets/result.schema.json'].every((f) => existsSync(join(installed, f))));
    return { passed, failed };
  } finally {
    rmSync(folder, { recursive: true, force: true });
  }
}
