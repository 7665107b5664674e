/**
 * The page uses the engine only through its public entry, src/index.ts (the
 * package's `exports`), like any library user: every import, re-export or
 * dynamic import in web/ that reaches into src/ must name the entry itself.
 * What the page needs that the entry lacks is exported there.
 */
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { dirname, join, relative, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';

const ROOT = resolve(dirname(fileURLToPath(import.meta.url)), '..');
const SRC = join(ROOT, 'src');
const ENTRY = [SRC, join(SRC, 'index'), join(SRC, 'index.ts'), join(SRC, 'index.js')];

/** Every .ts file under a folder. */
function tsFiles(folder: string): string[] {
  return readdirSync(folder).flatMap((name) => {
    const path = join(folder, name);
    if (statSync(path).isDirectory()) return tsFiles(path);
    return name.endsWith('.ts') ? [path] : [];
  });
}

/** Module specifiers of a file: static imports and re-exports, side-effect imports, dynamic imports, worker URLs. */
function specifiers(text: string): string[] {
  const patterns = [
    /\bfrom\s*['"]([^'"]+)['"]/g,
    /\bimport\s*['"]([^'"]+)['"]/g,
    /\bimport\s*\(\s*['"]([^'"]+)['"]\s*\)/g,
    /new\s+URL\s*\(\s*['"]([^'"]+)['"]\s*,\s*import\.meta\.url/g,
  ];
  return patterns.flatMap((p) => [...text.matchAll(p)].map((m) => m[1]));
}

describe('web/ and the engine', () => {
  const files = tsFiles(join(ROOT, 'web'));

  it('finds the page\'s sources and their imports of the engine', () => {
    expect(files.length).toBeGreaterThan(50);
    const toEntry = files.filter((f) => specifiers(readFileSync(f, 'utf8')).some((s) => ENTRY.includes(resolve(dirname(f), s))));
    expect(toEntry.length).toBeGreaterThan(30);
  });

  it('reads every form of import', () => {
    const text = [
      "import { a } from '../../src/units';",
      "export { b } from \"../src/x\";",
      "import '../side-effect';",
      "const m = await import('../../src/lazy');",
      "new Worker(new URL('./compute-worker.ts', import.meta.url), { type: 'module' });",
    ].join('\n');
    expect(specifiers(text).sort()).toEqual(['../../src/lazy', '../../src/units', '../side-effect', '../src/x', './compute-worker.ts']);
  });

  it('imports src/ only through src/index.ts', () => {
    const internal = files.flatMap((f) =>
      specifiers(readFileSync(f, 'utf8'))
        .filter((s) => s.startsWith('.'))
        .map((s) => resolve(dirname(f), s))
        .filter((target) => (target === SRC || target.startsWith(`${SRC}/`)) && !ENTRY.includes(target))
        .map((target) => `${relative(ROOT, f)} imports ${relative(ROOT, target)}`),
    );
    expect(internal).toEqual([]);
  });
});
