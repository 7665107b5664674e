/**
 * The suboptimal-filter covariance analysis on the shared CovarianceProblem
 * (docs/suboptimal-filter.md), whatever the model's physics: the planar
 * model (run-truth-versus-filter.ts) and the 3-D one (src/inertial) alike.
 * The filter's gains come from its own covariance P_f; the actual error
 * covariance runs through the truth with those gains, in the augmented state
 * z = [x; e] (x the carried truth states, e = x̂ − T x the filter's error),
 * each truth source's share carried by the same fixed-gain recursion so the
 * shares sum to the actual total (Gelb, Applied Optimal Estimation, 1974,
 * §7.2 and §7.3; Maybeck, vol. 1, 1979, ch. 6; Brown and Hwang, Introduction
 * to Random Signals and Applied Kalman Filtering, ch. 6).
 */
import type { CovarianceProblem, CovarianceRun } from '../covariance/run-covariance';
import { addDense, addSparse, josephUpdateInPlace, multiplySparseVector, propagateVectors } from '../covariance/covariance-kernels';
import { checkCovariance, type CovarianceIssue } from '../covariance/covariance-health';
import { planSourceStorage, sourceEntry, type SourceStorage } from '../covariance/source-storage';
import { AugmentedSteps } from './augmented-step';
import { carryPair, measurementPair, sparseTruthMap, type MeasurementPair } from './measurement-pair';
import type { CarriedStates } from './carried-states';
import { josephUpdateErrorBlock, updateErrorVectors } from './suboptimal-kernels';

/** The filter's normalised innovation variance at each of a sensor's measurements. */
export interface InnovationRatios {
  sensorId: string;
  tS: number[];
  /** Actual innovation variance over the filter's predicted one (1 for a consistent filter). */
  ratio: number[];
}

/** Truth and filter as two problems over one timeline, and how their states relate. */
export interface TruthVersusFilterProblem {
  truth: CovarianceProblem;
  /** Same step times, the same number of discretisation pieces per step and the same measurements (keys) as the truth. */
  filter: CovarianceProblem;
  /** T, row-major n_f x n_t: 1 where a filter state stands for a truth state. */
  truthMap: Float64Array;
  /**
   * The truth states z carries (carried-states.ts). Default: every truth state, which is exact for
   * any model but costs more; a model that can tell which states never reach e passes fewer.
   */
  carried?: CarriedStates;
  /** Entries of C recorded as the actual ones, as z indices (default: the filter's recordedPairs on e). */
  actualPairs?: readonly (readonly [number, number])[];
  /** The measurement pairs at boundary k, already renumbered to the carried x (default: built from both schedules). */
  pairsAt?: (k: number) => readonly MeasurementPair[];
}

/** What the suboptimal analysis produces, as two runs of the shared form. */
export interface TruthVersusFilterRun {
  /** P_f: what the filter believes (total only), the filter's recordedPairs and calibration sigmas. */
  believed: CovarianceRun;
  /** The e block of C: the actual total and each truth source's share, at `actualPairs`; final matrices n_f x n_f. */
  actual: CovarianceRun;
  innovations: InnovationRatios[];
}

/** Options of {@link runTruthVersusFilterProblem}. */
export interface TruthVersusFilterOptions {
  /** Carry every truth source's share (default true). */
  contributions?: boolean;
}

/** Steps between full checks of P_f. */
const HEALTH_CHECK_EVERY = 10;

/** Sizes and storage of one run. */
interface Layout {
  nx: number;
  nf: number;
  plan: SourceStorage;
}

/** The mutable state of one run. */
interface State {
  filterP: Float64Array;
  mats: Float64Array;
  vecs: Float64Array;
  rOfSlot: Float64Array;
  uF: Float64Array;
  uA: Float64Array;
  gain: Float64Array;
}

/**
 * Runs filter and truth together over the timeline, recording every step.
 * @throws InputError when the two schedules disagree (they come from one suite, so this is a defect).
 */
