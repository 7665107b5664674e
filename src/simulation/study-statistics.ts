import { chiSquareQuantile } from './chi-square';
import type { StudyShape } from './monte-carlo-model';
import { groupField, quantityField, sumLayout, type StudySums } from './study-sums';

/** Two-sided probability outside the bands (95 % bands). */
export const BAND_TAIL = 0.05;

/** One quantity's Monte Carlo statistics over time (SI). */
export interface QuantityStatistics {
  id: string;
  label: string;
  unitSI: string;
  /** √(Σe²/N): the RMS error over the runs. */
  rms: Float64Array;
  /** Σe/N: the mean error (a bias shows here). */
  mean: Float64Array;
  /** √(mean of the filter's own variance). */
  filterSigma: Float64Array;
  /** The linearised budget's σ. */
  budgetSigma: Float64Array;
  /** 95 % band of the RMS of N runs if the budget's σ were right: σ √(χ²_N(0.025)/N) to σ √(χ²_N(0.975)/N). */
  bandLow: Float64Array;
  bandHigh: Float64Array;
  /** Upper bound holding at every step at once (Bonferroni over the steps), used for flags. */
  simultaneousHigh: Float64Array;
}

/** One NEES group's average over the runs with its χ² bounds. */
export interface NeesStatistics {
  id: string;
  label: string;
  average: Float64Array;
  /** Degrees of freedom of one run's NEES at each step. */
  dof: Float64Array;
  low: Float64Array;
  high: Float64Array;
  simultaneousHigh: Float64Array;
}

/** The study's statistics. */
export interface StudyStatistics {
  runs: number;
  tS: Float64Array;
  quantities: QuantityStatistics[];
  nees: NeesStatistics[];
}

/**
 * Statistics from the summed runs. With N independent runs and errors
 * N(0, σ²), N·RMS²/σ² is χ² with N degrees of freedom, and N times the
 * average NEES of an n-state group is χ² with N·n (Bar-Shalom, Li and
 * Kirubarajan, Estimation with Applications to Tracking and Navigation, 2001,
 * §5.4.2): the two-sided 95 % bounds are the χ² quantiles at 0.025 and
 * 0.975 over N. Checked at every step, a consistent filter still leaves a
 * 95 % band now and then, so flags use the simultaneous bound at
 * 1 - 0.025/M for M steps (Bonferroni).
 */
export function studyStatistics(model: StudyShape, sums: StudySums): StudyStatistics {
  const layout = sumLayout(model);
  const N = sums.runs, steps = layout.steps, d = sums.data;
  const simultaneousP = 1 - BAND_TAIL / 2 / steps;
  const q = cachedQuantile();
  const rmsFactor = (p: number) => Math.sqrt(q(p, N) / N);
  const [lowF, highF, simF] = [rmsFactor(BAND_TAIL / 2), rmsFactor(1 - BAND_TAIL / 2), rmsFactor(simultaneousP)];
  const quantities = model.quantities.map((spec, i): QuantityStatistics => {
    const st: QuantityStatistics = {
      ...spec, rms: new Float64Array(steps), mean: new Float64Array(steps), filterSigma: new Float64Array(steps),
      budgetSigma: new Float64Array(steps), bandLow: new Float64Array(steps), bandHigh: new Float64Array(steps),
      simultaneousHigh: new Float64Array(steps),
    };
    const f = quantityField(i);
    for (let k = 0; k < steps; k++) {
      const o = k * layout.fields + f;
      st.mean[k] = d[o] / N;
      st.rms[k] = Math.sqrt(d[o + 1] / N);
      st.filterSigma[k] = Math.sqrt(d[o + 2] / N);
      const sigma = Math.sqrt(model.budgetVariance[i][k]);
      st.budgetSigma[k] = sigma;
      st.bandLow[k] = sigma * lowF;
      st.bandHigh[k] = sigma * highF;
      st.simultaneousHigh[k] = sigma * simF;
    }
    return st;
  });
  const nees = model.neesGroups.map((spec, g): NeesStatistics => {
    const st: NeesStatistics = {
      ...spec, average: new Float64Array(steps), dof: new Float64Array(steps),
      low: new Float64Array(steps), high: new Float64Array(steps), simultaneousHigh: new Float64Array(steps),
    };
    const f = groupField(layout, g);
    for (let k = 0; k < steps; k++) {
      const o = k * layout.fields + f;
      const dofTotal = d[o + 1];
      st.average[k] = d[o] / N;
      st.dof[k] = dofTotal / N;
      st.low[k] = dofTotal > 0 ? q(BAND_TAIL / 2, dofTotal) / N : 0;
      st.high[k] = dofTotal > 0 ? q(1 - BAND_TAIL / 2, dofTotal) / N : 0;
      st.simultaneousHigh[k] = dofTotal > 0 ? q(simultaneousP, dofTotal) / N : 0;
    }
    return st;
  });
  return { runs: N, tS: model.stepTimesS, quantities, nees };
}

/** χ² quantiles cached by (p, dof): most steps share a few degrees of freedom. */
function cachedQuantile(): (p: number, dof: number) => number {
  const cache = new Map<string, number>();
  return (p, dof) => {
    const key = `${p}:${dof}`;
    let v = cache.get(key);
    if (v === undefined) cache.set(key, (v = chiSquareQuantile(p, dof)));
    return v;
  };
}
