/**
 * Which Monte Carlo model a loaded budget gets: `simulate`, its worker
 * threads and `merge` all ask here, so a 3-D budget needs only the hook below.
 */
import type { InertialBudgetInput } from '../inertial/inertial-input';
import { inertialSimulation } from '../inertial/monte-carlo/inertial-simulation';
import type { MonteCarloModel } from '../simulation/monte-carlo-model';
import { planarSimulation } from '../simulation/planar-study';
import { withDocumentPaths, type LoadedBudget } from './load-budget';

/**
 * How the simulation loads a budget: the sheet and its input only (the model
 * runs its own totals-only analysis), without per-source contributions or a
 * JSON report that nothing would read.
 */
export const SIMULATION_LOAD = { contributions: false, report: false } as const;

/**
 * The Monte Carlo model of a loaded budget: the 3-D model
 * (inertialSimulation, docs/inertial-model.md §10) when {@link inertialInputOf}
 * finds a 3-D budget, the planar model otherwise.
 * @throws InputError naming the bad field (with the document's paths for a planar budget).
 */
export function simulationModelFor(loaded: LoadedBudget): MonteCarloModel {
  const inertial = inertialInputOf(loaded);
  if (inertial) return inertialSimulation(inertial);
  return withDocumentPaths(loaded, (input) => planarSimulation(input));
}

/**
 * INERTIAL DOCUMENT HOOK. The evaluated InertialBudgetInput of a loaded 3-D
 * budget document, or undefined for a planar one. Budget documents cannot
 * hold a 3-D budget yet (the document side and the CLI dispatch for 3-D
 * documents are being added separately); when a loaded budget carries one,
 * return it here and `simulate` and `merge` run the 3-D model with no other
 * change.
 */
export function inertialInputOf(loaded: LoadedBudget): InertialBudgetInput | undefined {
  const carried = (loaded as { inertialInput?: InertialBudgetInput }).inertialInput;
  return carried;
}
