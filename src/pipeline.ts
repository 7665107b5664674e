import { InputError } from './errors';
import { positiveToSI, requireOneOf } from './inputs/checks';
import type { BudgetInput, ConfidenceLevel } from './inputs/budget-input';
import { LEVELS } from './budget/levels';
import { resolveMission, type ResolvedMission } from './mission/resolve-mission';
import { buildNominalTrajectory, type NominalTrajectory } from './mission/nominal-trajectory';
import { buildErrorModel } from './sensors/build-error-model';
import type { ErrorModel } from './covariance/error-model';
import { runCovariance, type CovarianceHistory } from './covariance/run-covariance';
import { estimateWork, refuseExcessiveWork, WORK_LIMITS } from './covariance/work-estimate';
import { buildBudgetSeries, type BudgetSeries } from './budget/budget-series';
import { evaluateRequirement, resolveRequirements, type RequirementResult } from './budget/requirements';
import { checkpointBudgets, type CheckpointBudget } from './budget/checkpoints';

/** Most steps one analysis may take (a 2-hour mission at 0.01 s); keeps a typo in the step from hanging the page. */
export const MAX_STEPS = WORK_LIMITS.steps;

/** Everything one analysis produces. */
export interface BudgetResult {
  mission: ResolvedMission;
  model: ErrorModel;
  trajectory: NominalTrajectory;
  history: CovarianceHistory;
  series: BudgetSeries;
  requirements: RequirementResult[];
  checkpoints: CheckpointBudget[];
  /** Level at which reports show budget-table values (settings.level; default 1sigma). */
  reportLevel: ConfidenceLevel;
}

/**
 * Datasheet rows to budgets: resolve the mission, assemble the error model,
 * sample the nominal path, run the covariance analysis with per-source
 * contributions (unless `contributions: false`, which runs the total alone,
 * several times faster), then read requirements and checkpoints off the series.
 * @throws InputError (a {@link SigmaLedgerError}) naming the bad field.
 */
export function computeBudget(input: BudgetInput, options: { contributions?: boolean } = {}): BudgetResult {
  if (!input || typeof input !== 'object') throw new InputError('', 'the budget must be an object');
  const mission = resolveMission(input.mission);
  const stepS = resolveStep(input, mission.durationS);
  const model = buildErrorModel(input.sensors, mission, input.mission.initialSigmaNotes);
  refuseExcessiveWork(estimateWork(model, input.sensors, mission.durationS, stepS, options), model, input.sensors);
  const requirementSpecs = resolveRequirements(input.requirements, mission.durationS);
  const trajectory = buildNominalTrajectory(mission, stepS);
  const history = runCovariance(model, trajectory, { contributions: options.contributions });
  const series = buildBudgetSeries(model, trajectory, history);
  const requirements = requirementSpecs.map((r) => evaluateRequirement(r, series, model.streams));
  const checkpoints = checkpointBudgets(input.checkpoints, series, model.sources);
  const reportLevel = input.reportLevel === undefined ? '1sigma' : requireOneOf(input.reportLevel, LEVELS, 'reportLevel');
  return { mission, model, trajectory, history, series, requirements, checkpoints, reportLevel };
}

function resolveStep(input: BudgetInput, durationS: number): number {
  const stepS = positiveToSI(input.step, 'time', 'step');
  if (stepS > durationS) throw new InputError('step.value', `the step (${stepS} s) is longer than the mission (${durationS} s)`);
  if (durationS / stepS > MAX_STEPS) {
    throw new InputError('step.value', `${Math.ceil(durationS / stepS)} steps is more than ${MAX_STEPS}; use a longer step`);
  }
  return stepS;
}
