import { InputError } from './errors';
import { positiveToSI, requireOneOf } from './inputs/checks';
import type { BudgetInput, ConfidenceLevel } from './inputs/budget-input';
import { LEVELS } from './budget/levels';
import { resolveMission, type ResolvedMission } from './mission/resolve-mission';
import { buildNominalTrajectory, stepTimes, type NominalTrajectory } from './mission/nominal-trajectory';
import { buildErrorModel } from './sensors/build-error-model';
import { refuseZeroMeasurementNoise } from './sensors/measurement-noise-check';
import type { ErrorModel } from './covariance/error-model';
import { runCovariance, type CovarianceHistory } from './covariance/run-covariance';
import { estimateWork, refuseExcessiveWork, WORK_LIMITS } from './covariance/work-estimate';
import { buildBudgetSeries, buildTotalSeries, type BudgetSeries } from './budget/budget-series';
import { planRecording, recordingStride } from './covariance/record-plan';
import { evaluateRequirement, resolveRequirements, type RequirementResult, type ResolvedRequirement } from './budget/requirements';
import { refuseWindowsWithoutSteps } from './budget/window-steps';
import { coarseLsbWarnings, type ModelWarning } from './budget/coarse-lsb';
import { checkpointBudgets, nearestStep, resolveCheckpoints, type CheckpointBudget } from './budget/checkpoints';

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
  /** Rows the analysis ran with but models optimistically (an LSB coarser than the motion); shown with the status. */
  warnings: ModelWarning[];
  /** The stride the series were recorded at (1: every step); requirements are evaluated on every step regardless. */
  recordEvery: number;
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

/** A budget resolved and checked up to the covariance run. */
export interface PreparedBudget {
  mission: ResolvedMission;
  stepS: number;
  model: ErrorModel;
  requirementSpecs: ResolvedRequirement[];
}

/**
 * Everything before the covariance run: resolve the mission and the step,
 * assemble the error model, refuse an aiding sensor with R = 0 and work over the limits, resolve the
 * requirements and check that each window holds a step. Cheap (no
 * propagation), so callers can use it to find every refused item first.
 * @throws InputError (a {@link SigmaLedgerError}) naming the bad field.
 */
export function prepareBudget(input: BudgetInput, options: { contributions?: boolean } = {}): PreparedBudget {
  if (!input || typeof input !== 'object') throw new InputError('', 'the budget must be an object');
  const mission = resolveMission(input.mission);
  const stepS = resolveStep(input, mission.durationS);
  const model = buildErrorModel(input.sensors, mission, input.mission.initialSigmaNotes);
  refuseZeroMeasurementNoise(model, input.sensors);
  refuseExcessiveWork(estimateWork(model, input.sensors, mission.durationS, stepS, options), model, input.sensors);
  const requirementSpecs = resolveRequirements(input.requirements, mission.durationS);
  refuseWindowsWithoutSteps(requirementSpecs, stepTimes(mission.durationS, stepS), stepS);
  return { mission, stepS, model, requirementSpecs };
}

/**
 * Datasheet rows to budgets: {@link prepareBudget}, then sample the nominal
 * path, run the covariance analysis with per-source contributions (unless
 * `contributions: false`, which runs the total alone, several times
 * faster), recording the steps `every` asks for, then evaluate requirements
 * on the total at every step and read checkpoints off the recorded series.
 * @throws InputError (a {@link SigmaLedgerError}) naming the bad field.
 */
export function computeBudget(input: BudgetInput, options: ComputeOptions = {}): BudgetResult {
  const { mission, stepS, model, requirementSpecs } = prepareBudget(input, options);
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
  const warnings = coarseLsbWarnings(input.sensors, mission);
  return { mission, model, trajectory, history, series, recordEvery, requirements, checkpoints, reportLevel, warnings };
}

function resolveStep(input: BudgetInput, durationS: number): number {
  const stepS = positiveToSI(input.step, 'time', 'step');
  if (stepS > durationS) throw new InputError('step.value', `the step (${stepS} s) is longer than the mission (${durationS} s)`);
  if (durationS / stepS > MAX_STEPS) {
    throw new InputError('step.value', `${Math.ceil(durationS / stepS)} steps is more than ${MAX_STEPS}; use a longer step`);
  }
  return stepS;
}
