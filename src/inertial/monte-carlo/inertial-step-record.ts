import { wrapAngle } from '../../sensors/range-bearing';
import type { RunSink } from '../../simulation/monte-carlo-model';
import { ATTITUDE, NAV_STATES, POSITION, VELOCITY, type InertialModel } from '../inertial-model';
import { INERTIAL_QUANTITIES } from '../inertial-quantities';
import type { NominalRow } from '../inertial-trajectory';
import type { InertialFilter } from './inertial-filter';
import type { InertialTruth } from './inertial-truth';
import { eulerFromRotation } from './rotation3';

/** The quantities the 3-D Monte Carlo reports (ids of INERTIAL_QUANTITIES), in this order. */
export const INERTIAL_SIMULATED = [
  'north', 'east', 'down', 'along', 'cross', 'velocityNorth', 'velocityEast', 'velocityDown', 'roll', 'pitch', 'yaw',
] as const;

/** What one run of the 3-D simulation holds between steps. */
export interface InertialStepState {
  model: InertialModel;
  truth: InertialTruth;
  filter: InertialFilter;
  /** +1 where the filter's error is estimate − truth, −1 for the IMU states (truth − estimate). */
  sign: Float64Array;
  /** The filter's estimate of every non-navigation state (index = state), SI. */
  estimate: Float64Array;
}

/** States whose variance is below this are left out of the NEES: they are exactly known. */
const KNOWN_STATE_VARIANCE = 1e-300;

/**
 * Errors, the filter's variances and the NEES of one step (RunSink.step).
 * Position and velocity errors are INS − truth in NED; along and across the
 * nominal track; roll, pitch and yaw are the exact differences of the Euler
 * angles of Ĉ_b^n and C_b^n (wrapped), their variances the quadratic forms of
 * inertial-quantities.ts on the filter's P at the nominal attitude.
 */
export function recordInertialStep(state: InertialStepState, row: NominalRow, estimate: NominalRow, sink: RunSink, k: number): void {
  const { truth, filter } = state;
  const n = state.model.states.length, p = filter.p;
  const errors = new Float64Array(INERTIAL_SIMULATED.length), variances = new Float64Array(INERTIAL_SIMULATED.length);
  const trueAngles = eulerFromRotation(row.bodyToNav, new Float64Array(3));
  const estAngles = eulerFromRotation(estimate.bodyToNav, new Float64Array(3));
  const [dn, de, dd] = truth.dr;
  const cy = Math.cos(row.yawRad), sy = Math.sin(row.yawRad);
  const value: Record<(typeof INERTIAL_SIMULATED)[number], number> = {
    north: dn, east: de, down: dd, along: cy * dn + sy * de, cross: -sy * dn + cy * de,
    velocityNorth: truth.dv[0], velocityEast: truth.dv[1], velocityDown: truth.dv[2],
    yaw: wrapAngle(estAngles[0] - trueAngles[0]), pitch: wrapAngle(estAngles[1] - trueAngles[1]), roll: wrapAngle(estAngles[2] - trueAngles[2]),
  };
  const reader = (i: number, j: number) => p[i * n + j];
  INERTIAL_SIMULATED.forEach((id, q) => {
    errors[q] = value[id];
    variances[q] = INERTIAL_QUANTITIES.find((x) => x.id === id)!.variance(reader, row);
  });
  const x = errorVector(state);
  const all: number[] = [];
  for (let i = 0; i < n; i++) if (p[i * n + i] > KNOWN_STATE_VARIANCE) all.push(i);
  const groups = [all, [POSITION, POSITION + 1, POSITION + 2], [ATTITUDE, ATTITUDE + 1, ATTITUDE + 2]];
  const nees = new Float64Array(3), dof = new Float64Array(3);
  groups.forEach((idx, g) => {
    nees[g] = neesOver(p, n, idx, x);
    dof[g] = idx.length;
  });
  sink.step(k, errors, variances, nees, dof);
}

/** x̃ᵀ P⁻¹ x̃ over the states `idx`, by Cholesky (Golub & Van Loan, Matrix Computations, 4th ed., Alg. 4.2.1); NaN if P is not positive there. */
function neesOver(p: Float64Array, n: number, idx: number[], x: Float64Array): number {
  const m = idx.length, l = new Float64Array(m * m), y = new Float64Array(m);
  for (let a = 0; a < m; a++) {
    for (let b = 0; b <= a; b++) {
      let sum = p[idx[a] * n + idx[b]];
      for (let c = 0; c < b; c++) sum -= l[a * m + c] * l[b * m + c];
      if (a === b) {
        if (!(sum > 0)) return NaN;
        l[a * m + a] = Math.sqrt(sum);
      } else l[a * m + b] = sum / l[b * m + b];
    }
  }
  let nees = 0;
  for (let a = 0; a < m; a++) {
    let v = x[idx[a]];
    for (let c = 0; c < a; c++) v -= l[a * m + c] * y[c];
    y[a] = v / l[a * m + a];
    nees += y[a] * y[a];
  }
  return nees;
}

/** The filter's error state of the run now: δr, δv, δψ (INS − truth), then sign·(estimate − truth) of every other state. */
export function errorVector(state: InertialStepState): Float64Array {
  const { truth, sign, estimate } = state;
  const x = new Float64Array(estimate.length);
  x.set(truth.dr, POSITION);
  x.set(truth.dv, VELOCITY);
  x.set(truth.attitudeVector(new Float64Array(3)), ATTITUDE);
  for (let s = NAV_STATES; s < x.length; s++) x[s] = sign[s] * (estimate[s] - truth.processes[s].value);
  return x;
}
