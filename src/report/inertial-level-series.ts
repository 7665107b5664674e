/**
 * A 3-D budget's quantity at a requirement's level, and the verdict of a
 * requirement against its limit over its window. One-dimensional
 * quantities scale their 1σ by the two-sided normal factor of the level
 * (`confidenceFactor1D`); `horizontal` reads DRMS, 2DRMS, R95 or CEP by
 * level as planar budgets do (budgets/FORMAT.md, "3-D budgets",
 * Requirements; R95 and CEP from the exact bivariate normal,
 * docs/inertial-model.md §6).
 */
import type { ConfidenceLevel } from '../inputs/budget-input';
import type { InertialRequirementInput } from '../inertial/inertial-input';
import { confidenceFactor1D } from '../budget/confidence';
import { InputError } from '../errors';
import type { InertialBudget } from '../inertial/run-inertial';
import { INERTIAL_QUANTITIES } from '../inertial/inertial-quantities';
import type { DimensionName } from '../units';
import { toSI } from '../units';

/** The dimension of a limit on `quantity` (an INERTIAL_QUANTITIES id or `horizontal`). @throws InputError for another name. */
export function inertialLimitDimension(quantity: string, path: string): DimensionName {
  if (quantity === 'horizontal') return 'length';
  const q = INERTIAL_QUANTITIES.find((c) => c.id === quantity);
  if (!q) throw new InputError(path, `"${quantity}" is not a quantity of the 3-D model`);
  return q.unitSI === 'm' ? 'length' : q.unitSI === 'm/s' ? 'speed' : 'angle';
}

/** The SI series of `quantity` at `level` over every step. @throws InputError for an unknown quantity. */
export function inertialLevelSeries(budget: InertialBudget, quantity: string, level: ConfidenceLevel, path: string): Float64Array {
  if (quantity === 'horizontal') {
    if (level === '95%') return budget.r95M;
    if (level === '50%') return budget.cepM;
    const k = level === '2sigma' ? 2 : 1;
    return budget.series.drms.sigma.map((v) => k * v);
  }
  const series = budget.series[quantity];
  if (!series) throw new InputError(path, `"${quantity}" is not a quantity of the 3-D model`);
  const factor = confidenceFactor1D(level);
  return series.sigma.map((v) => factor * v);
}

/** One requirement's verdict over its window, every value in SI. */
export interface InertialVerdict {
  id: string;
  quantity: string;
  level: ConfidenceLevel;
  limitSI: number;
  /** Largest value in the window and when (s). */
  worstSI: number;
  worstAtS: number;
  /** First time in the window the value exceeds the limit (s), undefined when it never does. */
  firstExceedS?: number;
  pass: boolean;
  /** The window, s (-Infinity and Infinity without one). */
  windowS: [number, number];
}

/**
 * The verdict of `req` on every step of its window (the totals are kept at
 * every step, so the verdict is exact). An empty window passes with the
 * window's start as its worst time. @throws InputError naming the requirement.
 */
export function inertialVerdict(budget: InertialBudget, req: InertialRequirementInput, path: string): InertialVerdict {
  const dim = inertialLimitDimension(req.quantity, `${path}.quantity`);
  const limitSI = toSI(req.limit.value, req.limit.unit, dim, `${path}.limit`);
  const values = inertialLevelSeries(budget, req.quantity, req.level, path);
  const startS = req.window ? toSI(req.window.start.value, req.window.start.unit, 'time', `${path}.window.start`) : -Infinity;
  const endS = req.window ? toSI(req.window.end.value, req.window.end.unit, 'time', `${path}.window.end`) : Infinity;
  let worstSI = -Infinity, worstAtS = Number.isFinite(startS) ? startS : 0, firstExceedS: number | undefined;
  budget.rows.forEach((row, k) => {
    if (row.tS < startS || row.tS > endS) return;
    if (values[k] > worstSI) [worstSI, worstAtS] = [values[k], row.tS];
    if (firstExceedS === undefined && values[k] > limitSI) firstExceedS = row.tS;
  });
  if (worstSI === -Infinity) worstSI = 0;
  return {
    id: req.id, quantity: req.quantity, level: req.level, limitSI, worstSI, worstAtS,
    ...(firstExceedS !== undefined && { firstExceedS }), pass: firstExceedS === undefined, windowS: [startS, endS],
  };
}
