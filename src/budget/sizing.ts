import { estimateWork, refuseExcessiveWork } from '../covariance/work-estimate';
import { InputError } from '../errors';
import type { BudgetInput, SourceInput } from '../inputs/budget-input';
import { resolveMission } from '../mission/resolve-mission';
import { buildNominalTrajectory } from '../mission/nominal-trajectory';
import { buildErrorModel } from '../sensors/build-error-model';
import { runCovariance } from '../covariance/run-covariance';
import { positiveToSI } from '../inputs/checks';
import { buildBudgetSeries } from './budget-series';
import { evaluateRequirement, resolveRequirements, type RequirementResult } from './requirements';
import type { InertialBudgetInput } from '../inertial/inertial-input';
import type { Quantity } from '../inputs/budget-input';
import { inertialRequirementsOf } from './inertial-requirements';

/**
 * The input of either model that sizing works on: the bisection, the row
 * lookup and the trial runs below serve planar and 3-D budgets alike; only
 * {@link requirementsOf} and the row list differ by model.
 */
export type SizableInput = BudgetInput | InertialBudgetInput;

/** True for a 3-D input (it has an IMU). Throws nothing. */
export function isInertialInput(input: SizableInput): input is InertialBudgetInput {
  return 'imu' in input;
}

/** Every row of an input by its full id, in document order. */
function rowsOf(input: SizableInput): { id: string; row: { value: Quantity } }[] {
  const sensors = isInertialInput(input)
    ? [{ id: input.imu.id, rows: input.imu.rows }, ...(input.aiding ?? []).map((a) => ({ id: a.id, rows: a.rows }))]
    : (input.sensors ?? []).map((s) => ({ id: s.id, rows: s.sources ?? [] }));
  return sensors.flatMap((s) => (s.rows ?? []).map((row) => ({ id: `${s.id}.${row.id}`, row })));
}

/** Options of {@link sizeSource}. */
export interface SizingOptions {
  /** Relative width of the final bracket (default 1e-3). */
  relativeTolerance?: number;
  /** Called after each trial with the trial count, for progress output. */
  onTrial?: (trial: number, value: number, verdict: 'pass' | 'fail') => void;
}

/** The answer of a sizing run, in the row's own unit. */
export interface SizingResult {
  requirementId: string;
  sourceId: string;
  unit: string;
  /**
   * 'bounded': largest passing value found; 'always-passes': it passes up to the
   * largest value tried (see `stoppedBecause`); 'never-passes': fails even at zero.
   */
  outcome: 'bounded' | 'always-passes' | 'never-passes';
  /** Largest value known to pass (0 for never-passes). */
  largestPassing: number;
  /** Smallest value known to fail (undefined for always-passes). */
  smallestFailing?: number;
  /** Half the final bracket, in the row's unit. */
  tolerance: number;
  atLargestPassing?: RequirementResult<string>;
  atSmallestFailing?: RequirementResult<string>;
  trials: number;
  /** For 'always-passes': why the search stopped (the row's valid range, or the doubling limit). */
  stoppedBecause?: string;
}

/** Search at most 2^20 (about a million) times the row's own value: beyond that the linear model is meaningless anyway. */
const MAX_DOUBLINGS = 20;

/**
 * The largest value of one row's magnitude that still meets a requirement,
 * by bisection (docs/planar-model.md §9): for an optimal filter the covariance never
 * decreases when a noise magnitude grows, so pass/fail changes once.
 * Correlation times are not monotone and cannot be sized this way.
 * @param sourceId `sensorId.rowId`.
 * @throws InputError for an unknown requirement or row.
 */
