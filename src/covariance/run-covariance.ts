import type { ErrorModel } from './error-model';
import type { NominalTrajectory } from '../mission/nominal-trajectory';
import { addDense, addSparse, josephUpdateInPlace, multiplySparseVector, propagateInPlace } from './covariance-kernels';
import { checkCovariance, type CovarianceIssue } from './covariance-health';
import { discretiseStep, type StepDiscretisation } from './discretise-step';
import { scheduleMeasurements, type ScheduledMeasurement } from './measurement-schedule';
import { stepPieces } from './step-pieces';

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
  steps: number;
  sourceCount: number;
  entries: RecordedEntries;
  /** Calibration states' total sigma per step: one Float64Array per state index listed in `calibrationStates`. */
  calibrationStates: number[];
  calibrationSigma: Float64Array[];
  /** Total P after the last step, row-major. */
  finalCovariance: Float64Array;
  /** Scalar measurements processed, by sensor id. */
  measurementCounts: Record<string, number>;
  /** Numerical problems, first occurrence of each kind; empty when healthy. */
  issues: CovarianceIssue[];
}

/** Options of {@link runCovariance}. */
export interface RunOptions {
  /** Carry every source's P_s (default true); false runs the total only, about S + 1 times faster. */
  contributions?: boolean;
}

/**
 * Runs the covariance analysis with per-source contributions (ENGINE.md §6,
 * §7): the total P drives the gains; every source's P_s goes through the
 * same Φ and gains with only its own P0, Q_d and R pieces, so Σ P_s = P.
 */
export function runCovariance(model: ErrorModel, traj: NominalTrajectory, options: RunOptions = {}): CovarianceHistory {
  const n = model.states.length, nn = n * n;
  // Without contributions only the total is carried (sizing needs nothing else).
  const S = options.contributions === false ? 0 : model.sources.length;
  const steps = traj.tS.length;
  const schedule = scheduleMeasurements(model, traj);
  const mats = new Float64Array((S + 1) * nn);
  initialise(model, mats, nn, S);
  const rec = allocateEntries((S + 1) * steps);
  const calibrationStates = model.states.flatMap((st, i) => (st.calibration ? [i] : []));
  const calibrationSigma = calibrationStates.map(() => new Float64Array(steps));
  const scratch = new Float64Array(nn);
  const work = { u: new Float64Array(n), gain: new Float64Array(n) };
  const issues: CovarianceIssue[] = [];
  const counts: Record<string, number> = {};
  const cache = new Map<string, StepDiscretisation>();

  for (let k = 0; k < steps; k++) {
    if (k > 0) {
      for (const piece of stepPieces(traj, k)) {
        let d = piece.cacheKey ? cache.get(piece.cacheKey) : undefined;
        if (!d) {
          d = discretiseStep(model, piece.speedMps, piece.turnRateRadps, piece.lengthS);
          if (piece.cacheKey) cache.set(piece.cacheKey, d);
        }
        propagateAll(mats, S, nn, d, scratch);
      }
    }
    for (const m of schedule[k]) {
      if (updateAll(mats, S, n, m, work)) counts[m.sensorId] = (counts[m.sensorId] ?? 0) + 1;
      else noteIssue(issues, { kind: 'singular-innovation', tS: traj.tS[k], detail: `${m.key}: innovation variance is not positive` });
    }
    record(model, mats, S, nn, k, steps, rec);
    calibrationStates.forEach((i, c) => (calibrationSigma[c][k] = Math.sqrt(Math.max(0, mats[i * n + i]))));
    const issue = checkCovariance(mats, 0, n, traj.tS[k], scratch);
    if (issue) noteIssue(issues, issue);
  }
  return {
    steps, sourceCount: S, entries: rec, calibrationStates, calibrationSigma,
    finalCovariance: mats.slice(0, nn), measurementCounts: counts, issues,
  };
}

function initialise(model: ErrorModel, mats: Float64Array, nn: number, S: number): void {
  const n = model.states.length;
  model.sources.forEach((src, s) => {
    for (const { state, varianceSI } of src.initialVariance) {
      if (s < S) mats[(s + 1) * nn + state * n + state] += varianceSI;
      mats[state * n + state] += varianceSI;
    }
  });
}

function propagateAll(mats: Float64Array, S: number, nn: number, d: StepDiscretisation, scratch: Float64Array): void {
  propagateInPlace(mats, 0, d.phi, scratch);
  addDense(mats, 0, d.qdTotal);
  for (let s = 0; s < S; s++) {
    const off = (s + 1) * nn;
    propagateInPlace(mats, off, d.phi, scratch);
    addSparse(mats, off, d.qdBySource[s]);
  }
}

/** One scalar update of the total and every source; false (and nothing changed) when the innovation variance is not positive. */
function updateAll(mats: Float64Array, S: number, n: number, m: ScheduledMeasurement, w: { u: Float64Array; gain: Float64Array }): boolean {
  const nn = n * n;
  const hph = multiplySparseVector(mats, 0, n, m.hIdx, m.hVal, w.u);
  const innovation = hph + m.rTotal;
  if (!(innovation > 0) || !Number.isFinite(innovation)) return false;
  for (let i = 0; i < n; i++) w.gain[i] = w.u[i] / innovation;
  const gain = w.gain;
  josephUpdateInPlace(mats, 0, n, gain, w.u, hph, m.rTotal);
  for (let s = 0; s < S; s++) {
    const off = (s + 1) * nn;
    const hxh = multiplySparseVector(mats, off, n, m.hIdx, m.hVal, w.u);
    let r = 0;
    for (let p = 0; p < m.rSources.length; p++) if (m.rSources[p] === s) r += m.rVariances[p];
    josephUpdateInPlace(mats, off, n, gain, w.u, hxh, r);
  }
  return true;
}

function allocateEntries(len: number): RecordedEntries {
  return {
    alongAlong: new Float64Array(len), crossCross: new Float64Array(len), alongCross: new Float64Array(len),
    headingHeading: new Float64Array(len), speedScale: new Float64Array(len),
  };
}

function record(model: ErrorModel, mats: Float64Array, S: number, nn: number, k: number, steps: number, rec: RecordedEntries): void {
  const n = model.states.length;
  const { along, cross, heading, speedScale } = model.core;
  for (let m = 0; m <= S; m++) {
    const off = m * nn;
    const at = m * steps + k;
    rec.alongAlong[at] = mats[off + along * n + along];
    rec.crossCross[at] = mats[off + cross * n + cross];
    rec.alongCross[at] = mats[off + along * n + cross];
    rec.headingHeading[at] = mats[off + heading * n + heading];
    rec.speedScale[at] = speedScale >= 0 ? mats[off + speedScale * n + speedScale] : 0;
  }
}

function noteIssue(issues: CovarianceIssue[], issue: CovarianceIssue): void {
  if (!issues.some((i) => i.kind === issue.kind)) issues.push(issue);
}
