import { readdirSync, readFileSync, statSync, existsSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';

/**
 * Every citation in the code, the tests, the page, the budgets and the guides
 * must resolve inside the repository: a cited `docs/<page>.md §N` must be a
 * page with a heading numbered N, and nothing may cite the design notes that
 * were the project's input (they are not part of the repository).
 */

const ROOT = fileURLToPath(new URL('..', import.meta.url));
const SCANNED = ['src', 'test', 'web', 'budgets', 'docs', 'README.md', 'DEVELOPERS.md'];
const TEXT_FILE = /\.(ts|mjs|js|json|md|txt|html|css)$/;

/** The design notes' names; spelled in pieces so that this file never cites one itself. */
const NOTE_NAMES = ['ENGINE', 'INS', 'INS-REFERENCES', 'REFERENCES', 'DOCUMENT', 'STYLE', 'TOOLCHAIN'];
/** The folder the notes were handed over in, also in pieces. */
const NOTE_FOLDER = ['shared', 'design', ''].join('/');
const NOTE_CITATION = new RegExp(`(?<![\\w/.-])(?:${NOTE_NAMES.join('|')})(?:\\.md\\b| *§)|${NOTE_FOLDER}`, 'g');
/** `docs/page.md §N`, `docs/page.md` §§N-M, `docs/page.md §4.8–4.11`, with or without backticks. */
const DOCS_CITATION = /docs\/([a-z0-9-]+)\.md`?(?:\s*(§§?)\s*([0-9]+(?:\.[0-9]+)*)(?:\s*[-–]\s*([0-9]+(?:\.[0-9]+)*))?)?/g;

interface CitationProblem {
  file: string;
  line: number;
  text: string;
  problem: string;
}

function listFiles(path: string): string[] {
  const full = join(ROOT, path);
  if (!existsSync(full)) return [];
  if (statSync(full).isFile()) return [path];
  return readdirSync(full).flatMap((name) => (name === 'node_modules' ? [] : listFiles(join(path, name))));
}

/** The section numbers of a docs page: the leading numbers of its headings ("## 4. …", "### 4.8 …"). */
function headingNumbers(markdown: string): Set<string> {
  const numbers = new Set<string>();
  for (const m of markdown.matchAll(/^#{1,6}\s+([0-9]+(?:\.[0-9]+)*)\.?\s/gm)) numbers.add(m[1]);
  return numbers;
}

/** Problems with the citations in one file's text; `pages` maps a docs page name to its section numbers. */
function citationProblems(file: string, text: string, pages: Map<string, Set<string>>): CitationProblem[] {
  const problems: CitationProblem[] = [];
  text.split('\n').forEach((lineText, i) => {
    const at = (problem: string, cited: string) => problems.push({ file, line: i + 1, text: cited, problem });
    for (const m of lineText.matchAll(NOTE_CITATION)) at('cites a design note outside the repository', m[0]);
    for (const m of lineText.matchAll(DOCS_CITATION)) {
      const [cited, page, , first, last] = m;
      const sections = pages.get(page);
      if (sections === undefined) {
        at(`cites docs/${page}.md, which does not exist`, cited);
        continue;
      }
      for (const n of [first, last]) {
        if (n !== undefined && !sections.has(n)) at(`cites §${n} of docs/${page}.md, which has no heading numbered ${n}`, cited);
      }
    }
  });
  return problems;
}

function docsPages(): Map<string, Set<string>> {
  const pages = new Map<string, Set<string>>();
  for (const file of listFiles('docs')) {
    const name = /([a-z0-9-]+)\.md$/.exec(file)?.[1];
    if (name !== undefined) pages.set(name, headingNumbers(readFileSync(join(ROOT, file), 'utf8')));
  }
  return pages;
}

describe('citations resolve inside the repository', () => {
  const pages = docsPages();

  it('the checker catches a design-note citation, a missing page and a missing section', () => {
    const note = NOTE_NAMES[0] + '.md §3';
    const found = citationProblems('x.ts', `// ${note}\n// docs/nowhere.md §1\n// docs/planar-model.md §99 and docs/planar-model.md §§1-42`, pages);
    expect(found.map((p) => [p.line, p.problem.split(',')[0]])).toEqual([
      [1, 'cites a design note outside the repository'],
      [2, 'cites docs/nowhere.md'],
      [3, 'cites §99 of docs/planar-model.md'],
      [3, 'cites §42 of docs/planar-model.md'],
    ]);
  });

  it('the checker accepts existing sections in every citation form', () => {
    const text = 'docs/planar-model.md §7, `docs/checks.md` §4.8–4.11, docs/planar-model.md §§1-8, docs/checks.md §1.4.';
    expect(citationProblems('x.ts', text, pages)).toEqual([]);
  });

  it('every file cites only docs pages and sections that exist', () => {
    const files = SCANNED.flatMap(listFiles).filter((f) => TEXT_FILE.test(f) && !f.endsWith('docs-citations.test.ts'));
    expect(files.length).toBeGreaterThan(100);
    const problems = files.flatMap((f) => citationProblems(f, readFileSync(join(ROOT, f), 'utf8'), pages));
    expect(problems.map((p) => `${p.file}:${p.line}: ${p.problem} (${p.text})`)).toEqual([]);
  });
});