export function runTruthVersusFilterProblem(p: TruthVersusFilterProblem, options: TruthVersusFilterOptions = {}): TruthVersusFilterRun {
  const { truth, filter, truthMap } = p;
  const nt = truth.states.length, nf = filter.states.length;
  const carried = p.carried ?? carryAll(nt);
  const nx = carried.index.length, na = nx + nf, nn = na * na;
  const pairsAt = p.pairsAt ?? schedulePairs(p, carried);
  const plan = planSourceStorage(truth, options.contributions !== false);
  const layout: Layout = { nx, nf, plan };
  const st = initialState(p, carried, plan);
  const steps = truth.tS.length, S = plan.denseCount > 1 || plan.vectors > 0 ? truth.sources.length : 0;
  const believedPairs = filter.recordedPairs, actualPairs = p.actualPairs ?? believedPairs.map(([i, j]) => [nx + i, nx + j] as const);
  const believedRec = believedPairs.map(() => new Float64Array(steps));
  const actualRec = actualPairs.map(() => new Float64Array((S + 1) * steps));
  const calibration = [...filter.calibrationStates];
  const believedSigma = calibration.map(() => new Float64Array(steps)), actualSigma = calibration.map(() => new Float64Array(steps));
  const augmented = new AugmentedSteps(nt, nf, truthMap, carried);
  const innovations = new Map<string, InnovationRatios>();
  const issues: CovarianceIssue[] = [];
  const counts: Record<string, number> = {};
  const scratch = new Float64Array(Math.max(nn, nf * nf));

  for (let k = 0; k < steps; k++) {
    if (k > 0) {
      const dF = filter.discretisation.forStep(k);
      truth.discretisation.forStep(k).forEach((d, piece) => {
        const f = dF[piece], a = augmented.get(d, f);
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
    for (const pair of pairsAt(k)) {
      const mt = pair.truth;
      const ratio = update(layout, st, pair);
      if (ratio === undefined) {
        noteIssue(issues, { kind: 'singular-innovation', tS: truth.tS[k], detail: `${mt.key}: the filter's innovation variance is not positive` });
        continue;
      }
      let rec = innovations.get(mt.sensorId);
      if (!rec) innovations.set(mt.sensorId, (rec = { sensorId: mt.sensorId, tS: [], ratio: [] }));
      rec.tS.push(mt.tS);
      rec.ratio.push(ratio);
      counts[mt.sensorId] = (counts[mt.sensorId] ?? 0) + 1;
    }
    for (let q = 0; q < believedPairs.length; q++) believedRec[q][k] = st.filterP[believedPairs[q][0] * nf + believedPairs[q][1]];
    recordActual(st, plan, actualPairs, S, k, steps, na, actualRec);
    calibration.forEach((i, c) => {
      believedSigma[c][k] = Math.sqrt(Math.max(0, st.filterP[i * nf + i]));
      actualSigma[c][k] = Math.sqrt(Math.max(0, st.mats[(nx + i) * na + nx + i]));
    });
    if (k % HEALTH_CHECK_EVERY === 0 || k === steps - 1) {
      const issue = checkCovariance(st.filterP, 0, nf, truth.tS[k], scratch);
      if (issue) noteIssue(issues, issue);
    }
  }
  const recordedSteps = Int32Array.from({ length: steps }, (_, k) => k);
  const common = { steps, recordedSteps, calibrationStates: calibration, measurementCounts: counts, issues };
  const eBlock = (slot: number) => errorBlock(st.mats, slot * nn, nx, nf);
  return {
    believed: {
      ...common, totalRecorded: believedRec, recorded: believedRec, sourceCount: 0, calibrationSigma: believedSigma,
      finalCovariance: st.filterP.slice(), finalSourceCovariances: [],
    },
    actual: {
      ...common, totalRecorded: actualRec.map((r) => r.subarray(0, steps)), recorded: actualRec, sourceCount: S, calibrationSigma: actualSigma,
      finalCovariance: eBlock(0),
      finalSourceCovariances: Array.from({ length: S }, (_, s) => sourceErrorBlock(plan, st, s, nx, nf)),
    },
    innovations: [...innovations.values()],
  };
}

/** The actual entries of the total (row 0) and each truth source (row s + 1) at step k. */
function recordActual(
  st: State, plan: SourceStorage, pairs: readonly (readonly [number, number])[], S: number, k: number, steps: number, na: number,
  out: Float64Array[],
): void {
  const nn = na * na;
  for (let m = 0; m <= S; m++) {
    const slot = m === 0 ? 0 : plan.denseSlot[m - 1], at = m * steps + k;
    for (let q = 0; q < pairs.length; q++) {
      const i = pairs[q][0], j = pairs[q][1];
      out[q][at] = slot >= 0 ? st.mats[slot * nn + i * na + j] : sourceEntry(plan, st.mats, st.vecs, na, m - 1, i, j);
    }
  }
}

/** Every truth state carried: x = the whole truth state. */
export function carryAll(nt: number): CarriedStates {
  return { index: Int32Array.from({ length: nt }, (_, i) => i), position: Int32Array.from({ length: nt }, (_, i) => i) };
}

/** Pairs built at each boundary from both problems' schedules, renumbered to the carried x. */
function schedulePairs(p: TruthVersusFilterProblem, carried: CarriedStates): (k: number) => MeasurementPair[] {
  const nt = p.truth.states.length, nf = p.filter.states.length, nx = carried.index.length;
  const map = sparseTruthMap(p.truthMap, nt, nf), g = new Float64Array(nt + nf);
  return (k) => {
    const fm = p.filter.measurementsAt(k);
    return p.truth.measurementsAt(k).map((mt, i) => {
      const pair = measurementPair(mt, fm[i], map, g);
      if (pair.gIdx.some((j) => j < nt && carried.position[j] < 0)) {
        throw new RangeError(`${mt.key}: the measurement reaches a truth state the run does not carry`);
      }
      carryPair(pair, carried.position, nt, nx);
      return pair;
    });
  };
}

/** P_f(0) from the filter's sources; C(0) = [S; −T] P_t(0) [S; −T]ᵀ as rank-one pieces (docs/suboptimal-filter.md). */
function initialState(p: TruthVersusFilterProblem, carried: CarriedStates, plan: SourceStorage): State {
  const { truth, filter, truthMap } = p;
  const nt = truth.states.length, nf = filter.states.length, nx = carried.index.length, na = nx + nf, nn = na * na;
  const st: State = {
    filterP: new Float64Array(nf * nf), mats: new Float64Array(plan.denseCount * nn), vecs: new Float64Array(Math.max(1, plan.vectors) * na),
    rOfSlot: new Float64Array(plan.denseCount), uF: new Float64Array(nf), uA: new Float64Array(na), gain: new Float64Array(nf),
  };
  for (const src of filter.sources) for (const { state, varianceSI } of src.initialVariance) st.filterP[state * nf + state] += varianceSI;
  const psi = new Float64Array(na);
  truth.sources.forEach((src, s) => {
    src.initialVariance.forEach(({ state, varianceSI }, j) => {
      const root = Math.sqrt(varianceSI);
      psi.fill(0);
      if (carried.position[state] >= 0) psi[carried.position[state]] = root;
      for (let r = 0; r < nf; r++) psi[nx + r] = -truthMap[r * nt + state] * root;
      addOuter(st.mats, 0, psi);
      if (plan.denseSlot[s] >= 0) addOuter(st.mats, plan.denseSlot[s] * nn, psi);
      else if (plan.vectorCount[s] > 0) st.vecs.set(psi, (plan.firstVector[s] + j) * na);
    });
  });
  return st;
}

function addOuter(m: Float64Array, offset: number, v: Float64Array): void {
  const n = v.length;
  for (let i = 0; i < n; i++) {
    if (v[i] === 0) continue;
    for (let j = 0; j < n; j++) m[offset + i * n + j] += v[i] * v[j];
  }
}

/**
 * One scalar measurement: the filter's Joseph update with its own R gives K;
 * the augmented C (total and shares) takes the same K with the truth's R.
 * Returns the normalised innovation variance, or undefined (nothing changed)
 * when the filter's innovation variance is not positive.
 */
function update(layout: Layout, st: State, m: MeasurementPair): number | undefined {
  const { nx, nf, plan } = layout;
  const na = nx + nf, nn = na * na;
  const hph = multiplySparseVector(st.filterP, 0, nf, m.filter.hIdx, m.filter.hVal, st.uF);
  const predicted = hph + m.filter.rTotal;
  if (!(predicted > 0) || !Number.isFinite(predicted)) return undefined;
  for (let i = 0; i < nf; i++) st.gain[i] = st.uF[i] / predicted;
  josephUpdateInPlace(st.filterP, 0, nf, st.gain, st.uF, hph, m.filter.rTotal);
  const gcg = multiplySparseVector(st.mats, 0, na, m.gIdx, m.gVal, st.uA);
  josephUpdateErrorBlock(st.mats, 0, nx, nf, st.gain, st.uA, gcg + m.truth.rTotal);
  st.rOfSlot.fill(0);
  for (let q = 0; q < m.truth.rSources.length; q++) {
    const slot = plan.denseSlot[m.truth.rSources[q]];
    if (slot > 0) st.rOfSlot[slot] += m.truth.rVariances[q];
  }
  for (let slot = 1; slot < plan.denseCount; slot++) {
    const g = multiplySparseVector(st.mats, slot * nn, na, m.gIdx, m.gVal, st.uA);
    josephUpdateErrorBlock(st.mats, slot * nn, nx, nf, st.gain, st.uA, g + st.rOfSlot[slot]);
  }
  updateErrorVectors(st.vecs, plan.vectors, nx, nf, m.gIdx, m.gVal, st.gain);
  return (gcg + m.truth.rTotal) / predicted;
}

/** The e block (n_f x n_f) of the n_a x n_a matrix at `offset`. */
function errorBlock(c: Float64Array, offset: number, nx: number, nf: number): Float64Array {
  const na = nx + nf, out = new Float64Array(nf * nf);
  for (let i = 0; i < nf; i++) for (let j = 0; j < nf; j++) out[i * nf + j] = c[offset + (nx + i) * na + nx + j];
  return out;
}

function sourceErrorBlock(plan: SourceStorage, st: State, s: number, nx: number, nf: number): Float64Array {
  const na = nx + nf, out = new Float64Array(nf * nf);
  for (let i = 0; i < nf; i++) for (let j = 0; j < nf; j++) out[i * nf + j] = sourceEntry(plan, st.mats, st.vecs, na, s, nx + i, nx + j);
  return out;
}

function noteIssue(issues: CovarianceIssue[], issue: CovarianceIssue): void {
  if (!issues.some((i) => i.kind === issue.kind)) issues.push(issue);
}
