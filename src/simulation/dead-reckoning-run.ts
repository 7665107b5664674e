import type { PlanarPlan } from './planar-plan';
import { PathClock } from './path-clock';
import type { RunRandom } from './run-random';
import { ScalarProcess } from './scalar-process';

/** Rounds to the nearest multiple of the LSB (mid-tread quantiser); q = 0 leaves x as it is. */
function quantise(x: number, q: number): number {
  return q > 0 ? q * Math.round(x / q) : x;
}

/**
 * Truth and dead reckoning of one planar run between the filter's steps.
 *
 * Truth: the vehicle follows the nominal path exactly. Every calibration state
 * is a {@link ScalarProcess} drawn exactly in discrete time; the gyro reports
 * the mean true turn rate over each sample interval plus its errors (biases
 * held over the interval, scale factor times the rate, white noise of the
 * budget's PSD × rate per sample), rounded to its LSB; the speed sensor
 * likewise reports the mean true speed (a parked wheel reads exactly zero).
 *
 * Dead reckoning (the filter's navigation solution) integrates those outputs
 * nonlinearly, corrected with the filter's current calibration estimates:
 * heading first (ψ̂ grows at the corrected rate), then position along the
 * estimated heading: position moves by v̂ [cos ψ̂, sin ψ̂] dt, the integral by
 * the midpoint rule on sub-intervals that split at every gyro and speed
 * sample (exact to (ω̂ Δt)²/24). Each sample is used over the interval it
 * describes, so the dead reckoning runs one sample ahead of a real-time
 * implementation (which would lag by up to a sample period).
 */
export class DeadReckoningRun {
  readonly truth: ScalarProcess[];
  /** Filter estimate of each state's calibration value (index = state), SI. */
  readonly estimate: Float64Array;
  northM = 0;
  eastM = 0;
  headingRad = 0;
  /** Corrected and true speed of the last speed sample, m/s. */
  speedMps = 0;
  trueSpeedMps = 0;
  /** Whether the last speed sample read non-zero. */
  moving = false;
  private timeS = 0;
  private lastTrueHeadingRad = 0;
  private lastTrueDistanceM = 0;
  private rateRadps = 0;
  private gyroIndex = 0;
  private wheelIndex = 0;
  private readonly gyroClock: PathClock;
  private readonly wheelClock: PathClock;
  private readonly gyroStates: number[];
  private readonly speedStates: number[];
  private readonly at = { headingRad: 0, distanceM: 0 };
  private readonly n: number;

  constructor(private readonly plan: PlanarPlan) {
    this.n = plan.n;
    this.truth = Array.from({ length: plan.n }, () => new ScalarProcess(0, 0));
    for (const c of plan.calibration) this.truth[c.state] = new ScalarProcess(c.decayPerS, c.psdSI);
    this.estimate = new Float64Array(plan.n);
    const { heading, along } = plan.model.core;
    const coupled = (row: number) => plan.calibration.map((c) => c.state).filter((s) => this.coefficient(row, s, 1, 1) !== 0);
    this.gyroStates = coupled(heading);
    if (this.gyroStates.some((s) => plan.fSpeed[heading * plan.n + s] !== 0)) throw new Error('internal: a gyro error that depends on the speed');
    this.speedStates = coupled(along);
    this.gyroClock = new PathClock(plan.mission);
    this.wheelClock = new PathClock(plan.mission);
  }

  /** F[row][s] at speed v and turn rate w: the sensor error's coefficient on state s. */
  private coefficient(row: number, s: number, v: number, w: number): number {
    const e = row * this.n + s;
    return this.plan.f0[e] + v * this.plan.fSpeed[e] + w * this.plan.fTurn[e];
  }

  /**
   * The corrected input from a measured one. The sensor model is affine in
   * the true input u (a rate or a speed): measured = u (1 + Σ a_s x_s) + Σ b_s x_s
   * (scale factors a, biases b), so with the estimates x̂ the correction
   * inverts it exactly: û = (measured - Σ b_s x̂_s) / (1 + Σ a_s x̂_s). A
   * first-order correction (measured - Σ ... x̂ · measured) would make the
   * filter converge to x / (1 + x) instead of the scale factor x.
   * @param other the other input of F (speed for the gyro row), SI.
   * @param speedRow 1 when u is the speed (F's per-speed terms scale u), 0 when it is the turn rate.
   */
  private invert(row: number, states: number[], measured: number, other: number, speedRow: 0 | 1): number {
    let scale = 1, offset = 0;
    const { f0, fSpeed, fTurn } = this.plan;
    for (let i = 0; i < states.length; i++) {
      const s = states[i], e = row * this.n + s, x = this.estimate[s];
      scale += (speedRow ? fSpeed[e] : fTurn[e]) * x;
      offset += (f0[e] + other * (speedRow ? fTurn[e] : fSpeed[e])) * x;
    }
    return (measured - offset) / scale;
  }

