import { ScalarProcess } from '../../simulation/scalar-process';
import type { RunRandom } from '../../simulation/run-random';
import { ATTITUDE, NAV_STATES, POSITION, VELOCITY, type InertialModel } from '../inertial-model';
import type { NominalRow } from '../inertial-trajectory';
import { multiply3, rotationFromVector, vectorFromRotation } from './rotation3';

/** Per-step white-noise σ of the IMU's increments on each body axis: Δv (m/s) and Δθ (rad) over one step. */
export interface BodyNoise {
  velocitySd: Float64Array;
  attitudeSd: Float64Array;
}

/**
 * The true navigation errors of one 3-D run, by nonlinear error propagation
 * (docs/inertial-model.md §10): the vehicle follows the nominal path; the
 * navigation solution's attitude is Ĉ_b^n = E C_b^n with the attitude error
 * E kept as an exact rotation (not a small angle); its velocity error grows
 * by the exact difference of the two specific forces, Ĉ_b^n f̂^b − C_b^n f^b,
 * where f̂^b is the IMU output corrected with the filter's estimates (the
 * affine sensor model inverted exactly, as in the planar simulation); E
 * grows by exp([C_b^n δω Δ ×]) with δω the corrected rate's error. The
 * Earth-rate, transport-rate and gravity terms of the error dynamics (of order
 * 1e-4/s and below) are taken linear, from the budget's F at the nominal row.
 * IMU and aiding error states are {@link ScalarProcess}es drawn exactly; the
 * white noise of each axis is an increment of variance PSD·Δ per step.
 * Everything is evaluated at the nominal row at the step's start, as the
 * budget's discretisation is.
 */
export class InertialTruth {
  /** δr, δv (INS − truth, NED, m and m/s). */
  readonly dr = new Float64Array(3);
  readonly dv = new Float64Array(3);
  /** Attitude error E = Ĉ_b^n (C_b^n)ᵀ, row-major. */
  readonly e = new Float64Array(9);
  /** True value of each non-navigation state (index = state). */
  readonly processes: ScalarProcess[];
  private readonly rot = new Float64Array(9);
  private readonly tmp = new Float64Array(9);
  private readonly chat = new Float64Array(9);
  private readonly psi = new Float64Array(3);
  private readonly n: number;

  constructor(private readonly model: InertialModel, private readonly initialVariance: Float64Array, psd: Float64Array) {
    this.n = model.states.length;
    this.processes = model.states.map((s, i) => new ScalarProcess(i < NAV_STATES ? 0 : s.decayPerS, i < NAV_STATES ? 0 : psd[i]));
  }

  /** Draws the initial errors (P0 is diagonal for the navigation states) and the error states' starting values. */
  start(rng: RunRandom): void {
    const sd = (i: number) => Math.sqrt(this.initialVariance[i]);
    for (let i = 0; i < 3; i++) this.dr[i] = sd(POSITION + i) * rng.normal();
    for (let i = 0; i < 3; i++) this.dv[i] = sd(VELOCITY + i) * rng.normal();
    const px = sd(ATTITUDE) * rng.normal(), py = sd(ATTITUDE + 1) * rng.normal(), pz = sd(ATTITUDE + 2) * rng.normal();
    rotationFromVector(px, py, pz, this.e);
    for (let s = NAV_STATES; s < this.n; s++) this.processes[s].start(sd(s), rng);
  }

  /** The attitude error as a rotation vector (the filter's δψ), rad. */
  attitudeVector(out: Float64Array): Float64Array {
    return vectorFromRotation(this.e, out);
  }

  /** Ĉ_b^n = E C_b^n at a nominal row, into out. */
  estimatedAttitude(row: NominalRow, out: Float64Array): Float64Array {
    return multiply3(this.e, row.bodyToNav, out);
  }

