/**
 * The suboptimal-filter analysis of the planar model (docs/suboptimal-filter.md):
 * truth and filter error models become two CovarianceProblems over one
 * nominal trajectory, the truth states that never reach the filter's error
 * are left out of z (carried-states.ts), and the shared run
 * (run-truth-versus-filter-problem.ts) is read back as the planar
 * along/cross/heading/speed-scale entries (Gelb, Applied Optimal Estimation,
 * 1974, §7.2; Maybeck, vol. 1, 1979, ch. 6).
 */
import type { ErrorModel } from '../covariance/error-model';
import type { NominalTrajectory } from '../mission/nominal-trajectory';
import type { CovarianceHistory, CovarianceProblem, CovarianceRun, RecordedEntries } from '../covariance/run-covariance';
import { DiscretisationCache } from '../covariance/discretisation-cache';
import { scheduleMeasurements, type ScheduledMeasurement } from '../covariance/measurement-schedule';
import { carryPair, measurementPair, sparseTruthMap } from './measurement-pair';
import { carriedStates, couplingIndices } from './carried-states';
import { runTruthVersusFilterProblem, type InnovationRatios } from './run-truth-versus-filter-problem';

export type { InnovationRatios } from './run-truth-versus-filter-problem';

/** What the suboptimal analysis produces. */
export interface TruthVersusFilterHistory {
  /** The filter's own covariance (what it believes), total only; indices follow the filter model. */
  believed: CovarianceHistory;
  /** The actual error covariance, total and each truth source's share; calibration states are the filter's. */
  actual: CovarianceHistory;
  innovations: InnovationRatios[];
}

/**
 * Runs filter and truth together over the mission. The truth and filter
 * models must come from one suite (same sensors and measurement rows).
 * @param truthMap T (n_f x n_t) from buildFilterModel.
 */
export function runTruthVersusFilter(
  truth: ErrorModel, filter: ErrorModel, truthMap: Float64Array, traj: NominalTrajectory, options: { contributions?: boolean } = {},
): TruthVersusFilterHistory {
  const nt = truth.states.length, nf = filter.states.length;
  const truthSchedule = scheduleMeasurements(truth, traj), filterSchedule = scheduleMeasurements(filter, traj);
  const sparseMap = sparseTruthMap(truthMap, nt, nf), gScratch = new Float64Array(nt + nf);
  // Built once ahead: carriedStates needs every measurement's coupling before the run starts.
  const pairs = truthSchedule.map((list, k) => list.map((mt, i) => measurementPair(mt, filterSchedule[k][i], sparseMap, gScratch)));
  const carried = carriedStates(truth, filter, truthMap, couplingIndices(pairs));
  const nx = carried.index.length;
  for (const list of pairs) for (const p of list) carryPair(p, carried.position, nt, nx);
  const believedPairs = corePairs(filter);
  const speedScale = filter.core.speedScale;
  const actualPairs = believedPairs.slice(0, 4).map(([i, j]): [number, number] => [nx + i, nx + j]);
  // The actual speed error is the truth's scale factor itself when the filter carries none.
  const speed = speedScale >= 0 ? nx + speedScale : truth.core.speedScale >= 0 ? carried.position[truth.core.speedScale] : -1;
  if (speed >= 0) actualPairs.push([speed, speed]);
  const run = runTruthVersusFilterProblem({
    truth: planarProblem(truth, traj, truthSchedule, []), filter: planarProblem(filter, traj, filterSchedule, believedPairs),
    truthMap, carried, actualPairs, pairsAt: (k) => pairs[k],
  }, options);
  return {
    believed: history(run.believed, speedScale >= 0), actual: history(run.actual, speed >= 0), innovations: run.innovations,
  };
}

/** The along/cross/heading (and speed-scale when there is one) entries of a planar model. */
function corePairs(model: ErrorModel): [number, number][] {
  const { along, cross, heading, speedScale } = model.core;
  const pairs: [number, number][] = [[along, along], [cross, cross], [along, cross], [heading, heading]];
  if (speedScale >= 0) pairs.push([speedScale, speedScale]);
  return pairs;
}

function planarProblem(
  model: ErrorModel, traj: NominalTrajectory, schedule: ScheduledMeasurement[][], recordedPairs: [number, number][],
): CovarianceProblem {
  return {
    states: model.states, sources: model.sources, tS: traj.tS, discretisation: new DiscretisationCache(model, traj),
    measurementsAt: (k) => schedule[k], recordedPairs, calibrationStates: model.states.flatMap((s, i) => (s.calibration ? [i] : [])),
  };
}

/** A shared run read as the planar entries (recorded in corePairs' order). */
function history(run: CovarianceRun, hasSpeed: boolean): CovarianceHistory {
  const { recorded, totalRecorded, ...rest } = run;
  const entriesOf = (r: Float64Array[]): RecordedEntries => ({
    alongAlong: r[0], crossCross: r[1], alongCross: r[2], headingHeading: r[3], speedScale: hasSpeed ? r[4] : new Float64Array(r[0].length),
  });
  return { ...rest, entries: entriesOf(recorded), totalEntries: entriesOf(totalRecorded) };
}
