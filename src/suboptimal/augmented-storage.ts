/**
 * Storage of the suboptimal run: the filter's P_f (n_f x n_f), the
 * augmented covariance C of z = [x; e] for the total and each dense truth
 * source, and rank-one augmented factors ψ for sources with initial
 * variance only; and what is recorded from them each step.
 */
import type { ErrorModel } from '../covariance/error-model';
import type { CovarianceHistory, RecordedEntries } from '../covariance/run-covariance';
import { sourceEntry, type SourceStorage } from '../covariance/source-storage';
import type { CarriedStates } from './carried-states';

/** Sizes and models of one run. */
export interface RunLayout {
  nt: number;
  nf: number;
  /** Truth states carried in x (n_x = carried.index.length); z = [x; e] has n_a = n_x + n_f entries. */
  carried: CarriedStates;
  /** Storage of the truth's sources (slots hold n_a x n_a matrices, vectors n_a entries). */
  plan: SourceStorage;
  truth: ErrorModel;
  filter: ErrorModel;
}

/** The mutable state of one run. */
export interface AugmentedState {
  filterP: Float64Array;
  mats: Float64Array;
  vecs: Float64Array;
  rOfSlot: Float64Array;
}

/**
 * P_f(0) from the filter's sources; C(0) = [I; −T] P_t(0) [I; −T]ᵀ since
 * x̂(0) = 0 gives e(0) = −T x(0); each initial piece v on state i is the
 * rank-one ψ = √v [e_i; −T e_i], added to the total and to its source.
 */
export function initialiseAugmented(layout: RunLayout, truthMap: Float64Array): AugmentedState {
  const { nt, nf, plan, truth, filter, carried } = layout;
  const nx = carried.index.length, na = nx + nf, nn = na * na;
  const st: AugmentedState = {
    filterP: new Float64Array(nf * nf), mats: new Float64Array(plan.denseCount * nn),
    vecs: new Float64Array(Math.max(1, plan.vectors) * na), rOfSlot: new Float64Array(plan.denseCount),
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

/** Empty histories: the believed one (total only) and the actual one (total and every truth source). */
export function allocateHistory(layout: RunLayout, steps: number): { believed: CovarianceHistory; actual: CovarianceHistory } {
  const { truth, filter, plan } = layout;
  const S = plan.denseCount > 1 || plan.vectors > 0 ? truth.sources.length : 0;
  const calibration = filter.states.flatMap((s, i) => (s.calibration ? [i] : []));
  const empty = (rows: number): CovarianceHistory => {
    const e = entries(rows * steps);
    // Every step is recorded: the total's entries are row 0 of the recorded ones (views, no copy).
    const totalEntries = Object.fromEntries(Object.entries(e).map(([k, a]) => [k, (a as Float64Array).subarray(0, steps)])) as unknown as typeof e;
    return {
      steps, recordedSteps: Int32Array.from({ length: steps }, (_, k) => k), totalEntries, sourceCount: rows - 1, entries: e,
      calibrationStates: calibration, calibrationSigma: calibration.map(() => new Float64Array(steps)), finalCovariance: new Float64Array(0),
      finalSourceCovariances: [], measurementCounts: {}, issues: [],
    };
  };
  return { believed: empty(1), actual: empty(S + 1) };
}

function entries(len: number): RecordedEntries {
  return {
    alongAlong: new Float64Array(len), crossCross: new Float64Array(len), alongCross: new Float64Array(len),
    headingHeading: new Float64Array(len), speedScale: new Float64Array(len),
  };
}

/** Records P_f's output entries and calibration sigmas at step k. */
export function recordBelieved(layout: RunLayout, st: AugmentedState, k: number, h: CovarianceHistory): void {
  const { nf, filter } = layout;
  const { along, cross, heading, speedScale } = filter.core;
  const p = st.filterP, e = h.entries;
  e.alongAlong[k] = p[along * nf + along];
  e.crossCross[k] = p[cross * nf + cross];
  e.alongCross[k] = p[along * nf + cross];
  e.headingHeading[k] = p[heading * nf + heading];
  e.speedScale[k] = speedScale >= 0 ? p[speedScale * nf + speedScale] : 0;
  h.calibrationStates.forEach((i, c) => (h.calibrationSigma[c][k] = Math.sqrt(Math.max(0, p[i * nf + i]))));
}

/**
 * Records the actual error's output entries (the e block; the truth's speed
 * scale factor itself when the filter does not carry one) for the total and
 * every truth source, and the actual sigma of the filter's calibration states.
 */
export function recordActual(layout: RunLayout, st: AugmentedState, k: number, h: CovarianceHistory): void {
  const { nf, plan, truth, filter, carried } = layout;
  const nx = carried.index.length, na = nx + nf;
  const idx = {
    along: nx + filter.core.along, cross: nx + filter.core.cross, heading: nx + filter.core.heading,
    speed: filter.core.speedScale >= 0 ? nx + filter.core.speedScale : truth.core.speedScale >= 0 ? carried.position[truth.core.speedScale] : -1,
  };
  const e = h.entries, { mats, vecs } = st;
  for (let m = 0; m <= h.sourceCount; m++) {
    const at = m * h.steps + k;
    const slot = m === 0 ? 0 : plan.denseSlot[m - 1];
    if (slot >= 0) {
      const o = slot * na * na;
      e.alongAlong[at] = mats[o + idx.along * na + idx.along];
      e.crossCross[at] = mats[o + idx.cross * na + idx.cross];
      e.alongCross[at] = mats[o + idx.along * na + idx.cross];
      e.headingHeading[at] = mats[o + idx.heading * na + idx.heading];
      e.speedScale[at] = idx.speed >= 0 ? mats[o + idx.speed * na + idx.speed] : 0;
    } else {
      e.alongAlong[at] = sourceEntry(plan, mats, vecs, na, m - 1, idx.along, idx.along);
      e.crossCross[at] = sourceEntry(plan, mats, vecs, na, m - 1, idx.cross, idx.cross);
      e.alongCross[at] = sourceEntry(plan, mats, vecs, na, m - 1, idx.along, idx.cross);
      e.headingHeading[at] = sourceEntry(plan, mats, vecs, na, m - 1, idx.heading, idx.heading);
      e.speedScale[at] = idx.speed >= 0 ? sourceEntry(plan, mats, vecs, na, m - 1, idx.speed, idx.speed) : 0;
    }
  }
  h.calibrationStates.forEach((i, c) => (h.calibrationSigma[c][k] = Math.sqrt(Math.max(0, st.mats[(nx + i) * na + nx + i]))));
}
