import { InputError } from './errors';
import { positiveToSI, requireOneOf } from './inputs/checks';
import type { BudgetInput, ConfidenceLevel } from './inputs/budget-input';
import { LEVELS } from './budget/levels';
import { resolveMission, type ResolvedMission } from './mission/resolve-mission';
import { buildNominalTrajectory, type NominalTrajectory } from './mission/nominal-trajectory';
import { buildErrorModel } from './sensors/build-error-model';
import type { ErrorModel } from './covariance/error-model';
import { runCovariance, type CovarianceHistory } from './covariance/run-covariance';
import { buildBudgetSeries, buildTotalSeries, type BudgetSeries } from './budget/budget-series';
import { planRecording, recordingStride } from './covariance/record-plan';
import { evaluateRequirement, resolveRequirements, type RequirementResult } from './budget/requirements';
import { checkpointBudgets, nearestStep, resolveCheckpoints, type CheckpointBudget } from './budget/checkpoints';

/** Most steps one analysis may take (a 2-hour mission at 0.01 s); keeps a typo in the step from hanging the page. */
export const MAX_STEPS = 720_000;

/** Everything one analysis produces. */
export interface BudgetResult {
  mission: ResolvedMission;
  model: ErrorModel;
  trajectory: NominalTrajectory;
  history: CovarianceHistory;
  /** The budget at the recorded steps (every step, every N-th with `every`, plus checkpoints and the last). */
  series: BudgetSeries;
  /** Steps between recorded steps (1 keeps every step; larger for `every` or a mission too long to keep whole). */
  recordEvery: number;
  requirements: RequirementResult[];
  checkpoints: CheckpointBudget[];
  /** Level at which reports show budget-table values (settings.level; default 1sigma). */
  reportLevel: ConfidenceLevel;
}

/** Options of {@link computeBudget}. */
export interface ComputeOptions {
  /** Carry every source's share (default true); false runs the total alone, several times faster. */
  contributions?: boolean;
  /**
   * Keep the series at every N-th step (plus checkpoints and the last step);
   * default 1. A mission too long to keep whole is thinned anyway (see
   * record-plan.ts). Verdicts, margins and times-to-exceed are evaluated on
   * every step whatever N is.
   */
  every?: number;
  /** Keep at most this many steps (a larger stride when needed), e.g. what a chart can draw. */
  maxRecordedSteps?: number;
}

/**
 * Datasheet rows to budgets: resolve the mission, assemble the error model,
 * sample the nominal path, run the covariance analysis with per-source
 * contributions (unless `contributions: false`), recording the steps
 * `every` asks for, then evaluate requirements on the total at every step
 * and read checkpoints off the recorded series.
 * @throws InputError (a {@link SigmaLedgerError}) naming the bad field.
 */
export function computeBudget(input: BudgetInput, options: ComputeOptions = {}): BudgetResult {
  if (!input || typeof input !== 'object') throw new InputError('', 'the budget must be an object');
  const mission = resolveMission(input.mission);
  const stepS = resolveStep(input, mission.durationS);
  const model = buildErrorModel(input.sensors, mission, input.mission.initialSigmaNotes);
  const requirementSpecs = resolveRequirements(input.requirements, mission.durationS);
  const trajectory = buildNominalTrajectory(mission, stepS);
  const wanted = resolveCheckpoints(input.checkpoints, mission.durationS);
  const contributions = options.contributions !== false;
  const steps = trajectory.tS.length;
  const chartStride = options.maxRecordedSteps ? Math.ceil(steps / options.maxRecordedSteps) : 1;
  const recordEvery = recordingStride(steps, contributions ? model.sources.length : 0, Math.max(options.every ?? 1, chartStride));
  const record = planRecording(steps, recordEvery, wanted.map((w) => nearestStep(trajectory.tS, w.s)));
  const history = runCovariance(model, trajectory, { contributions, record });
  const series = buildBudgetSeries(model, trajectory, history);
  const exact = recordEvery === 1 && history.steps === steps
    ? series
    : buildTotalSeries(model, trajectory, history, requirementSpecs.some((r) => r.quantity === 'horizontal' && (r.level === '95%' || r.level === '50%')));
  const requirements = requirementSpecs.map((r) => evaluateRequirement(r, exact, model.streams));
  const checkpoints = checkpointBudgets(wanted, series, model.sources);
  const reportLevel = input.reportLevel === undefined ? '1sigma' : requireOneOf(input.reportLevel, LEVELS, 'reportLevel');
  return { mission, model, trajectory, history, series, recordEvery, requirements, checkpoints, reportLevel };
}

function resolveStep(input: BudgetInput, durationS: number): number {
  const stepS = positiveToSI(input.step, 'time', 'step');
  if (stepS > durationS) throw new InputError('step.value', `the step (${stepS} s) is longer than the mission (${durationS} s)`);
  if (durationS / stepS > MAX_STEPS) {
    throw new InputError('step.value', `${Math.ceil(durationS / stepS)} steps is more than ${MAX_STEPS}; use a longer step`);
  }
  return stepS;
}
