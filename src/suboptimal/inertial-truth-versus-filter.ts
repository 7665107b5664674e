/**
 * The suboptimal-filter analysis of the 3-D model (docs/inertial-model.md,
 * docs/suboptimal-filter.md): the truth from one InertialBudgetInput, the
 * filter's design from another over the same mission (same step, segments and
 * aiding measurements; its rows may differ), both as CovarianceProblems on
 * one nominal trajectory, states matched by name, run together by the
 * shared truth-versus-filter recursion. Every truth state is carried in z
 * (exact for any design; the planar model prunes, carried-states.ts).
 */
import { InputError } from '../errors';
import { positiveToSI } from '../inputs/checks';
import type { CovarianceProblem } from '../covariance/run-covariance';
import { EARTH } from '../inertial/earth';
import type { InertialBudgetInput } from '../inertial/inertial-input';
import { resolveInertialMission } from '../inertial/inertial-mission';
import { buildInertialTrajectory, type NominalRow } from '../inertial/inertial-trajectory';
import { buildInertialModel } from '../inertial/build-inertial-model';
import { InertialDiscretisation } from '../inertial/inertial-discretisation';
import { scheduleInertialMeasurements } from '../inertial/inertial-schedule';
import { RECORDED_PAIRS } from '../inertial/inertial-quantities';
import type { InertialModel } from '../inertial/inertial-model';
import type { InertialRunOptions } from '../inertial/run-inertial';
import { runTruthVersusFilterProblem, type TruthVersusFilterRun } from './run-truth-versus-filter-problem';

/** Truth and filter models of a 3-D analysis and their run (recorded at RECORDED_PAIRS of the navigation states). */
export interface InertialTruthVersusFilter {
  truth: InertialModel;
  filter: InertialModel;
  rows: NominalRow[];
  /** T, row-major n_f x n_t. */
  truthMap: Float64Array;
  run: TruthVersusFilterRun;
}

/**
 * Runs the 3-D filter design `filterInput` against the truth `truthInput`.
 * @throws InputError naming the field of any bad input, or `filter` when a state name repeats.
 */
export function runInertialTruthVersusFilter(
  truthInput: InertialBudgetInput, filterInput: InertialBudgetInput, options: InertialRunOptions = {},
): InertialTruthVersusFilter {
  const earth = options.earth ?? EARTH;
  const stepS = positiveToSI(truthInput.step, 'time', 'step');
  const mission = resolveInertialMission(truthInput.mission);
  const rows = buildInertialTrajectory(mission, stepS, earth);
  const truth = buildInertialModel(truthInput, mission, earth), filter = buildInertialModel(filterInput, mission, earth);
  const problem = (model: InertialModel): CovarianceProblem => {
    const schedule = scheduleInertialMeasurements(model, rows, stepS);
    return {
      states: model.states, sources: model.sources, tS: Float64Array.from(rows, (r) => r.tS),
      discretisation: new InertialDiscretisation(model, rows, mission.segments, stepS, options.everyStep),
      measurementsAt: (k) => schedule[k], recordedPairs: RECORDED_PAIRS,
      calibrationStates: model.states.flatMap((s, i) => (s.calibration ? [i] : [])),
    };
  };
  const truthMap = truthMapByName(truth.states.map((s) => s.name), filter.states.map((s) => s.name));
  const run = runTruthVersusFilterProblem({ truth: problem(truth), filter: problem(filter), truthMap }, options);
  return { truth, filter, rows, truthMap, run };
}

/**
 * T (row-major n_f x n_t) with a 1 where a filter state has a truth state's name.
 * @throws InputError when a name repeats in either model (the match would be ambiguous).
 */
export function truthMapByName(truthNames: readonly string[], filterNames: readonly string[]): Float64Array {
  for (const [side, names] of [['truth', truthNames], ['filter', filterNames]] as const) {
    const twice = names.find((n, i) => names.indexOf(n) !== i);
    if (twice !== undefined) throw new InputError(side, `state "${twice}" appears twice; states are matched by name`);
  }
  const nt = truthNames.length, t = new Float64Array(filterNames.length * nt);
  filterNames.forEach((name, j) => {
    const i = truthNames.indexOf(name);
    if (i >= 0) t[j * nt + i] = 1;
  });
  return t;
}
