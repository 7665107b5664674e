import type { ErrorModel } from './error-model';
import type { NominalTrajectory } from '../mission/nominal-trajectory';
import {
  addDense, addSparse, josephUpdateInPlace, multiplySparseVector, propagateVectors, updateVectors,
} from './covariance-kernels';
import { BlockUpdate } from './block-update';
import { checkCovariance, type CovarianceIssue } from './covariance-health';
import type { StepDiscretisation } from './discretise-step';
import { DiscretisationCache } from './discretisation-cache';
import { MeasurementSchedule, type ScheduledMeasurement } from './measurement-schedule';
import { recordEveryStep, recordsEveryStep, type RecordPlan } from './record-plan';
import {
  initialiseStorage, planSourceStorage, sourceMatrix, type SourceStorage, type StoredModel,
} from './source-storage';

/**
 * The entries of P the planar outputs need, per step, for the total (row 0) and
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

/** What carries P from t_{k-1} to t_k: one or more discretisations applied in order (k asked for in increasing order). */
export interface DiscretisationProvider {
  forStep(k: number): readonly StepDiscretisation[];
}

/**
 * A linear error-state model as the covariance run sees it, whatever its
 * physics (the planar model of docs/planar-model.md, the inertial one of
 * docs/inertial-model.md): states, sources with their P0 / Q_d / R pieces,
 * how each step is discretised, what is measured when, and which entries of
 * P are recorded for the outputs.
 */
export interface CovarianceProblem extends StoredModel {
  /** Step times t_k, s. */
  tS: Float64Array;
  discretisation: DiscretisationProvider;
  /** The scalar measurements processed at boundary k, in order. */
  measurementsAt(k: number): readonly ScheduledMeasurement[];
  /** Entries P[i][j] recorded at every step for the total and each source. */
  recordedPairs: readonly (readonly [number, number])[];
  /** States whose total sigma is recorded at every step. */
  calibrationStates: readonly number[];
}

