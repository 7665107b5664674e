/**
 * `sigma-ledger report FILE [--out PATH] [--format html|md]`: the
 * design-review report of a budget, as one self-contained HTML file (default)
 * or as Markdown. Without --out it goes to stdout. Exit codes as `run`: the
 * report is written whatever the verdicts say.
 */
import { createHash } from 'node:crypto';
import { readFileSync, writeFileSync } from 'node:fs';
import { InputError } from '../errors';
import { buildReviewReport, renderReviewHtml, renderReviewMarkdown, TOOL_VERSION, type ReviewAnalyses } from '../report/review';
import { EXIT, type Io } from './commands';
import { readSimulationJson, type SimulationJson } from '../simulation/simulation-json';
import { loadBudget, sheetProblems, withDocumentPaths } from './load-budget';

/** The report's file formats. */
export const REPORT_FORMATS = ['html', 'md'] as const;
export type ReportFormat = (typeof REPORT_FORMATS)[number];

/** Options `report` adds to the command line. */
export const REPORT_CLI_OPTIONS = {
  out: { type: 'string' },
  format: { type: 'string' },
  simulation: { type: 'string' },
} as const;

/** Options of `report`. */
export interface ReportCommandOptions {
  file: string;
  out?: string;
  format: ReportFormat;
  /** A Monte Carlo study of the same file (simulate --json or merge --json) to show in the report. */
  simulation?: string;
  /** The sensitivity and R sweeps to add. */
  analyses?: ReviewAnalyses;
}

/**
 * Reads `report`'s options; the format defaults to Markdown for an --out
 * ending in .md, HTML otherwise.
 * @throws InputError at --format for a format other than html or md.
 */
export function reportOptionsFromArgs(file: string, values: { out?: string; format?: string; simulation?: string }): ReportCommandOptions {
  const format = values.format ?? (values.out?.toLowerCase().endsWith('.md') ? 'md' : 'html');
  if (!(REPORT_FORMATS as readonly string[]).includes(format)) throw new InputError('--format', `must be html or md, got "${format}"`);
  return { file, out: values.out, format: format as ReportFormat, simulation: values.simulation };
}

/** Writes the report; returns 0 when every requirement holds, 1 when some fails, 2 for a partial budget. */
export function reportCommand(opts: ReportCommandOptions, io: Io): number {
  // buildReviewReport runs the analysis itself: the cells are all the load needs.
  const loaded = loadBudget(opts.file, { compute: false });
  for (const note of loaded.notes) io.err(`${loaded.fileName}: ${note}\n`);
  const problems = sheetProblems(loaded);
  for (const p of problems) io.err(`${p}\n`);
  if (loaded.sheet.blocked) return EXIT.badInput;
  const documentSha256 = createHash('sha256').update(readFileSync(opts.file)).digest('hex');
  const simulation = opts.simulation === undefined ? undefined : readStudyFor(opts.simulation, documentSha256);
  const provenance = { fileName: opts.file, documentSha256, toolVersion: TOOL_VERSION, simulation };
  const report = withDocumentPaths(loaded, () => buildReviewReport(loaded.document, provenance, undefined, opts.analyses));
  const text = opts.format === 'md' ? renderReviewMarkdown(report) : renderReviewHtml(report);
  if (opts.out) {
    try {
      writeFileSync(opts.out, text);
    } catch (e) {
      throw new InputError('--out', `cannot write ${opts.out} (${(e as NodeJS.ErrnoException).code ?? 'error'}): check that its folder exists and is writable`);
    }
    io.err(`wrote ${opts.out} (${opts.format === 'md' ? 'Markdown' : 'HTML'}, ${report.sections.length} sections)\n`);
  } else {
    io.out(text);
  }
  if (problems.length) return EXIT.badInput;
  return verdictsHold(report) ? EXIT.pass : EXIT.fail;
}

/** As `run`: with a filter design the requirements judged on the actual error decide. */
function verdictsHold(report: ReturnType<typeof buildReviewReport>): boolean {
  const actual = report.sections.find((s) => s.id === 'filter-design')?.blocks.find((b) => b.kind === 'table' && b.id === 'filter-requirements');
  const verdicts = actual ?? report.sections.find((s) => s.id === 'requirements')?.blocks.find((b) => b.kind === 'table' && b.id === 'verdicts');
  return !verdicts || verdicts.kind !== 'table' || verdicts.rows.every((r) => r[r.length - 1] === 'PASS');
}

/**
 * Reads a Monte Carlo study (simulate --json) and checks it was simulated from these very bytes.
 * @throws InputError at --simulation for an unreadable file, another format or another budget.
 */
function readStudyFor(path: string, documentSha256: string): SimulationJson {
  let raw: unknown;
  try {
    raw = JSON.parse(readFileSync(path, 'utf8'));
  } catch (e) {
    const why = e instanceof SyntaxError ? 'is not JSON' : `cannot be read (${(e as NodeJS.ErrnoException).code ?? 'error'})`;
    throw new InputError(`--simulation ${path}`, `${why}; give the output of simulate --json or merge --json`);
  }
  const study = readSimulationJson(raw, path);
  if (study.budget.sha256 !== documentSha256) {
    throw new InputError(`--simulation ${path}`, `was simulated from another version of the budget (SHA-256 ${study.budget.sha256.slice(0, 12)}…, this file ${documentSha256.slice(0, 12)}…): simulate again`);
  }
  return study;
}
