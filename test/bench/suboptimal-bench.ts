/**
 * Speed of the suboptimal-filter analysis (issue: filter model versus
 * truth): on every example budget it must add at most 3x the time of the
 * optimal run (contributions included in both). Budgets without a filter
 * design run with filter = truth (no truth state needs carrying, the
 * cheapest case); the annotated example has a real design (a Gauss-Markov
 * bias as a random walk, multipath folded, a scale factor left out).
 */
import { readFileSync, readdirSync } from 'node:fs';
import { parseBudgetDocument } from '../../src/document';
import { evaluateBudgetDocument } from '../../src/sheet';
import { computeBudget } from '../../src/pipeline';
import { computeFilterDesign } from '../../src/suboptimal/compute-filter-design';
import { medianMs } from './median-time';

for (const file of readdirSync('budgets').filter((f) => f.endsWith('.json') && !f.endsWith('.schema.json'))) {
  const { document } = parseBudgetDocument(readFileSync(`budgets/${file}`, 'utf8'), file);
  const input = evaluateBudgetDocument(document).input!;
  const base = computeBudget(input);
  const optimalMs = medianMs(() => computeBudget(input), 9, 1);
  const designMs = medianMs(() => computeFilterDesign(input, base), 9, 1);
  const steps = base.trajectory.tS.length;
  console.log(`${file} (${steps} steps): optimal ${optimalMs.toFixed(1)} ms, filter vs truth adds ${designMs.toFixed(1)} ms: ratio ${(designMs / optimalMs).toFixed(2)} (target <= 3)`);
}