  /**
   * Advances the errors over one step of dtS from `row`.
   * @param df,dw errors of the corrected specific force (m/s²) and rate (rad/s), body axes, held over the step.
   * @param fNav the budget's F at the nominal row (n x n), for the linear Earth and transport terms.
   */
  advance(row: NominalRow, dtS: number, df: Float64Array, dw: Float64Array, fNav: Float64Array, noise: BodyNoise, rng: RunRandom): void {
    const { n, dr, dv, e, rot, tmp, chat, psi } = this;
    const c = row.bodyToNav, fb = row.specificForceBody;
    multiply3(e, c, chat);
    this.attitudeVector(psi);
    // White increments in body axes (drawn in a fixed order: velocity x, y, z, then attitude x, y, z).
    const wv0 = noise.velocitySd[0] * rng.normal(), wv1 = noise.velocitySd[1] * rng.normal(), wv2 = noise.velocitySd[2] * rng.normal();
    const wa0 = noise.attitudeSd[0] * rng.normal(), wa1 = noise.attitudeSd[1] * rng.normal(), wa2 = noise.attitudeSd[2] * rng.normal();
    const f0 = fb[0] + df[0], f1 = fb[1] + df[1], f2 = fb[2] + df[2];
    const dvNew = [0, 0, 0];
    for (let i = 0; i < 3; i++) {
      const fHat = chat[3 * i] * f0 + chat[3 * i + 1] * f1 + chat[3 * i + 2] * f2;
      let lin = 0;
      for (let j = 0; j < 3; j++) lin += fNav[(VELOCITY + i) * n + POSITION + j] * dr[j] + fNav[(VELOCITY + i) * n + VELOCITY + j] * dv[j];
      const noiseNav = chat[3 * i] * wv0 + chat[3 * i + 1] * wv1 + chat[3 * i + 2] * wv2;
      dvNew[i] = dv[i] + dtS * (fHat - row.specificForceNed[i] + lin) + noiseNav;
    }
    // Linear −[ω_in×] δψ − δω_en(δv) on the left, the IMU's rate error on the right: E ← exp(Δ a×) E exp((C (δω Δ + w))×).
    const left = [0, 0, 0];
    for (let i = 0; i < 3; i++) {
      for (let j = 0; j < 3; j++) left[i] += fNav[(ATTITUDE + i) * n + ATTITUDE + j] * psi[j] + fNav[(ATTITUDE + i) * n + VELOCITY + j] * dv[j];
      left[i] *= dtS;
    }
    const b0 = dw[0] * dtS + wa0, b1 = dw[1] * dtS + wa1, b2 = dw[2] * dtS + wa2;
    const r0 = c[0] * b0 + c[1] * b1 + c[2] * b2, r1 = c[3] * b0 + c[4] * b1 + c[5] * b2, r2 = c[6] * b0 + c[7] * b1 + c[8] * b2;
    multiply3(e, rotationFromVector(r0, r1, r2, rot), tmp);
    multiply3(rotationFromVector(left[0], left[1], left[2], rot), tmp, e);
    for (let i = 0; i < 3; i++) {
      dr[i] += 0.5 * dtS * (dv[i] + dvNew[i]);
      dv[i] = dvNew[i];
    }
  }

  /** Advances every error state's process to tS. */
  advanceStates(tS: number, rng: RunRandom): void {
    for (let s = NAV_STATES; s < this.n; s++) this.processes[s].advanceTo(tS, rng);
  }

  /** Applies the filter's correction of the navigation solution: δr, δv minus the estimate, E ← exp(−[δψ̂×]) E. */
  correct(dR: ArrayLike<number>, dV: ArrayLike<number>, dPsi: ArrayLike<number>): void {
    for (let i = 0; i < 3; i++) {
      this.dr[i] -= dR[i];
      this.dv[i] -= dV[i];
    }
    multiply3(rotationFromVector(-dPsi[0], -dPsi[1], -dPsi[2], this.rot), this.e, this.tmp);
    this.e.set(this.tmp);
  }
}
