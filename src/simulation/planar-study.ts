import type { BudgetInput } from '../inputs/budget-input';
import { computeBudget } from '../pipeline';
import { planPlanarRuns } from './planar-plan';
import { PlanarSimulation } from './planar-simulation';

/**
 * The planar Monte Carlo model of a budget: the budget's own analysis (total
 * covariance, no contributions) for the predicted σ, and its error model,
 * mission and nominal path for truth and filter.
 * @throws InputError (a SigmaLedgerError) naming the bad field, as computeBudget does.
 */
export function planarSimulation(input: BudgetInput): PlanarSimulation {
  const budget = computeBudget(input, { contributions: false });
  const plan = planPlanarRuns(budget.model, budget.mission, budget.trajectory);
  return new PlanarSimulation(plan, budget.series);
}
