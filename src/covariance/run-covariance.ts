import type { ErrorModel } from './error-model';
import type { NominalTrajectory } from '../mission/nominal-trajectory';
import {
  addDense, addSparse, josephUpdateInPlace, multiplySparseVector, propagateVectors, updateVectors,
} from './covariance-kernels';
import { checkCovariance, type CovarianceIssue } from './covariance-health';
import type { StepDiscretisation } from './discretise-step';
import { DiscretisationCache } from './discretisation-cache';
import { MeasurementSchedule, type ScheduledMeasurement } from './measurement-schedule';
import { recordEveryStep, recordsEveryStep, type RecordPlan } from './record-plan';
import { initialiseStorage, planSourceStorage, sourceEntry, sourceMatrix, type SourceStorage } from './source-storage';

/**
 * The entries of P the outputs need, per step, for the total (row 0) and
 * each source (row s + 1): arrays of length (sources + 1) * steps.
 */
export interface RecordedEntries {
  alongAlong: Float64Array;
  crossCross: Float64Array;
  alongCross: Float64Array;
  headingHeading: Float64Array;
  /** Variance of the speed scale factor; zeros when there is none. */
  speedScale: Float64Array;
}

/** What the covariance run produces. */
export interface CovarianceHistory {
  /** Recorded steps (the rows of `entries`); equals the run's steps unless a record plan thins them. */
  steps: number;
  /** The trajectory step index of each recorded row. */
  recordedSteps: Int32Array;
  /** The total's entries (row 0 only) at every step of the run, for exact requirement verdicts. */
  totalEntries: RecordedEntries;
  /** Sources with recorded contributions (0 when run without them). */
  sourceCount: number;
  entries: RecordedEntries;
  /** Calibration states' total sigma per step: one Float64Array per state index listed in `calibrationStates`. */
  calibrationStates: number[];
  calibrationSigma: Float64Array[];
  /** Total P after the last step, row-major. */
  finalCovariance: Float64Array;
  /** Each source's P_s after the last step (empty without contributions). */
  finalSourceCovariances: Float64Array[];
  /** Scalar measurements processed, by sensor id. */
  measurementCounts: Record<string, number>;
  /** Numerical problems, first occurrence of each kind; empty when healthy. */
  issues: CovarianceIssue[];
}

/** Options of {@link runCovariance}. */
export interface RunOptions {
  /** Carry every source's P_s (default true); false runs the total only (what sizing needs). */
  contributions?: boolean;
  /** Which steps keep their entries (default every step); see record-plan.ts. */
  record?: RecordPlan;
}

/** Steps between full checks of the total covariance. */
const HEALTH_CHECK_EVERY = 10;

/** Mutable state of one run. */
interface RunState {
  n: number;
  plan: SourceStorage;
  mats: Float64Array;
  vecs: Float64Array;
  scratch: Float64Array;
  u: Float64Array;
  gain: Float64Array;
  /** Per dense slot after the total: R owned by that slot's source for the current measurement. */
  rOfSlot: Float64Array;
}

/**
 * Runs the covariance analysis with per-source contributions (docs/planar-model.md §6,
 * §7): the total P drives the gains; every source's P_s goes through the
 * same Φ and gains with only its own P0, Q_d and R pieces, so Σ P_s = P.
 */
export function runCovariance(model: ErrorModel, traj: NominalTrajectory, options: RunOptions = {}): CovarianceHistory {
  const contributions = options.contributions !== false;
  const n = model.states.length;
  const S = contributions ? model.sources.length : 0;
  const runSteps = traj.tS.length;
  const recordPlan = options.record ?? recordEveryStep(runSteps);
  const steps = recordPlan.recordedSteps.length;
  const schedule = new MeasurementSchedule(model, traj);
  const plan = planSourceStorage(model, contributions);
  const st: RunState = {
    n, plan, mats: new Float64Array(plan.denseCount * n * n), vecs: new Float64Array(Math.max(1, plan.vectors) * n),
    scratch: new Float64Array(n * n), u: new Float64Array(n), gain: new Float64Array(n), rOfSlot: new Float64Array(plan.denseCount),
  };
  initialiseStorage(model, plan, st.mats, st.vecs, contributions);
  const rec = allocateEntries((S + 1) * steps);
  const totals = recordsEveryStep(recordPlan) ? totalView(rec, steps) : allocateEntries(runSteps);
  const calibrationStates = model.states.flatMap((s, i) => (s.calibration ? [i] : []));
  const calibrationSigma = calibrationStates.map(() => new Float64Array(steps));
  const issues: CovarianceIssue[] = [];
  const counts: Record<string, number> = {};
  const cache = new DiscretisationCache(model, traj);

  for (let k = 0; k < runSteps; k++) {
    if (k > 0) for (const d of cache.forStep(k)) propagateAll(st, d);
    for (const m of schedule.at(k)) {
      if (updateAll(st, m)) counts[m.sensorId] = (counts[m.sensorId] ?? 0) + 1;
      else noteIssue(issues, { kind: 'singular-innovation', tS: traj.tS[k], detail: `${m.key}: innovation variance is not positive` });
    }
    const row = recordPlan.rowOfStep[k];
    if (row >= 0) {
      record(model, st, S, row, steps, rec);
      calibrationStates.forEach((i, c) => (calibrationSigma[c][row] = Math.sqrt(Math.max(0, st.mats[i * n + i]))));
    }
    if (totals !== rec) record(model, st, 0, k, runSteps, totals);
    // The full check (an LDLᵀ) every tenth step and at the end: a problem is reported within a second of mission time.
    if (k % HEALTH_CHECK_EVERY === 0 || k === runSteps - 1) {
      const issue = checkCovariance(st.mats, 0, n, traj.tS[k], st.scratch);
      if (issue) noteIssue(issues, issue);
    }
  }
  return {
    steps, recordedSteps: recordPlan.recordedSteps, totalEntries: totals, sourceCount: S, entries: rec, calibrationStates, calibrationSigma,
    finalCovariance: st.mats.slice(0, n * n),
    finalSourceCovariances: Array.from({ length: S }, (_, s) => sourceMatrix(plan, st.mats, st.vecs, n, s)),
    measurementCounts: counts, issues,
  };
}

