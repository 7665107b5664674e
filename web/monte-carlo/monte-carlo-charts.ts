import type { LineChart, NeesStatistics, QuantityStatistics } from '../../src/index';
import type { MonteCarloStudy } from './monte-carlo-runner';

/** Most points per line: an SVG of the whole 4,481-step mission per quantity would be large for no visible gain. */
const MAX_POINTS = 400;

/** Steps kept for drawing: every k-th and the last. */
function drawnSteps(steps: number): number[] {
  const every = Math.max(1, Math.ceil(steps / MAX_POINTS));
  const keep: number[] = [];
  for (let k = 0; k < steps; k += every) keep.push(k);
  if (keep[keep.length - 1] !== steps - 1) keep.push(steps - 1);
  return keep;
}

/** Display unit and factor from SI (angles in degrees, as the command line's JSON). */
export function displayUnit(unitSI: string): { unit: string; factor: number } {
  return unitSI === 'rad' ? { unit: 'deg', factor: 180 / Math.PI } : { unit: unitSI, factor: 1 };
}

function outageBands(study: MonteCarloStudy): LineChart['bands'] {
  return study.shape.outages.map((o) => ({ label: `${o.sensorId} ${o.id}`, from: o.startS, to: o.endS }));
}

/** A chart over the mission of the given lines (each SI values times `factor`), with the outages shaded. */
function timeChart(study: MonteCarloStudy, title: string, yLabel: string, lines: [string, Float64Array][], factor = 1): LineChart {
  const keep = drawnSteps(study.stats.tS.length);
  const x = keep.map((k) => study.stats.tS[k]);
  const series = lines.map(([label, a]) => ({ label, x, y: keep.map((k) => a[k] * factor) }));
  return { title, xLabel: 'mission time (s)', yLabel, series, limits: [], bands: outageBands(study), yMin: 0 };
}

/** One quantity's Monte Carlo RMS against the budget's σ, with the 95 % band of the RMS of N runs. */
export function rmsChart(study: MonteCarloStudy, q: QuantityStatistics): LineChart {
  const { unit, factor } = displayUnit(q.unitSI);
  return timeChart(study, `${q.label} error`, `${q.label} (${unit})`, [
    [`RMS of ${study.runs} runs`, q.rms], ['budget σ', q.budgetSigma],
    ['95 % band of the RMS, low', q.bandLow], ['95 % band of the RMS, high', q.bandHigh],
  ], factor);
}

/** One NEES group's average over the runs with its two-sided 95 % χ² bounds. */
export function neesChart(study: MonteCarloStudy, g: NeesStatistics): LineChart {
  return timeChart(study, `Average NEES of the ${g.label}`, 'average NEES', [
    [`average of ${study.runs} runs`, g.average], ['expected (states)', g.dof], ['95 % bound, low', g.low], ['95 % bound, high', g.high],
  ]);
}