export function sizeSource(input: SizableInput, requirementId: string, sourceId: string, options: SizingOptions = {}): SizingResult {
  const row = findRow(input, sourceId);
  const tolerance = options.relativeTolerance ?? 1e-3;
  let trials = 0;
  const trial = (value: number): RequirementResult<string> => {
    const r = evaluateWith(input, sourceId, value, requirementId);
    trials++;
    options.onTrial?.(trials, value, r.verdict);
    return r;
  };
  const base = { requirementId, sourceId, unit: row.value.unit };
  const atZero = trial(0);
  if (atZero.verdict === 'fail') return { ...base, outcome: 'never-passes', largestPassing: 0, smallestFailing: 0, tolerance: 0, atSmallestFailing: atZero, trials };
  let lo = 0, loResult = atZero;
  let hi = row.value.value > 0 ? row.value.value : 1;
  let hiResult = trial(hi);
  for (let d = 0; hiResult.verdict === 'pass'; d++) {
    lo = hi; loResult = hiResult;
    const stop = (why: string): SizingResult => ({ ...base, outcome: 'always-passes', largestPassing: lo, tolerance: 0, atLargestPassing: loResult, trials, stoppedBecause: why });
    if (d >= MAX_DOUBLINGS) return stop(`still passing after ${MAX_DOUBLINGS} doublings`);
    hi *= 2;
    try {
      hiResult = trial(hi);
    } catch (e) {
      if (e instanceof InputError) return stop(`the next value, ${hi} ${row.value.unit}, is outside the row's valid range (${e.message})`);
      throw e;
    }
  }
  while (hi - lo > tolerance * hi) {
    const mid = 0.5 * (lo + hi);
    const r = trial(mid);
    if (r.verdict === 'pass') { lo = mid; loResult = r; } else { hi = mid; hiResult = r; }
  }
  return {
    ...base, outcome: 'bounded', largestPassing: lo, smallestFailing: hi, tolerance: 0.5 * (hi - lo),
    atLargestPassing: loResult, atSmallestFailing: hiResult, trials,
  };
}

/** Ids (`sensorId.rowId`) of every row whose magnitude can be sized or swept, in document order. */
export function sizableRowIds(input: SizableInput): string[] {
  return rowsOf(input).map((r) => r.id);
}

/**
 * The row `sourceId` (`sensorId.rowId`) of an input.
 * @throws InputError at 'vary' listing the rows that exist.
 */
export function findRow(input: BudgetInput, sourceId: string): SourceInput;
export function findRow(input: SizableInput, sourceId: string): { value: Quantity };
export function findRow(input: SizableInput, sourceId: string): { value: Quantity } {
  const row = rowsOf(input).find((r) => r.id === sourceId)?.row;
  if (!row) throw new InputError('vary', `no row "${sourceId}"; give it as sensorId.rowId, one of ${sizableRowIds(input).join(', ')}`);
  return row;
}

/**
 * Every requirement's verdict with one row's magnitude replaced by `value`
 * (in the row's unit), from one run of the total covariance (no contributions).
 * @throws InputError for an unknown row or a value outside the row's valid range.
 */
export function requirementsWith(input: BudgetInput, sourceId: string, value: number): RequirementResult[];
export function requirementsWith(input: SizableInput, sourceId: string, value: number): RequirementResult<string>[];
export function requirementsWith(input: SizableInput, sourceId: string, value: number): RequirementResult<string>[] {
  const copy = JSON.parse(JSON.stringify(input)) as SizableInput;
  findRow(copy, sourceId).value.value = value;
  return requirementsOf(copy);
}

/** Every requirement's verdict of an input of either model, from one run of the total covariance. */
export function requirementsOf(input: BudgetInput): RequirementResult[];
export function requirementsOf(input: SizableInput): RequirementResult<string>[];
export function requirementsOf(input: SizableInput): RequirementResult<string>[] {
  if (isInertialInput(input)) return inertialRequirementsOf(input);
  const mission = resolveMission(input.mission);
  const stepS = positiveToSI(input.step, 'time', 'step');
  const model = buildErrorModel(input.sensors, mission, input.mission.initialSigmaNotes);
  refuseExcessiveWork(estimateWork(model, input.sensors, mission.durationS, stepS, { contributions: false }), model, input.sensors);
  const reqs = resolveRequirements(input.requirements, mission.durationS);
  const traj = buildNominalTrajectory(mission, stepS);
  const series = buildBudgetSeries(model, traj, runCovariance(model, traj, { contributions: false }));
  return reqs.map((r) => evaluateRequirement(r, series, model.streams));
}

/** One requirement's verdict with one row's value replaced. */
function evaluateWith(input: SizableInput, sourceId: string, value: number, requirementId: string): RequirementResult<string> {
  const r = requirementsWith(input, sourceId, value).find((x) => x.id === requirementId);
  if (!r) throw new InputError('requirement', `no requirement "${requirementId}"; the budget has ${(input.requirements ?? []).map((x) => x.id).join(', ') || 'none'}`);
  return r;
}
