import { readFileSync } from 'node:fs';
import { createHash } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { runCli } from '../../cli/run-cli';
import type { JsonResult } from '../../../src/report/json-result';
import { formatSignificant } from '../../../src/units';
import { TOOL_VERSION } from '../../../src/report/review';
import { reportTables, table } from './report-tables';

const FILES = ['budgets/orchard-rover.json', 'budgets/harbour-launch.json'];
const shown = (x: number) => formatSignificant(x, 4);

describe.each(FILES)('the review report of %s', (file) => {
  const both = Promise.all([runCli(['report', file]), runCli(['run', file, '--json'])]).then(([report, run]) => ({
    html: report.out, reportCode: report.code, runCode: run.code, json: JSON.parse(run.out) as JsonResult, tables: reportTables(report.out),
  }));

  it('exits as run does', async () => {
    const { reportCode, runCode } = await both;
    expect(reportCode).toBe(runCode);
  });

  it('shows every R, Q and P0 piece of run --json in its row with the source, the provenance, the conversions and the SI value', async () => {
    const { json, tables } = await both;
    const provenance = new Map(json.mission.sources.map((s) => [s.id, s]));
    for (const [key, entries] of Object.entries(json.noise)) {
      const rows = table(tables, `noise-${key}`);
      for (const e of entries) {
        for (const p of e.pieces) {
          const row = rows.find((r) => r[0].text === e.name && r[2].text.startsWith(p.sourceId));
          expect(row, `${key} ${e.name} from ${p.sourceId}`).toBeDefined();
          const src = provenance.get(p.sourceId)!;
          expect(src.provenance, `${p.sourceId} has a provenance`).toBeTruthy();
          expect(row![2].text).toContain(src.provenance!);
          expect(row![2].text.includes('ASSUMED')).toBe(src.assumed);
          for (const c of p.conversions) expect(row![3].text).toContain(c);
          expect(row![3].text).toContain(p.derivation);
          expect(row![4].value).toBe(p.valueSI);
          expect(row![1].value).toBe(e.totalSI);
        }
      }
      expect(rows.length, `${key}: one table row per piece`).toBe(entries.reduce((n: number, e: { pieces: unknown[] }) => n + e.pieces.length, 0));
    }
  });

  it('traces the start pose: P0 of position and heading shows the unit conversion from the mission cell', async () => {
    const { json } = await both;
    const heading = json.noise.p0.find((e) => e.pieces.some((p) => p.sourceId === 'mission.initialHeading'))!;
    expect(heading.pieces[0].conversions.join()).toMatch(/^value: [\d.]+ deg × 0\.0174533 rad per deg = /);
  });

  it('prints the verdicts, margins, worst values and times to exceed of run --json', async () => {
    const { json, tables } = await both;
    const verdicts = table(tables, 'verdicts');
    json.requirements.forEach((r, i) => {
      const row = verdicts[i];
      expect(row[0].text).toBe(r.id);
      expect([row[2].value, row[4].value, row[5].value, row[6].value]).toEqual([r.limit, r.worst, r.worst_t_s, r.margin]);
      expect(row[6].text).toBe(`${shown(r.margin)} ${r.unit}`);
      expect(row[7].text).toBe(r.verdict.toUpperCase());
    });
    const holds = table(tables, 'time-to-exceed');
    const expected = json.requirements.flatMap((r) => r.outages.map((o) => [r.id, o.sensor, o.outage, o.timeToExceed_s]));
    expect(holds.map((row) => [row[0].text, row[1].text, row[2].text, row[4].value ?? null])).toEqual(expected);
  });

  it('prints every checkpoint budget of run --json: σ, the value at the report level and each source\'s share', async () => {
    const { json, tables } = await both;
    expect(json.checkpoints.length).toBeGreaterThan(0);
    for (const cp of json.checkpoints) {
      const rows = table(tables, `checkpoint-${cp.id}`);
      const expected = cp.budgets.flatMap((b) => [[b.quantity, b.sigma, b.atLevel, undefined], ...b.sources.map((s) => [b.quantity, s.sigma, s.atLevel, s.share])]);
      expect(rows.map((r) => [r[0].text, r[2].value, r[3].value, r[4].value])).toEqual(expected);
      for (const r of rows) expect(r[2].text).toBe(shown(r[2].value!));
    }
  });

  it('lists every row as written with its provenance and assumed flag, and every assumed value', async () => {
    const { html, json, tables } = await both;
    for (const s of json.mission.sources) {
      const sensor = s.id.startsWith('mission.') ? 'mission' : s.sensor;
      const row = table(tables, `rows-${sensor}`).find((r) => r[0].text === s.id);
      expect(row, s.id).toBeDefined();
      expect(row![4].text).toContain(s.provenance);
      expect(row![5].text).toBe(s.assumed ? 'ASSUMED' : 'no');
      if (s.assumed) expect(html).toContain(`<dt>${s.id}</dt>`);
    }
  });

  it('names the file\'s SHA-256 and the tool\'s version', async () => {
    const { html } = await both;
    const sha = createHash('sha256').update(readFileSync(file)).digest('hex');
    expect(html).toContain(`<dd>${sha}</dd>`);
    expect(html).toContain(`Sigma Ledger ${TOOL_VERSION}`);
  });

  it('is self-contained: no script, no external reference', async () => {
    const { html } = await both;
    expect(html).not.toMatch(/<script|<link(?![^>]*href="data:)|<img|@import|url\((?!#)/i);
    expect(html.match(/src=/g)).toBeNull();
  });
});

describe('the review report', () => {
  it('states the same version as package.json', () => {
    expect(TOOL_VERSION).toBe(JSON.parse(readFileSync('package.json', 'utf8')).version);
  });

  it('writes Markdown with --format md, with the same R, Q and P0 rows', async () => {
    const md = await runCli(['report', 'budgets/orchard-rover.json', '--format', 'md']);
    const json = JSON.parse((await runCli(['run', 'budgets/orchard-rover.json', '--json'])).out) as JsonResult;
    expect(md.out).toMatch(/^# Orchard rover/);
    for (const e of [...json.noise.r, ...json.noise.q, ...json.noise.p0]) expect(md.out).toContain(`| ${e.name} |`);
    expect(md.out).not.toContain('<svg');
  });

  it('refuses an unknown format, naming the option', async () => {
    const r = await runCli(['report', 'budgets/orchard-rover.json', '--format', 'pdf']);
    expect(r.code).toBe(2);
    expect(r.err).toContain('--format');
  });
});

describe('sizing in the review report', () => {
  it('runs what the document\'s sizing[] asks for and gives the same answer as sigma-ledger size', async () => {
    const [report, size] = await Promise.all([
      runCli(['report', 'budgets/harbour-launch.json']),
      runCli(['size', 'budgets/harbour-launch.json', '--requirement', 'bridgeHeading', '--vary', 'gyro.bi', '--json']),
    ]);
    const row = table(reportTables(report.out), 'sizing')[0];
    const sized = JSON.parse(size.out);
    expect([row[0].text, row[1].text]).toEqual(['gyro.bi', 'bridgeHeading']);
    expect(row[3].value).toBe(sized.largestPassing);
    expect(sized.outcome).toBe('bounded');
  }, 60_000);

  it('lists a sizing run it cannot make with the reason, and still writes the report', async () => {
    const { parseBudgetDocument } = await import('../../../src/document');
    const { buildReviewReport } = await import('../../../src/report/review');
    const { document } = parseBudgetDocument(readFileSync('budgets/orchard-rover.json', 'utf8'), 'orchard-rover.json');
    document.sizing = [{ requirement: 'alleyKeeping', vary: 'gyro.nothing' }];
    const report = buildReviewReport(document, { fileName: 'x.json', documentSha256: '0', toolVersion: TOOL_VERSION });
    const t = report.sections.find((s) => s.id === 'sizing')!.blocks.find((b) => b.kind === 'table')!;
    expect(t.kind === 'table' && t.rows[0][5]).toMatch(/^not run: .*gyro\.nothing/);
  });
});
