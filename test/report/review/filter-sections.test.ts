/**
 * The review report's filter-design, sensitivity and R-sweep sections carry
 * the same numbers as `run --json` (filterDesign), `sensitivity --json` and
 * `r-sweep --json` print, read back from the HTML's full-precision cells.
 */
import { describe, expect, it } from 'vitest';
import { runCli } from '../../cli/run-cli';
import type { FilterDesignJson } from '../../../src/report/filter-design-json';
import type { SensitivityEntry } from '../../../src/sensitivity/assumption-sensitivity';
import type { RSweep } from '../../../src/suboptimal/r-sweep';
import { reportTables, table } from './report-tables';

const ANNOTATED = 'budgets/annotated-example.json';

describe('filter sections of the review report of the annotated example', () => {
  const all = Promise.all([
    runCli(['report', ANNOTATED, '--sensitivity', '--range', '0.5,2', '--r-sweep', 'gnss']),
    runCli(['run', ANNOTATED, '--json', '--every', '100']),
    runCli(['sensitivity', ANNOTATED, '--json', '--range', '0.5,2']),
    runCli(['r-sweep', ANNOTATED, '--sensor', 'gnss', '--json']),
  ]).then(([report, run, sens, sweep]) => ({
    report, run, tables: reportTables(report.out),
    design: JSON.parse(run.out).filterDesign as FilterDesignJson,
    entries: (JSON.parse(sens.out) as { entries: SensitivityEntry[] }).entries,
    sweep: JSON.parse(sweep.out) as RSweep,
  }));

  it('shows believed and actual worst per requirement as run --json does, and exits as run does', async () => {
    const { report, run, tables, design } = await all;
    expect(report.code).toBe(run.code);
    const rows = table(tables, 'filter-requirements');
    expect(rows.map((r) => r[0].text)).toEqual(design.actual.requirements.map((r) => r.id));
    design.actual.requirements.forEach((r, i) => {
      expect(rows[i][2].value).toBe(r.limit);
      expect(rows[i][3].value).toBe(design.believed.requirements[i].worst);
      expect(rows[i][4].value).toBe(r.worst);
      expect(rows[i][6].text).toBe(r.verdict.toUpperCase());
    });
    const confidence = table(tables, 'filter-confidence');
    design.confidence.forEach((c, i) => expect(confidence[i][4].text).toBe(c.verdict));
    expect(table(tables, 'filter-tuning').map((r) => r[0].text)).toEqual(Object.keys(design.tuning));
    const innovations = table(tables, 'filter-innovations');
    design.innovations.forEach((r, i) => expect([innovations[i][0].text, innovations[i][2].value, innovations[i][3].value]).toEqual([r.sensor, r.mean, r.max]));
  }, 240_000);

  it('ranks the sensitivity as sensitivity --json does, with a bar chart', async () => {
    const { report, tables, entries } = await all;
    const rows = table(tables, 'sensitivity');
    expect(rows.length).toBe(entries.length);
    entries.forEach((e, i) => {
      expect(rows[i][0].text.startsWith(e.target)).toBe(true);
      expect(rows[i][1].text).toBe(e.requirementId);
      expect([rows[i][2].value, rows[i][5].value, rows[i][6].value]).toEqual([e.baseWorst, e.change, e.relativeChange]);
    });
    expect(report.out).toMatch(/<section id="sensitivity">[\s\S]*?<svg[\s\S]*?Which assumptions matter/);
  }, 240_000);

  it('tabulates and plots the R sweep as r-sweep --json gives it, on a log axis with x1 marked', async () => {
    const { report, tables, sweep } = await all;
    const rows = table(tables, 'r-sweep-gnss');
    expect(rows.length).toBe(sweep.points.length);
    sweep.points.forEach((p, k) => {
      expect(rows[k][0].value).toBe(p.factor);
      p.values.forEach((v, i) => expect([rows[k][1 + 2 * i].value, rows[k][2 + 2 * i].value]).toEqual([v.actualWorst, v.believedWorst]));
    });
    const section = /<section id="r-sweep">([\s\S]*?)<\/section>/.exec(report.out)![1];
    expect(section.match(/<svg/g)!.length).toBe(sweep.points[0].values.length);
    expect(section).toContain('truth ×1');
    // Ticks of the log axis: 0.1, 1 and 10 are labelled.
    for (const tick of ['>0.1<', '>1<', '>10<']) expect(section).toContain(tick);
  }, 240_000);
});

describe('sections asked for that cannot run', () => {
  it('say why, and the rest of the report is written', async () => {
    const r = await runCli(['report', 'budgets/orchard-rover.json', '--r-sweep', 'gyro', '--format', 'md']);
    expect(r.out).toMatch(/gyro: not run: .*gives the filter no R to scale/);
    expect(r.out).not.toContain('Filter as tuned versus truth');
  }, 120_000);
});
