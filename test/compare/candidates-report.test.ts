import { describe, expect, it } from 'vitest';
import { buildReviewReport, renderReviewHtml, renderReviewMarkdown } from '../../src/report/review';
import { compareCandidates } from '../../src/compare';
import { gradeCandidates } from './grade-candidates';
import { reportTables, table } from '../report/review/report-tables';

const provenance = { fileName: 'grades.json', documentSha256: '0'.repeat(64), toolVersion: 'test' };

describe('the review report of a budget with candidates', () => {
  const doc = gradeCandidates();
  const report = buildReviewReport(doc, provenance);
  const section = report.sections.find((s) => s.id === 'candidates')!;

  it('puts the candidates side by side with the numbers compare gives', () => {
    const slot = compareCandidates(doc).slots[0];
    const rows = table(reportTables(renderReviewHtml(report)), 'candidates-gyro');
    const margin = rows.find((r) => r[0].text === 'fine: margin (deg)')!;
    expect(margin.slice(1).map((c) => Number(c.text))).toEqual(
      slot.outcomes.map((o) => Number(o.requirements[1].margin.toPrecision(4))),
    );
    expect(
      rows
        .find((r) => r[0].text === 'passes every requirement')!
        .slice(1)
        .map((c) => c.text),
    ).toEqual(['no', 'no', 'yes']);
    expect(JSON.stringify(section.blocks)).toContain(
      'Cheapest candidate for gyro that passes every requirement: navigation',
    );
  });

  it("overlays one curve per candidate on each requirement's chart, with its limit", () => {
    const charts = section.blocks.filter((b) => b.kind === 'chart');
    expect(charts.map((c) => c.chart.title)).toEqual(['coarse: candidates for gyro', 'fine: candidates for gyro']);
    for (const c of charts) {
      expect(c.chart.series.map((s) => s.label)).toEqual(['consumerMems', 'tactical', 'navigation']);
      expect(c.chart.limits).toHaveLength(1);
      expect(c.chart.bands.map((b) => b.label)).toEqual(['gnss blocked']);
    }
    expect(renderReviewMarkdown(report)).toContain('## Candidates compared');
  });

  it('leaves the section out of a budget without candidates', () => {
    const plain = gradeCandidates();
    delete plain.candidates;
    expect(buildReviewReport(plain, provenance).sections.some((s) => s.id === 'candidates')).toBe(false);
  });
});
