import { readFileSync } from 'node:fs';

/**
 * The version in the package's package.json, found by walking up from this
 * file (src/cli/ from source, dist/src/cli/ compiled, dist/cli/ bundled).
 * @returns the version, or "unknown" if no package.json of sigma-ledger is found.
 */
export function packageVersion(): string {
  for (let up = '../'; up.length <= 5 * 3; up += '../') {
    try {
      const pkg = JSON.parse(readFileSync(new URL(`${up}package.json`, import.meta.url), 'utf8')) as { name?: string; version?: string };
      if (pkg.name === 'sigma-ledger' && pkg.version) return pkg.version;
    } catch {
      // not at this level
    }
  }
  return 'unknown';
}
