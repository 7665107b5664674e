import { formatSignificant } from '../units';
import type { SimulatedOutage } from './monte-carlo-model';
import type { StudyStatistics } from './study-statistics';

/** A stretch of steps where the covariance is optimistic beyond the simultaneous bound. */
export interface SimulationFlag {
  /** Quantity id, or `nees:<group>`. */
  subject: string;
  startS: number;
  endS: number;
  /** Time of the worst step, s. */
  worstS: number;
  /** RMS over predicted σ (quantities) or average NEES over its expected value (NEES). */
  ratio: number;
  /** The outage the worst step falls in, if any. */
  outage?: SimulatedOutage;
  /** Plain words, e.g. "linearisation breaks down 40 s into outage canopyRow3 (gnss): RMS cross-track 1.6× the predicted σ". */
  text: string;
}

/**
 * Where the Monte Carlo errors exceed what the covariance predicts beyond
 * the bounds that hold at every step at once: the RMS of a quantity above the
 * budget's σ times √(χ²_N(1 - 0.025/M)/N), or an average NEES above its
 * simultaneous χ² bound. Each stretch of consecutive flagged steps is one flag,
 * described at its worst step. Optimism has other causes than linearisation
 * (a truth effect the model leaves out, such as quantisation of a steady
 * input), and the text says so only through the numbers.
 */
export function findFlags(stats: StudyStatistics, outages: SimulatedOutage[]): SimulationFlag[] {
  const flags: SimulationFlag[] = [];
  for (const q of stats.quantities) {
    const over = (k: number) => q.budgetSigma[k] > 0 && q.rms[k] > q.simultaneousHigh[k];
    for (const [a, b, worst] of stretches(stats.tS.length, over, (k) => q.rms[k] / q.budgetSigma[k])) {
      const ratio = q.rms[worst] / q.budgetSigma[worst];
      flags.push(describe(stats, outages, q.id, a, b, worst, ratio, `RMS ${q.label} ${formatSignificant(ratio, 2)}× the predicted σ`));
    }
  }
  for (const g of stats.nees) {
    const over = (k: number) => g.dof[k] > 0 && g.average[k] > g.simultaneousHigh[k];
    for (const [a, b, worst] of stretches(stats.tS.length, over, (k) => g.average[k] / g.dof[k])) {
      const ratio = g.average[worst] / g.dof[worst];
      const words = `average NEES of the ${g.label} ${formatSignificant(g.average[worst], 3)} against ${formatSignificant(g.dof[worst], 3)} expected (bound ${formatSignificant(g.simultaneousHigh[worst], 3)})`;
      flags.push(describe(stats, outages, `nees:${g.id}`, a, b, worst, ratio, words));
    }
  }
  return flags.sort((x, y) => x.startS - y.startS);
}

/**
 * [first, last, worst] step of each stretch where `over` holds, joining
 * stretches less than 1 % of the mission apart (at least 10 steps): a
 * statistic hovering at its bound crosses it back and forth.
 */
function stretches(steps: number, over: (k: number) => boolean, score: (k: number) => number): [number, number, number][] {
  const gap = Math.max(10, Math.ceil(steps / 100));
  const out: [number, number, number][] = [];
  for (let k = 0; k < steps; k++) {
    if (!over(k)) continue;
    let worst = k, end = k;
    for (let j = k + 1; j < steps && j - end <= gap; j++) {
      if (!over(j)) continue;
      end = j;
      if (score(j) > score(worst)) worst = j;
    }
    out.push([k, end, worst]);
    k = end;
  }
  return out;
}

function describe(
  stats: StudyStatistics, outages: SimulatedOutage[], subject: string, a: number, b: number, worst: number, ratio: number, words: string,
): SimulationFlag {
  const t = stats.tS[worst];
  const outage = outages.find((o) => t >= o.startS - 1e-9 && t <= o.endS + 1e-9);
  const where = outage
    ? `${formatSignificant(t - outage.startS, 3)} s into outage ${outage.id} (${outage.sensorId})`
    : `at ${formatSignificant(t, 4)} s`;
  const span = a === b ? '' : ` (from ${formatSignificant(stats.tS[a], 4)} s to ${formatSignificant(stats.tS[b], 4)} s)`;
  return { subject, startS: stats.tS[a], endS: stats.tS[b], worstS: t, ratio, outage, text: `linearisation breaks down ${where}: ${words}${span}` };
}
