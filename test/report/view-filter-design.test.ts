import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseBudgetDocument } from '../../src/document';
import { computeView } from '../../src/report/view-result';

// What the page's worker hands the page for a budget with a filter design (the annotated example, invented).
describe('the page view of a budget with a filter design', () => {
  const { document } = parseBudgetDocument(readFileSync('budgets/annotated-example.json', 'utf8'), 'annotated-example.json');

  it('carries believed and actual series on the same thinned times, with verdicts', () => {
    const fd = computeView(document).result!.filterDesign!;
    expect(fd.believed.series.t_s.length).toBeLessThanOrEqual(1501);
    expect(fd.actual.series.t_s).toEqual(fd.believed.series.t_s);
    expect(fd.confidence.map((c) => c.quantity)).toContain('heading');
    expect(Object.keys(fd.actual.contributions.heading)).toContain('gnss.multipath');
  }, 60_000);

  it('gives the quick first answer without shares, and nothing for a budget without tuning', () => {
    const quick = computeView(document, { contributions: false }).result!.filterDesign!;
    expect(quick.actual.contributions.heading).toEqual({});
    const plain = structuredClone(document);
    for (const s of plain.sensors) for (const r of s.sources) delete r.tuning;
    expect(computeView(plain).result!.filterDesign).toBeUndefined();
  }, 60_000);
});
