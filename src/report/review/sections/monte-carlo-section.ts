import { CAUTION } from '../../caution';
import type { ReportBlock, ReportSection } from '../review-report';
import { fmt, numCell, type ReviewContext } from '../review-context';
import type { LineChart } from '../svg-line-chart';
import type { SimulationJson, SimulationJsonQuantity } from '../../../simulation/simulation-json';
import { outageBands } from './sigma-charts-section';

/**
 * The Monte Carlo check, when the user gives a study of this document
 * (`report FILE --simulation STUDY.json`, the output of `simulate --json` or
 * `merge --json`): the verdict line ("checked by N Monte Carlo runs:
 * consistent within bounds" or the first warning), every warning, the
 * largest RMS/σ per quantity and the largest average NEES over its upper
 * bound, and a small chart of the RMS against the budget's σ with the 95 %
 * χ² band of the RMS for N runs (Bar-Shalom, Li and Kirubarajan 2001, §5.4.2).
 */
export function monteCarloSection(ctx: ReviewContext): ReportSection | undefined {
  const sim = ctx.simulation;
  if (!sim) return undefined;
  const blocks: ReportBlock[] = [{ kind: 'paragraph', text: sim.verdict }];
  if (sim.flags.length) blocks.push({ kind: 'caution', text: `The covariance is optimistic in ${sim.flags.length} stretch(es) of the mission: treat its σ there as a lower bound.` });
  if (sim.flags.length) blocks.push({ kind: 'list', items: sim.flags.map((f) => f.text) });
  blocks.push({
    kind: 'table', id: 'monte-carlo-ratios', caption: 'Largest Monte Carlo RMS over the predicted σ, per quantity (1 is a consistent budget)',
    columns: ['quantity', 'largest RMS / σ', 'at (s)', 'upper end of the 95 % band / σ there'], numericColumns: [1, 2, 3],
    rows: sim.quantities.map((q) => {
      const k = worstRatioStep(q);
      return [`${q.id} (${q.unit})`, numCell(q.rms[k] / q.budgetSigma[k]), numCell(sim.t_s[k]), numCell(q.bandHigh[k] / q.budgetSigma[k])];
    }),
  });
  const chart = rmsChart(ctx, sim);
  if (chart) blocks.push({ kind: 'chart', chart, caption: `${chart.title}: the Monte Carlo RMS against the budget's σ, with the 95 % band of the RMS of ${sim.runs} runs if the σ were right.` });
  blocks.push({
    kind: 'paragraph',
    text: `Rerun: sigma-ledger simulate ${sim.budget.file} --runs ${sim.runs} --seed ${sim.seed} --json (same seed, same numbers on any machine). ` +
      `NEES groups: ${sim.nees.map((g) => `${g.id} up to ${fmt(Math.max(...g.average.map((a, i) => (g.high[i] > 0 ? a / g.high[i] : 0))))}× its upper bound`).join('; ')}.`,
  });
  blocks.push({ kind: 'caution', text: CAUTION });
  return { id: 'monte-carlo', title: 'Monte Carlo check', blocks };
}

/** The step where RMS/σ is largest (σ > 0). */
function worstRatioStep(q: SimulationJsonQuantity): number {
  let best = 0, ratio = -Infinity;
  for (let k = 0; k < q.rms.length; k++) {
    if (!(q.budgetSigma[k] > 0)) continue;
    const r = q.rms[k] / q.budgetSigma[k];
    if (r > ratio) { ratio = r; best = k; }
  }
  return best;
}

/** One chart: the flagged quantity if any, else cross-track, else the first quantity. */
function rmsChart(ctx: ReviewContext, sim: SimulationJson): LineChart | undefined {
  const q = sim.quantities.find((x) => x.id === sim.flags[0]?.subject) ?? sim.quantities.find((x) => x.id === 'cross-track') ?? sim.quantities[0];
  if (!q) return undefined;
  const x = sim.t_s;
  return {
    title: `${q.id} error, Monte Carlo against budget`, xLabel: 'mission time (s)', yLabel: `${q.id} (${q.unit})`,
    series: [
      { label: `RMS of ${sim.runs} runs`, x, y: q.rms },
      { label: 'budget σ', x, y: q.budgetSigma },
      { label: '95 % band, low', x, y: q.bandLow },
      { label: '95 % band, high', x, y: q.bandHigh },
    ],
    limits: [], bands: outageBands(ctx), yMin: 0,
  };
}
