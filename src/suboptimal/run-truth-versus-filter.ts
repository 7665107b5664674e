/**
 * The suboptimal-filter covariance analysis: the filter's gains come from
 * its own model's covariance P_f; the actual error covariance runs through
 * the truth model with those gains, in the augmented state z = [x; e]
 * (x the truth's states, e = x̂ − T x the filter's error), with each truth
 * source's share carried by the same fixed-gain recursion so the shares sum
 * to the actual total (Gelb, Applied Optimal Estimation, 1974, §7.2 and
 * §7.3; Maybeck, vol. 1, 1979, ch. 6; Brown and Hwang, Introduction to
 * Random Signals and Applied Kalman Filtering, ch. 6; docs/suboptimal-filter.md).
 */
import type { ErrorModel } from '../covariance/error-model';
import type { NominalTrajectory } from '../mission/nominal-trajectory';
import type { CovarianceHistory } from '../covariance/run-covariance';
import { addDense, addSparse, josephUpdateInPlace, multiplySparseVector, propagateVectors } from '../covariance/covariance-kernels';
import { checkCovariance, type CovarianceIssue } from '../covariance/covariance-health';
import { DiscretisationCache } from '../covariance/discretisation-cache';
import { scheduleMeasurements } from '../covariance/measurement-schedule';
import { planSourceStorage } from '../covariance/source-storage';
import { AugmentedSteps } from './augmented-step';
import { carryPair, measurementPair, sparseTruthMap, type MeasurementPair } from './measurement-pair';
import { carriedStates, couplingIndices } from './carried-states';
import { allocateHistory, initialiseAugmented, recordActual, recordBelieved, type AugmentedState, type RunLayout } from './augmented-storage';
import { josephUpdateErrorBlock, updateErrorVectors } from './suboptimal-kernels';

/** The filter's normalised innovation variance at each of a sensor's measurements. */
export interface InnovationRatios {
  sensorId: string;
  tS: number[];
  /** Actual innovation variance over the filter's predicted one (1 for a consistent filter). */
  ratio: number[];
}

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
  const pairs = truthSchedule.map((list, k) => list.map((mt, i) => measurementPair(mt, filterSchedule[k][i], sparseMap, gScratch)));
  const carried = carriedStates(truth, filter, truthMap, couplingIndices(pairs));
  const nx = carried.index.length, na = nx + nf;
  for (const list of pairs) for (const p of list) carryPair(p, carried.position, nt, nx);
  const plan = planSourceStorage(truth, options.contributions !== false);
  const layout: RunLayout = { nt, nf, carried, plan, truth, filter };
  const steps = traj.tS.length;
  const st = initialiseAugmented(layout, truthMap);
  const hist = allocateHistory(layout, steps);
  const truthCache = new DiscretisationCache(truth, traj), filterCache = new DiscretisationCache(filter, traj);
  const augmented = new AugmentedSteps(nt, nf, truthMap, carried);
  const innovations = new Map<string, InnovationRatios>();
  const issues: CovarianceIssue[] = [];
  const scratch = new Float64Array(na * na), uF = new Float64Array(nf), uA = new Float64Array(na), gain = new Float64Array(nf);
  const nn = na * na;

  for (let k = 0; k < steps; k++) {
    if (k > 0) {
      const dT = truthCache.forStep(k), dF = filterCache.forStep(k);
      dT.forEach((d, p) => {
        const f = dF[p], a = augmented.get(d, f);
        f.propagate(st.filterP, 0, f.phi.val, scratch);
        addDense(st.filterP, 0, f.qdTotal);
        a.propagate(st.mats, 0, a.phi.val, scratch);
        addSparse(st.mats, 0, a.qdTotal);
        plan.denseSources.forEach((s, j) => {
          a.propagate(st.mats, (j + 1) * nn, a.phi.val, scratch);
          addSparse(st.mats, (j + 1) * nn, a.qdBySource[s]);
        });
        propagateVectors(st.vecs, plan.vectors, a.phi, scratch);
      });
    }
    pairs[k].forEach((pair) => {
      const mt = pair.truth;
      const ratio = update(layout, st, pair, { uF, uA, gain });
      if (ratio === undefined) {
        noteIssue(issues, { kind: 'singular-innovation', tS: traj.tS[k], detail: `${mt.key}: the filter's innovation variance is not positive` });
        return;
      }
      let rec = innovations.get(mt.sensorId);
      if (!rec) innovations.set(mt.sensorId, (rec = { sensorId: mt.sensorId, tS: [], ratio: [] }));
      rec.tS.push(mt.tS);
      rec.ratio.push(ratio);
      hist.actual.measurementCounts[mt.sensorId] = (hist.actual.measurementCounts[mt.sensorId] ?? 0) + 1;
    });
    recordBelieved(layout, st, k, hist.believed);
    recordActual(layout, st, k, hist.actual);
    if (k % 10 === 0 || k === steps - 1) {
      const issue = checkCovariance(st.filterP, 0, nf, traj.tS[k], scratch);
      if (issue) noteIssue(issues, issue);
    }
  }
  hist.actual.issues = issues;
  hist.believed.issues = issues;
  hist.believed.measurementCounts = hist.actual.measurementCounts;
  return { believed: hist.believed, actual: hist.actual, innovations: [...innovations.values()] };
}

/**
 * One scalar measurement: the filter's Joseph update with its own R gives K;
 * the augmented C (total and shares) takes the same K with the truth's R.
 * Returns the normalised innovation variance, or undefined (nothing changed)
 * when the filter's innovation variance is not positive.
 */
function update(
  layout: RunLayout, st: AugmentedState, m: MeasurementPair,
  w: { uF: Float64Array; uA: Float64Array; gain: Float64Array },
): number | undefined {
  const { nf, plan } = layout;
  const nx = layout.carried.index.length, na = nx + nf, nn = na * na;
  const hph = multiplySparseVector(st.filterP, 0, nf, m.filter.hIdx, m.filter.hVal, w.uF);
  const predicted = hph + m.filter.rTotal;
  if (!(predicted > 0) || !Number.isFinite(predicted)) return undefined;
  for (let i = 0; i < nf; i++) w.gain[i] = w.uF[i] / predicted;
  josephUpdateInPlace(st.filterP, 0, nf, w.gain, w.uF, hph, m.filter.rTotal);
  const gcg = multiplySparseVector(st.mats, 0, na, m.gIdx, m.gVal, w.uA);
  josephUpdateErrorBlock(st.mats, 0, nx, nf, w.gain, w.uA, gcg + m.truth.rTotal);
  st.rOfSlot.fill(0);
  for (let p = 0; p < m.truth.rSources.length; p++) {
    const slot = plan.denseSlot[m.truth.rSources[p]];
    if (slot > 0) st.rOfSlot[slot] += m.truth.rVariances[p];
  }
  for (let slot = 1; slot < plan.denseCount; slot++) {
    const g = multiplySparseVector(st.mats, slot * nn, na, m.gIdx, m.gVal, w.uA);
    josephUpdateErrorBlock(st.mats, slot * nn, nx, nf, w.gain, w.uA, g + st.rOfSlot[slot]);
  }
  updateErrorVectors(st.vecs, plan.vectors, nx, nf, m.gIdx, m.gVal, w.gain);
  return (gcg + m.truth.rTotal) / predicted;
}

function noteIssue(issues: CovarianceIssue[], issue: CovarianceIssue): void {
  if (!issues.some((i) => i.kind === issue.kind)) issues.push(issue);
}

