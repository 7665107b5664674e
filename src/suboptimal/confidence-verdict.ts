/**
 * Believed versus actual sigma of each quantity, and a plain verdict: a
 * filter whose actual error is larger than it believes is overconfident
 * (its covariance cannot be trusted for integrity or gating); one whose
 * actual error is smaller is conservative.
 */
import { VARIANCE_QUANTITIES, type BudgetSeries, type VarianceQuantity } from '../budget/budget-series';
import { DISPLAY, varianceFactor } from '../report/display-units';
import { formatSignificant } from '../units';

/** Ratios within this factor of 1 count as consistent (common practice, no source). */
export const CONSISTENT_WITHIN = 1.05;

/** One quantity's believed and actual sigma at one time. */
export interface SigmaPair {
  tS: number;
  /** In the quantity's display unit (deg for heading, m, m/s). */
  believedSigma: number;
  actualSigma: number;
  /** actual / believed (Infinity when the filter believes zero but is not). */
  ratio: number;
}

/** The comparison of one quantity over the mission. */
export interface ConfidenceVerdict {
  quantity: VarianceQuantity;
  unit: string;
  atEnd: SigmaPair;
  /** Where actual / believed is largest. */
  mostOverconfident: SigmaPair;
  /** Where actual / believed is smallest. */
  mostConservative: SigmaPair;
  /** E.g. "the filter believes 0.8 m, the actual error is 1.3 m: overconfident by 1.6×" (at the largest ratio). */
  verdict: string;
}

/** Believed vs actual for every quantity both series carry. Throws nothing. */
export function confidenceVerdicts(believed: BudgetSeries, actual: BudgetSeries): ConfidenceVerdict[] {
  return VARIANCE_QUANTITIES.flatMap((q) => {
    const b = believed.quantities[q], a = actual.quantities[q];
    if (!b || !a) return [];
    const f = varianceFactor(q);
    const pair = (k: number): SigmaPair => {
      const bs = Math.sqrt(Math.max(0, b.total[k] * f)), as = Math.sqrt(Math.max(0, a.total[k] * f));
      return { tS: actual.tS[k], believedSigma: bs, actualSigma: as, ratio: bs > 0 ? as / bs : as > 0 ? Infinity : 1 };
    };
    let hi = pair(0), lo = hi;
    for (let k = 1; k < actual.tS.length; k++) {
      const p = pair(k);
      if (p.ratio > hi.ratio) hi = p;
      if (p.ratio < lo.ratio) lo = p;
    }
    const worst = hi.ratio >= 1 / lo.ratio ? hi : lo;
    return [{ quantity: q, unit: DISPLAY[q].unit, atEnd: pair(actual.tS.length - 1), mostOverconfident: hi, mostConservative: lo, verdict: verdictText(worst, DISPLAY[q].unit) }];
  });
}

/** The plain verdict of one believed/actual pair. Throws nothing. */
export function verdictText(p: SigmaPair, unit: string): string {
  const f = (x: number) => `${formatSignificant(x, 2)} ${unit}`;
  const head = `the filter believes ${f(p.believedSigma)}, the actual error is ${f(p.actualSigma)}`;
  const at = ` (at ${formatSignificant(p.tS, 4)} s)`;
  if (!Number.isFinite(p.ratio)) return `${head}: overconfident (it believes the error is zero)${at}`;
  if (p.ratio > CONSISTENT_WITHIN) return `${head}: overconfident by ${formatSignificant(p.ratio, 2)}×${at}`;
  if (p.ratio < 1 / CONSISTENT_WITHIN) return `${head}: conservative by ${formatSignificant(1 / p.ratio, 2)}×${at}`;
  return `${head}: consistent (within ${Math.round((CONSISTENT_WITHIN - 1) * 100)} %)${at}`;
}
