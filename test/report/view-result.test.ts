import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { parseBudgetDocument } from '../../src/document';
import { computeView, MAX_CHART_POINTS } from '../../src/report/view-result';

const load = (file: string) => parseBudgetDocument(readFileSync(file, 'utf8'), file).document;

describe('the page view of a budget', () => {
  it('thins the series for charts and carries requirement curves against their limits', () => {
    const view = computeView(load('budgets/orchard-rover.json'));
    expect(view.blocked).toBeUndefined();
    const n = view.result!.series.t_s.length;
    expect(n).toBeLessThanOrEqual(MAX_CHART_POINTS + 1);
    expect(view.curves.map((c) => c.id)).toEqual(['alleyKeeping', 'heading']);
    expect(view.curves[0].values).toHaveLength(n);
    expect(view.plan!.north).toHaveLength(n);
    expect(view.plan!.outages.map((o) => o.id)).toEqual(['canopyRow2', 'canopyRow3', 'canopyRow4']);
    expect(() => structuredClone(view)).not.toThrow();
  });

  it('reports a formula error in place and still computes the rest', () => {
    const doc = load('budgets/orchard-rover.json');
    doc.sensors[0].sources[0].value = '=noSuchName*2';
    const view = computeView(doc);
    expect(view.cellErrors.map((e) => e.location.path)).toContain('sensors[0].sources[0].value');
    expect(view.result).toBeDefined();
    expect(view.omitted.length).toBeGreaterThan(0);
  });

  it('leaves out an item the engine refuses, with its error at the document path, and computes the rest', () => {
    const doc = load('budgets/orchard-rover.json');
    doc.sensors[2].outages![0].end = { value: 9999, unit: 's' };
    const view = computeView(doc);
    expect(view.result).toBeDefined();
    const error = view.cellErrors.find((e) => e.location.path === 'sensors[2].outages[0]');
    expect(error?.message).toMatch(/within the mission/);
    expect(view.omitted.map((o) => o.path)).toContain('sensors[2].outages[0]');
  });

  it('comes back blocked, with the document path, for an input the engine refuses outside any item', () => {
    const doc = load('budgets/orchard-rover.json');
    doc.settings.step = { value: 1e-4, unit: 's' };
    const view = computeView(doc);
    expect(view.result).toBeUndefined();
    expect(view.blocked!.path).toBe('settings.step.value');
  });
});
