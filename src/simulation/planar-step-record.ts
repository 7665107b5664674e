import type { NominalTrajectory } from '../mission/nominal-trajectory';
import { wrapAngle } from '../sensors/range-bearing';
import type { DeadReckoningRun } from './dead-reckoning-run';
import type { PlanarFilter } from './planar-filter';
import type { PlanarPlan } from './planar-plan';

/** Reused output buffers of one step (see RunSink.step). */
export interface StepBuffers {
  errors: Float64Array;
  variances: Float64Array;
  nees: Float64Array;
  neesDof: Float64Array;
  /** n (n + 2) doubles of workspace. */
  scratch: Float64Array;
  /** n indices of workspace. */
  active: Int32Array;
}

/** States whose variance is below this (SI²) are left out of the NEES: they are exactly known (zero P0, no noise yet). */
const KNOWN_STATE_VARIANCE = 1e-300;

/**
 * Errors (estimate - truth), the filter's variances and the NEES of one step,
 * in the order heading, north, east, along-track, cross-track, speed.
 * Along and across are taken along the true (nominal) heading, as the budget
 * does; the filter's covariance is rotated there from its own heading. The
 * heading output is rounded to the angle quantum when the gyro has one, and
 * its variance includes s²/12 (docs/planar-model.md §3).
 */
export function recordPlanarStep(
  plan: PlanarPlan, dr: DeadReckoningRun, filter: PlanarFilter, traj: NominalTrajectory, k: number, out: StepBuffers,
): void {
  const { n, model } = plan;
  const { along, cross, heading, speedScale } = model.core;
  const p = filter.p;
  const q = plan.headingQuantumRad;
  const headingOut = q > 0 ? q * Math.round(dr.headingRad / q) : dr.headingRad;
  out.errors[0] = wrapAngle(headingOut - traj.headingRad[k]);
  out.variances[0] = p[heading * n + heading] + (q * q) / 12;
  const headingError = wrapAngle(dr.headingRad - traj.headingRad[k]);
  const dN = dr.northM - traj.northM[k], dE = dr.eastM - traj.eastM[k];
  // Position error in the filter's frame (its own heading).
  const cf = Math.cos(dr.headingRad), sf = Math.sin(dr.headingRad);
  const errA = cf * dN + sf * dE, errX = -sf * dN + cf * dE;
  if (model.hasSpeedInput) {
    const paa = p[along * n + along], pxx = p[cross * n + cross], pax = p[along * n + cross];
    const ct = Math.cos(traj.headingRad[k]), st = Math.sin(traj.headingRad[k]);
    out.errors[1] = dN;
    out.errors[2] = dE;
    out.errors[3] = ct * dN + st * dE;
    out.errors[4] = -st * dN + ct * dE;
    out.errors[5] = dr.speedMps - dr.trueSpeedMps;
    // Filter frame -> north/east -> along/across the true heading.
    out.variances[1] = cf * cf * paa - 2 * cf * sf * pax + sf * sf * pxx;
    out.variances[2] = sf * sf * paa + 2 * cf * sf * pax + cf * cf * pxx;
    const b = traj.headingRad[k] - dr.headingRad, cb = Math.cos(b), sb = Math.sin(b);
    out.variances[3] = cb * cb * paa + 2 * cb * sb * pax + sb * sb * pxx;
    out.variances[4] = sb * sb * paa - 2 * cb * sb * pax + cb * cb * pxx;
    const so = speedScale >= 0 ? p[speedScale * n + speedScale] : 0;
    out.variances[5] = dr.speedMps * dr.speedMps * so + (dr.moving ? plan.speedOutputVarianceSI : 0);
    const det = paa * pxx - pax * pax;
    out.nees[1] = det > 0 ? (pxx * errA * errA - 2 * pax * errA * errX + paa * errX * errX) / det : NaN;
    out.neesDof[1] = 2;
  } else {
    out.nees[1] = 0;
    out.neesDof[1] = 0;
  }
  const phh = p[heading * n + heading];
  out.nees[2] = phh > 0 ? (headingError * headingError) / phh : NaN;
  out.neesDof[2] = 1;
  fullStateNees(plan, dr, filter, errA, errX, headingError, out);
}

/** x̃ᵀ P⁻¹ x̃ over the states with non-zero variance, by Cholesky (Golub & Van Loan, Matrix Computations, 4th ed., Alg. 4.2.1). */
function fullStateNees(
  plan: PlanarPlan, dr: DeadReckoningRun, filter: PlanarFilter, errA: number, errX: number, headingError: number, out: StepBuffers,
): void {
  const { n, model } = plan;
  const { along, cross, heading } = model.core;
  const p = filter.p;
  const idx = out.active;
  let m = 0;
  for (let i = 0; i < n; i++) {
    if ((i === along || i === cross) && !model.hasSpeedInput) continue;
    if (p[i * n + i] > KNOWN_STATE_VARIANCE) idx[m++] = i;
  }
  const l = out.scratch, x = out.scratch.subarray(n * n);
  for (let a = 0; a < m; a++) {
    const i = idx[a];
    x[a] = i === along ? errA : i === cross ? errX : i === heading ? headingError
      : plan.sign[i] * (dr.estimate[i] - dr.truth[i].value);
    for (let b = 0; b <= a; b++) {
      let sum = p[i * n + idx[b]];
      for (let c = 0; c < b; c++) sum -= l[a * m + c] * l[b * m + c];
      if (a === b) {
        if (!(sum > 0)) { out.nees[0] = NaN; out.neesDof[0] = m; return; }
        l[a * m + a] = Math.sqrt(sum);
      } else l[a * m + b] = sum / l[b * m + b];
    }
  }
  // Forward substitution L y = x; NEES = yᵀ y.
  let nees = 0;
  for (let a = 0; a < m; a++) {
    let v = x[a];
    for (let c = 0; c < a; c++) v -= l[a * m + c] * x[c];
    x[a] = v / l[a * m + a];
    nees += x[a] * x[a];
  }
  out.nees[0] = nees;
  out.neesDof[0] = m;
}
