import type { BudgetResult } from '../pipeline';
import type { QuantityName } from '../inputs/budget-input';
import { levelSeries, limitDimension } from '../budget/levels';
import { fromSI, toSI } from '../units';

/** A requirement's own series: its quantity at its level, in `unit` (the limit's unit unless asked otherwise), at every step. */
export interface RequirementSeries {
  id: string;
  quantity: QuantityName;
  level: string;
  /** The limit in `unit`. */
  limit: number;
  unit: string;
  values: Float64Array;
}

/**
 * Every requirement's series for drawing against its limit (the page's and
 * the report's charts). `unitFor` picks the unit per quantity; by default
 * each requirement keeps its limit's unit.
 * @throws InputError as {@link levelSeries} for a quantity the suite lacks.
 */
export function requirementSeries(result: BudgetResult, unitFor?: (q: QuantityName) => string): RequirementSeries[] {
  return result.requirements.map((req) => {
    const dim = limitDimension(req.quantity);
    const unit = unitFor?.(req.quantity) ?? req.limit.unit;
    const perSI = fromSI(1, unit, dim, req.id);
    const limit = unit === req.limit.unit ? req.limit.value : toSI(req.limit.value, req.limit.unit, dim, req.id) * perSI;
    const si = levelSeries(result.series, req.quantity, req.level, req.id);
    return { id: req.id, quantity: req.quantity, level: req.level, limit, unit, values: si.map((v) => v * perSI) };
  });
}
