import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseBudgetDocument } from '../../src/document';
import { BudgetWorkbook, evaluateBudgetDocument } from '../../src/sheet';

const text = readFileSync(new URL('../../budgets/annotated-example.json', import.meta.url), 'utf8');
const { document } = parseBudgetDocument(text, 'annotated-example.json');

/** Median wall time of `runs` calls of `fn`, in ms. */
function medianMs(runs: number, fn: () => void): number {
  const times = Array.from({ length: runs }, () => {
    const t0 = performance.now();
    fn();
    return performance.now() - t0;
  });
  return times.sort((a, b) => a - b)[Math.floor(runs / 2)];
}

describe('the cost of evaluation (timings, no source: measured here)', () => {
  it('makes a one-cell update cheaper than a full evaluation, so a UI keeps one workbook', () => {
    evaluateBudgetDocument(document); // load and warm the engine's code first
    const fullMs = medianMs(5, () => evaluateBudgetDocument(document));
    const workbook = new BudgetWorkbook(document);
    let speed = 2;
    const updateMs = medianMs(5, () => {
      workbook.setCell('values.cruiseSpeed.value', (speed += 0.1));
      workbook.evaluate();
    });
    workbook.destroy();
    expect(updateMs).toBeLessThan(fullMs);
  });
});