function propagateAll(st: RunState, d: StepDiscretisation): void {
  const nn = st.n * st.n;
  d.propagate(st.mats, 0, d.phi.val, st.scratch);
  addDense(st.mats, 0, d.qdTotal);
  st.plan.denseSources.forEach((s, j) => {
    const off = (j + 1) * nn;
    d.propagate(st.mats, off, d.phi.val, st.scratch);
    addSparse(st.mats, off, d.qdBySource[s]);
  });
  propagateVectors(st.vecs, st.plan.vectors, d.phi, st.scratch);
}

/** One scalar update of the total and every source; false (and nothing changed) when the innovation variance is not positive. */
function updateAll(st: RunState, m: ScheduledMeasurement): boolean {
  const { n, mats, u, gain, plan } = st;
  const nn = n * n;
  const hph = multiplySparseVector(mats, 0, n, m.hIdx, m.hVal, u);
  const innovation = hph + m.rTotal;
  if (!(innovation > 0) || !Number.isFinite(innovation)) return false;
  for (let i = 0; i < n; i++) gain[i] = u[i] / innovation;
  josephUpdateInPlace(mats, 0, n, gain, u, hph, m.rTotal);
  st.rOfSlot.fill(0);
  for (let p = 0; p < m.rSources.length; p++) {
    const slot = plan.denseSlot[m.rSources[p]];
    if (slot > 0) st.rOfSlot[slot] += m.rVariances[p];
  }
  for (let slot = 1; slot < plan.denseCount; slot++) {
    const hxh = multiplySparseVector(mats, slot * nn, n, m.hIdx, m.hVal, u);
    josephUpdateInPlace(mats, slot * nn, n, gain, u, hxh, st.rOfSlot[slot]);
  }
  updateVectors(st.vecs, plan.vectors, n, m.hIdx, m.hVal, gain);
  return true;
}

function allocateEntries(len: number): RecordedEntries {
  return {
    alongAlong: new Float64Array(len), crossCross: new Float64Array(len), alongCross: new Float64Array(len),
    headingHeading: new Float64Array(len), speedScale: new Float64Array(len),
  };
}

/** The total's row of entries recorded at every step, as views (no copy). */
function totalView(rec: RecordedEntries, steps: number): RecordedEntries {
  return {
    alongAlong: rec.alongAlong.subarray(0, steps), crossCross: rec.crossCross.subarray(0, steps), alongCross: rec.alongCross.subarray(0, steps),
    headingHeading: rec.headingHeading.subarray(0, steps), speedScale: rec.speedScale.subarray(0, steps),
  };
}

function record(model: ErrorModel, st: RunState, S: number, k: number, steps: number, rec: RecordedEntries): void {
  const { n, mats, vecs, plan } = st;
  const { along, cross, heading, speedScale } = model.core;
  for (let m = 0; m <= S; m++) {
    const at = m * steps + k;
    const slot = m === 0 ? 0 : plan.denseSlot[m - 1];
    if (slot >= 0) {
      const o = slot * n * n;
      rec.alongAlong[at] = mats[o + along * n + along];
      rec.crossCross[at] = mats[o + cross * n + cross];
      rec.alongCross[at] = mats[o + along * n + cross];
      rec.headingHeading[at] = mats[o + heading * n + heading];
      rec.speedScale[at] = speedScale >= 0 ? mats[o + speedScale * n + speedScale] : 0;
    } else {
      rec.alongAlong[at] = sourceEntry(plan, mats, vecs, n, m - 1, along, along);
      rec.crossCross[at] = sourceEntry(plan, mats, vecs, n, m - 1, cross, cross);
      rec.alongCross[at] = sourceEntry(plan, mats, vecs, n, m - 1, along, cross);
      rec.headingHeading[at] = sourceEntry(plan, mats, vecs, n, m - 1, heading, heading);
      rec.speedScale[at] = speedScale >= 0 ? sourceEntry(plan, mats, vecs, n, m - 1, speedScale, speedScale) : 0;
    }
  }
}

function noteIssue(issues: CovarianceIssue[], issue: CovarianceIssue): void {
  if (!issues.some((i) => i.kind === issue.kind)) issues.push(issue);
}