  /** Draws the run's initial errors and calibration values and reads the first gyro sample. */
  start(rng: RunRandom, initialErrors: { northM: number; eastM: number; headingRad: number }): void {
    const m = this.plan.mission;
    for (const c of this.plan.calibration) this.truth[c.state].start(c.initialSigmaSI, rng);
    this.estimate.fill(0);
    this.northM = m.startNorthM + initialErrors.northM;
    this.eastM = m.startEastM + initialErrors.eastM;
    this.headingRad = m.startHeadingRad + initialErrors.headingRad;
    this.timeS = 0;
    this.gyroIndex = 0;
    this.wheelIndex = 0;
    this.speedMps = this.trueSpeedMps = 0;
    this.lastTrueDistanceM = 0;
    this.moving = false;
    this.gyroClock.reset();
    this.wheelClock.reset();
    this.readGyro(rng);
    if (this.plan.speed) this.readSpeed(rng);
  }

  /** Integrates up to t1S (after the current time); returns the dead-reckoned heading change, rad. */
  advanceTo(t1S: number, rng: RunRandom): number {
    const startHeading = this.headingRad;
    const gyroRate = this.plan.gyro.rateHz;
    const wheelRate = this.plan.speed?.rateHz ?? 0;
    // cos and sin of the heading are carried by small rotations within the step
    // (the heading is corrected only at step boundaries), one pair of trig calls per step.
    let cosPsi = Math.cos(this.headingRad), sinPsi = Math.sin(this.headingRad);
    while (this.timeS < t1S - 1e-12) {
      const nextGyroS = (this.gyroIndex + 1) / gyroRate;
      const nextWheelS = wheelRate > 0 ? (this.wheelIndex + 1) / wheelRate : Infinity;
      let t = Math.min(nextGyroS, nextWheelS, t1S);
      if (Math.abs(t - t1S) < 1e-9) t = t1S;
      const d = t - this.timeS;
      const half = 0.5 * this.rateRadps * d;
      // cos and sin of the half-step angle by their Taylor series to x⁵ (|x| < 0.01 rad here: error < 1e-16).
      const h2 = half * half;
      const ch = 1 - 0.5 * h2 * (1 - h2 / 12), sh = half * (1 - (h2 / 6) * (1 - h2 / 20));
      const cosMid = cosPsi * ch - sinPsi * sh, sinMid = sinPsi * ch + cosPsi * sh;
      this.northM += this.speedMps * cosMid * d;
      this.eastM += this.speedMps * sinMid * d;
      cosPsi = cosMid * ch - sinMid * sh;
      sinPsi = sinMid * ch + cosMid * sh;
      this.headingRad += this.rateRadps * d;
      this.timeS = t;
      if (nextWheelS <= t + 1e-9) {
        this.wheelIndex++;
        this.readSpeed(rng);
      }
      if (nextGyroS <= t + 1e-9) {
        this.gyroIndex++;
        this.readGyro(rng);
      }
    }
    return this.headingRad - startHeading;
  }

  /** The gyro sample over [j/f, (j+1)/f]: true mean rate plus errors, rounded, then corrected by the estimates. */
  private readGyro(rng: RunRandom): void {
    const { rateHz, whiteSigmaSI, quantumSI } = this.plan.gyro;
    const t0 = this.gyroIndex / rateHz, t1 = (this.gyroIndex + 1) / rateHz;
    const psi0 = this.gyroIndex === 0 ? this.plan.mission.startHeadingRad : this.lastTrueHeadingRad;
    this.gyroClock.at(t1, this.at);
    this.lastTrueHeadingRad = this.at.headingRad;
    const trueRate = (this.at.headingRad - psi0) * rateHz;
    const { heading } = this.plan.model.core;
    let error = 0;
    const { f0, fTurn } = this.plan;
    const row = heading * this.n;
    // The gyro row of F has no per-speed terms in the planar model (checked in the constructor).
    for (let i = 0; i < this.gyroStates.length; i++) {
      const s = this.gyroStates[i];
      error += (f0[row + s] + trueRate * fTurn[row + s]) * this.truth[s].advanceTo(t0, rng);
    }
    const measured = quantise(trueRate + error + (whiteSigmaSI > 0 ? whiteSigmaSI * rng.normal() : 0), quantumSI);
    this.rateRadps = this.invert(heading, this.gyroStates, measured, this.speedMps, 0);
  }

  /** The speed sample over [i/f, (i+1)/f]: true mean speed plus errors, rounded, corrected by the estimates (a parked wheel reads zero). */
  private readSpeed(rng: RunRandom): void {
    const { rateHz, whiteSigmaSI, quantumSI } = this.plan.speed!;
    const t0 = this.wheelIndex / rateHz;
    const d0 = this.wheelIndex === 0 ? 0 : this.lastTrueDistanceM;
    this.wheelClock.at((this.wheelIndex + 1) / rateHz, this.at);
    this.lastTrueDistanceM = this.at.distanceM;
    const trueSpeed = (this.at.distanceM - d0) * rateHz;
    const { along } = this.plan.model.core;
    let measured = 0;
    if (trueSpeed > 0) {
      let error = 0;
      for (const s of this.speedStates) error += this.coefficient(along, s, trueSpeed, 0) * this.truth[s].advanceTo(t0, rng);
      measured = quantise(trueSpeed + error + (whiteSigmaSI > 0 ? whiteSigmaSI * rng.normal() : 0), quantumSI);
    }
    this.speedMps = measured > 0 ? this.invert(along, this.speedStates, measured, 0, 1) : 0;
    this.trueSpeedMps = trueSpeed;
    this.moving = measured > 0;
  }
}
