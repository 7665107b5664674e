/**
 * The 3-D counterpart of pipeline.ts: an evaluated 3-D budget to its result
 * through the inertial engine (runInertialBudget) and the shared budget code
 * of src/budget/ (requirements with times-to-exceed, checkpoints with
 * per-source shares).
 */
import { InputError } from './errors';
import { positiveToSI, requireOneOf } from './inputs/checks';
import type { ConfidenceLevel } from './inputs/budget-input';
import { LEVELS } from './budget/levels';
import { nearestStep, resolveCheckpoints, sharesAt, type SourceShare } from './budget/checkpoints';
import { evaluateInertialRequirements, resolveInertialRequirements } from './budget/inertial-requirements';
import type { RequirementResult, ResolvedRequirement } from './budget/requirements';
import { WORK_LIMITS } from './covariance/work-estimate';
import { buildInertialModel } from './inertial/build-inertial-model';
import type { InertialBudgetInput } from './inertial/inertial-input';
import { resolveInertialMission, type ResolvedInertialMission } from './inertial/inertial-mission';
import { INERTIAL_QUANTITIES } from './inertial/inertial-quantities';
import { runInertialBudget, type InertialBudget } from './inertial/run-inertial';

/** One quantity's budget at a checkpoint: total 1σ (SI) and each source's part, largest first. */
export interface InertialQuantityBudget {
  quantity: string;
  /** SI unit of the sigma. */
  unitSI: string;
  totalSigmaSI: number;
  shares: SourceShare[];
}

/** The 3-D budget at a named time (the step nearest the requested time). */
export interface InertialCheckpointBudget {
  id: string;
  tS: number;
  requestedS: number;
  quantities: InertialQuantityBudget[];
}

/** Everything one 3-D analysis produces. */
export interface InertialBudgetResult {
  model: 'inertial';
  mission: ResolvedInertialMission;
  stepS: number;
  budget: InertialBudget;
  requirements: RequirementResult<string>[];
  checkpoints: InertialCheckpointBudget[];
  /** Level of the budget tables (settings.level; default 1sigma). */
  reportLevel: ConfidenceLevel;
}

/** A 3-D budget checked up to the covariance run. */
export interface PreparedInertialBudget {
  mission: ResolvedInertialMission;
  stepS: number;
  requirementSpecs: ResolvedRequirement<string>[];
}

/**
 * Everything before the covariance run: mission, step, the model (every row
 * and sensor checked), requirements and checkpoints. Cheap, so callers use it
 * to find refused items first.
 * @throws InputError naming the bad field (an engine path: see inertialDocumentPathOf).
 */
export function prepareInertialBudget(input: InertialBudgetInput): PreparedInertialBudget {
  if (!input || typeof input !== 'object') throw new InputError('', 'the budget must be an object');
  const mission = resolveInertialMission(input.mission);
  const stepS = positiveToSI(input.step, 'time', 'step');
  if (stepS > mission.durationS) throw new InputError('step.value', `the step (${stepS} s) is longer than the mission (${mission.durationS} s)`);
  if (mission.durationS / stepS > WORK_LIMITS.steps) {
    throw new InputError('step.value', `${Math.ceil(mission.durationS / stepS)} steps is more than ${WORK_LIMITS.steps}; use a longer step`);
  }
  buildInertialModel(input, mission);
  const requirementSpecs = resolveInertialRequirements(input, mission.durationS);
  resolveCheckpoints(input.checkpoints, mission.durationS);
  return { mission, stepS, requirementSpecs };
}

/**
 * An evaluated 3-D budget to its result: {@link prepareInertialBudget}, the
 * inertial run (with per-source contributions unless `contributions: false`),
 * requirement verdicts on every step and checkpoint budgets of every
 * quantity of INERTIAL_QUANTITIES.
 * @throws InputError naming the bad field.
 */
export function computeInertialBudget(input: InertialBudgetInput, options: { contributions?: boolean } = {}): InertialBudgetResult {
  const { mission, stepS, requirementSpecs } = prepareInertialBudget(input);
  const budget = runInertialBudget(input, { contributions: options.contributions !== false });
  const requirements = evaluateInertialRequirements(requirementSpecs, budget);
  const tS = Float64Array.from(budget.rows, (r) => r.tS);
  const checkpoints = resolveCheckpoints(input.checkpoints, mission.durationS).map(({ id, s }) => {
    const k = nearestStep(tS, s);
    return { id, tS: tS[k], requestedS: s, quantities: quantityBudgetsAt(budget, k) };
  });
  const reportLevel = input.reportLevel === undefined ? '1sigma' : requireOneOf(input.reportLevel, LEVELS, 'reportLevel');
  return { model: 'inertial', mission, stepS, budget, requirements, checkpoints, reportLevel };
}

/** Every quantity's budget at step k. Throws nothing. */
export function quantityBudgetsAt(budget: InertialBudget, k: number): InertialQuantityBudget[] {
  return INERTIAL_QUANTITIES.map((q) => {
    const s = budget.series[q.id];
    const total = s.sigma[k] ** 2;
    return { quantity: q.id, unitSI: q.unitSI, totalSigmaSI: s.sigma[k], shares: sharesAt(total, s.varianceBySource, budget.model.sources, k) };
  });
}
