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
import { runInertialBudget } from '../../src/inertial/run-inertial';
import { runInertialTruthVersusFilter } from '../../src/suboptimal/inertial-truth-versus-filter';
import { roverScenario } from '../fixtures/inertial-scenarios';

for (const file of readdirSync('budgets').filter((f) => f.endsWith('.json') && !f.endsWith('.schema.json'))) {
  const { document } = parseBudgetDocument(readFileSync(`budgets/${file}`, 'utf8'), file);
  const input = evaluateBudgetDocument(document).input!;
  const base = computeBudget(input);
  const optimalMs = medianMs(() => computeBudget(input), 9, 1);
  const designMs = medianMs(() => computeFilterDesign(input, base), 9, 1);
  const steps = base.trajectory.tS.length;
  console.log(`${file} (${steps} steps): optimal ${optimalMs.toFixed(1)} ms, filter vs truth adds ${designMs.toFixed(1)} ms: ratio ${(designMs / optimalMs).toFixed(2)} (target <= 3)`);
}

// The 3-D model through the shared run (runInertialTruthVersusFilter, filter = truth): every truth state is
// carried (no pruning there), so the augmented state is twice the model's. Reported, no target yet.
{
  const b = roverScenario();
  b.mission.segments = b.mission.segments.slice(0, 3);
  b.aiding[0].outages = [];
  const optimalMs = medianMs(() => runInertialBudget(b), 3, 1);
  const designMs = medianMs(() => runInertialTruthVersusFilter(b, b), 3, 1);
  console.log(`3-D rover, first 3 segments: optimal ${optimalMs.toFixed(1)} ms, filter vs truth ${designMs.toFixed(1)} ms: ratio ${(designMs / optimalMs).toFixed(2)} (all truth states carried)`);
}
