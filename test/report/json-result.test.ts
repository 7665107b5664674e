import { describe, expect, it } from 'vitest';
import { computeBudget } from '../../src/pipeline';
import { buildJsonResult } from '../../src/report/json-result';
import { formatSummary } from '../../src/report/text-summary';
import { CAUTION } from '../../src/report/caution';
import { scenarioR1 } from '../fixtures/reference-scenarios';

function r1WithRequirement() {
  const b = scenarioR1();
  b.requirements = [{ id: 'cross', quantity: 'cross-track', level: '95%', limit: { value: 2, unit: 'm' } }];
  return computeBudget(b);
}

describe('the JSON result', () => {
  const result = r1WithRequirement();
  const json = buildJsonResult(result, 'R1');

  it('has one value per step in every series and every contribution', () => {
    const n = json.series.t_s.length;
    expect(n).toBe(3001);
    for (const key of ['heading_sigma_deg', 'speed_sigma_mps', 'north_sigma_m', 'east_sigma_m', 'drms_m', 'along_sigma_m', 'cross_sigma_m']) {
      expect(json.series[key], key).toHaveLength(n);
    }
    for (const [q, bySource] of Object.entries(json.contributions)) {
      for (const [id, values] of Object.entries(bySource)) expect(values, `${q}.${id}`).toHaveLength(n);
    }
  });

  it('has contributions in display units squared that sum to the square of the sigma series', () => {
    const pairs: [string, string][] = [['heading', 'heading_sigma_deg'], ['cross', 'cross_sigma_m'], ['speed', 'speed_sigma_mps'], ['drms', 'drms_m']];
    for (const [q, key] of pairs) {
      for (const k of [0, 1500, 3000]) {
        const sum = Object.values(json.contributions[q]).reduce((a, v) => a + v[k], 0);
        expect(Math.abs(sum / json.series[key][k] ** 2 - 1), `${q} at ${k}`).toBeLessThan(1e-9);
      }
    }
    expect(json.series.heading_sigma_deg[0]).toBeCloseTo(2, 12);
  });

  it('reports each requirement with verdict, margin and each outage with start, end and time to exceed', () => {
    // Read through JSON, as a notebook or CI script would.
    const req = JSON.parse(JSON.stringify(json.requirements[0])) as Record<string, unknown>;
    expect(req.id).toBe('cross');
    expect(['pass', 'fail']).toContain(req.verdict);
    expect(typeof req.margin).toBe('number');
    const outage = (req.outages as Record<string, unknown>[])[0];
    expect(outage).toMatchObject({ start_s: 180, end_s: 300 });
    expect(outage.timeToExceed_s === null || typeof outage.timeToExceed_s === 'number').toBe(true);
  });

  it('thins the series to every n-th step and keeps the last one', () => {
    const thin = buildJsonResult(result, 'R1', 100);
    expect(thin.series.t_s).toHaveLength(31);
    expect(thin.series.t_s[30]).toBe(300);
    expect(thin.contributions.heading['gyro.bi']).toHaveLength(31);
  });

  it('carries the caution', () => {
    expect(json.caution).toBe(CAUTION);
    expect(formatSummary(result, { title: 'R1', fileName: 'r1.json' })).toContain(CAUTION);
  });
});

describe('the report level (settings.level)', () => {
  it('scales one-dimensional budget-table values by the two-sided normal factor and leaves DRMS at 1 sigma', () => {
    const b = scenarioR1();
    b.reportLevel = '95%';
    const json = buildJsonResult(computeBudget(b), 'R1');
    const end = json.checkpoints.at(-1)!;
    expect(end.level).toBe('95%');
    const heading = end.budgets.find((q) => q.quantity === 'heading')!;
    expect(heading.atLevel / heading.sigma).toBeCloseTo(1.959963984540054, 12); // z(0.975), docs/checks.md §6 (scipy.stats.chi2)
    const drms = end.budgets.find((q) => q.quantity === 'drms')!;
    expect(drms.atLevel).toBe(drms.sigma);
  });

  it('is refused when it is not one of the levels', () => {
    const b = scenarioR1();
    (b as { reportLevel: string }).reportLevel = '99%';
    expect(() => computeBudget(b)).toThrow(/reportLevel.*must be one of/);
  });
});