/** What a run of a {@link CovarianceProblem} produces. */
export interface CovarianceRun {
  /** Recorded steps (the rows of `recorded`); equals the run's steps unless a record plan thins them. */
  steps: number;
  /** The trajectory step index of each recorded row. */
  recordedSteps: Int32Array;
  /** The total's recorded pairs (row 0 only) at every step of the run, for exact requirement verdicts. */
  totalRecorded: Float64Array[];
  /** Sources with recorded contributions (0 when run without them). */
  sourceCount: number;
  /** One array per recorded pair: P[i][j] of the total at [k], of source s at [(s + 1) * steps + k]. */
  recorded: Float64Array[];
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

/** What the planar covariance run produces. */
export interface CovarianceHistory extends Omit<CovarianceRun, 'recorded' | 'totalRecorded'> {
  entries: RecordedEntries;
  /** The total's entries (row 0 only) at every step of the run, for exact requirement verdicts. */
  totalEntries: RecordedEntries;
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
  /** The boundary's scalars for the sources' block update (block-update.ts). */
  block: BlockUpdate;
  /** R owned by dense sources at this boundary: (slot, scalar index, variance), flat. */
  ownedR: number[];
  /** R of one slot per scalar of the boundary. */
  rOf: Float64Array;
}

/**
 * Runs the planar covariance analysis (docs/planar-model.md §6, §7) through
 * {@link runCovarianceProblem}: per-segment discretisations, the measurement
 * schedule, and the along/cross/heading/speed-scale entries recorded.
 */
export function runCovariance(model: ErrorModel, traj: NominalTrajectory, options: RunOptions = {}): CovarianceHistory {
  const schedule = new MeasurementSchedule(model, traj);
  const { along, cross, heading, speedScale } = model.core;
  const pairs: [number, number][] = [[along, along], [cross, cross], [along, cross], [heading, heading]];
  if (speedScale >= 0) pairs.push([speedScale, speedScale]);
  const run = runCovarianceProblem({
    states: model.states, sources: model.sources, tS: traj.tS, discretisation: new DiscretisationCache(model, traj),
    measurementsAt: (k) => schedule.at(k), recordedPairs: pairs,
    calibrationStates: model.states.flatMap((s, i) => (s.calibration ? [i] : [])),
  }, options);
  const { recorded, totalRecorded, ...rest } = run;
  const entriesOf = (r: Float64Array[]): RecordedEntries => ({
    alongAlong: r[0], crossCross: r[1], alongCross: r[2], headingHeading: r[3],
    speedScale: speedScale >= 0 ? r[4] : new Float64Array(r[0].length),
  });
  return { ...rest, entries: entriesOf(recorded), totalEntries: entriesOf(totalRecorded) };
}

/**
 * Runs the covariance analysis with per-source contributions (docs/planar-model.md
 * §6, §7): the total P drives the gains; every source's P_s goes through the
 * same Φ and gains with only its own P0, Q_d and R pieces, so Σ P_s = P.
 */
export function runCovarianceProblem(problem: CovarianceProblem, options: RunOptions = {}): CovarianceRun {
  const contributions = options.contributions !== false;
  const n = problem.states.length;
  const S = contributions ? problem.sources.length : 0;
  const runSteps = problem.tS.length;
  const recordPlan = options.record ?? recordEveryStep(runSteps);
  const steps = recordPlan.recordedSteps.length;
  const plan = planSourceStorage(problem, contributions);
  const st: RunState = {
    n, plan, mats: new Float64Array(plan.denseCount * n * n), vecs: new Float64Array(Math.max(1, plan.vectors) * n),
    scratch: new Float64Array(n * n), u: new Float64Array(n), gain: new Float64Array(n),
    block: new BlockUpdate(n), ownedR: [], rOf: new Float64Array(8),
  };
  initialiseStorage(problem, plan, st.mats, st.vecs, contributions);
  const recorded = problem.recordedPairs.map(() => new Float64Array((S + 1) * steps));
  // The total at every step: views of row 0 when every step is recorded, else arrays of their own.
  const everyStep = recordsEveryStep(recordPlan);
  const totalRecorded = everyStep ? recorded.map((r) => r.subarray(0, steps)) : problem.recordedPairs.map(() => new Float64Array(runSteps));
  const calibrationStates = [...problem.calibrationStates];
  const calibrationSigma = calibrationStates.map(() => new Float64Array(steps));
  const issues: CovarianceIssue[] = [];
  const counts: Record<string, number> = {};

  for (let k = 0; k < runSteps; k++) {
    if (k > 0) for (const d of problem.discretisation.forStep(k)) propagateAll(st, d);
    const due = problem.measurementsAt(k);
    if (due.length > 0) {
      st.block.clear();
      st.ownedR.length = 0;
      for (const m of due) {
        if (updateTotal(st, m)) counts[m.sensorId] = (counts[m.sensorId] ?? 0) + 1;
        else noteIssue(issues, { kind: 'singular-innovation', tS: problem.tS[k], detail: `${m.key}: innovation variance is not positive` });
      }
      updateDenseSources(st);
    }
    const row = recordPlan.rowOfStep[k];
    if (row >= 0) {
      record(st, problem.recordedPairs, S, row, steps, recorded);
      for (let c = 0; c < calibrationStates.length; c++) {
        const i = calibrationStates[c];
        calibrationSigma[c][row] = Math.sqrt(Math.max(0, st.mats[i * n + i]));
      }
    }
    if (!everyStep) record(st, problem.recordedPairs, 0, k, runSteps, totalRecorded);
    // The full check (an LDLᵀ) every tenth step and at the end: a problem is reported within a second of mission time.
    if (k % HEALTH_CHECK_EVERY === 0 || k === runSteps - 1) {
      const issue = checkCovariance(st.mats, 0, n, problem.tS[k], st.scratch);
      if (issue) noteIssue(issues, issue);
    }
  }
  return {
    steps, recordedSteps: recordPlan.recordedSteps, totalRecorded, sourceCount: S, recorded, calibrationStates, calibrationSigma,
    finalCovariance: st.mats.slice(0, n * n),
    finalSourceCovariances: Array.from({ length: S }, (_, s) => sourceMatrix(plan, st.mats, st.vecs, n, s)),
    measurementCounts: counts, issues,
  };
}

function propagateAll(st: RunState, d: StepDiscretisation): void {
  const nn = st.n * st.n;
  d.propagate(st.mats, 0, d.phi.val, st.scratch);
  addDense(st.mats, 0, d.qdTotal);
  const { denseSources } = st.plan;
  for (let j = 0; j < denseSources.length; j++) {
    const off = (j + 1) * nn;
    d.propagate(st.mats, off, d.phi.val, st.scratch);
    addSparse(st.mats, off, d.qdBySource[denseSources[j]]);
  }
  propagateVectors(st.vecs, st.plan.vectors, d.phi, st.scratch);
}

/**
 * One scalar update of the total (sequential, docs/planar-model.md §6) and
 * of the rank-one vectors; the dense sources wait for the boundary's block
 * update. False (and nothing changed) when the innovation variance is not positive.
 */
function updateTotal(st: RunState, m: ScheduledMeasurement): boolean {
  const { n, mats, u, gain, plan } = st;
  const hph = multiplySparseVector(mats, 0, n, m.hIdx, m.hVal, u);
  const innovation = hph + m.rTotal;
  if (!(innovation > 0) || !Number.isFinite(innovation)) return false;
  for (let i = 0; i < n; i++) gain[i] = u[i] / innovation;
  josephUpdateInPlace(mats, 0, n, gain, u, hph, m.rTotal);
  if (plan.denseCount > 1) {
    const a = st.block.q;
    st.block.add(m.hIdx, m.hVal, gain);
    for (let p = 0; p < m.rSources.length; p++) {
      const slot = plan.denseSlot[m.rSources[p]];
      if (slot > 0) st.ownedR.push(slot, a, m.rVariances[p]);
    }
  }
  updateVectors(st.vecs, plan.vectors, n, m.hIdx, m.hVal, gain);
  return true;
}

/** The fixed-gain update of every dense source with all of the boundary's scalars as one block (block-update.ts). */
function updateDenseSources(st: RunState): void {
  const { block, plan, ownedR } = st;
  const q = block.q;
  if (q === 0 || plan.denseCount <= 1) return;
  block.finish();
  if (st.rOf.length < q) st.rOf = new Float64Array(2 * q);
  const nn = st.n * st.n;
  for (let slot = 1; slot < plan.denseCount; slot++) {
    st.rOf.fill(0, 0, q);
    for (let e = 0; e < ownedR.length; e += 3) if (ownedR[e] === slot) st.rOf[ownedR[e + 1]] += ownedR[e + 2];
    block.apply(st.mats, slot * nn, st.rOf);
  }
}

function record(
  st: RunState, pairs: readonly (readonly [number, number])[], S: number, k: number, steps: number, out: Float64Array[],
): void {
  const { n, mats, vecs, plan } = st;
  for (let m = 0; m <= S; m++) {
    const at = m * steps + k;
    const slot = m === 0 ? 0 : plan.denseSlot[m - 1];
    if (slot >= 0) {
      const o = slot * n * n;
      for (let p = 0; p < pairs.length; p++) out[p][at] = mats[o + pairs[p][0] * n + pairs[p][1]];
    } else {
      // A rank-one source: Σ ψ_c[i] ψ_c[j] over its vectors, in the order of sourceEntry.
      const first = plan.firstVector[m - 1], end = first + plan.vectorCount[m - 1];
      for (let p = 0; p < pairs.length; p++) {
        const i = pairs[p][0], j = pairs[p][1];
        let sum = 0;
        for (let c = first; c < end; c++) sum += vecs[c * n + i] * vecs[c * n + j];
        out[p][at] = sum;
      }
    }
  }
}

function noteIssue(issues: CovarianceIssue[], issue: CovarianceIssue): void {
  if (!issues.some((i) => i.kind === issue.kind)) issues.push(issue);
}
