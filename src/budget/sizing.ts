import { InputError } from '../errors';
import type { BudgetInput, SourceInput } from '../inputs/budget-input';
import { resolveMission } from '../mission/resolve-mission';
import { buildNominalTrajectory } from '../mission/nominal-trajectory';
import { buildErrorModel } from '../sensors/build-error-model';
import { runCovariance } from '../covariance/run-covariance';
import { positiveToSI } from '../inputs/checks';
import { buildBudgetSeries } from './budget-series';
import { evaluateRequirement, resolveRequirements, type RequirementResult } from './requirements';

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
  atLargestPassing?: RequirementResult;
  atSmallestFailing?: RequirementResult;
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
export function sizeSource(input: BudgetInput, requirementId: string, sourceId: string, options: SizingOptions = {}): SizingResult {
  const row = findRow(input, sourceId);
  const tolerance = options.relativeTolerance ?? 1e-3;
  let trials = 0;
  const trial = (value: number): RequirementResult => {
    const r = evaluateWith(input, sourceId, value, requirementId);
    options.onTrial?.(++trials, value, r.verdict);
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

function findRow(input: BudgetInput, sourceId: string): SourceInput {
  const dot = sourceId.indexOf('.');
  const sensor = input.sensors?.find((s) => s.id === sourceId.slice(0, dot));
  const row = sensor?.sources?.find((r) => r.id === sourceId.slice(dot + 1));
  if (dot < 0 || !row) throw new InputError('vary', `no row "${sourceId}"; give it as sensorId.rowId`);
  return row;
}

/** Runs the total covariance only (no contributions) with one row's value replaced. */
function evaluateWith(input: BudgetInput, sourceId: string, value: number, requirementId: string): RequirementResult {
  const copy = JSON.parse(JSON.stringify(input)) as BudgetInput;
  findRow(copy, sourceId).value.value = value;
  const mission = resolveMission(copy.mission);
  const stepS = positiveToSI(copy.step, 'time', 'step');
  const model = buildErrorModel(copy.sensors, mission, copy.mission.initialSigmaNotes);
  const req = resolveRequirements(copy.requirements, mission.durationS).find((r) => r.id === requirementId);
  if (!req) throw new InputError('requirement', `no requirement "${requirementId}"`);
  const traj = buildNominalTrajectory(mission, stepS);
  const series = buildBudgetSeries(model, traj, runCovariance(model, traj, { contributions: false }));
  return evaluateRequirement(req, series, model.streams);
}
