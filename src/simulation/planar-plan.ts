import { InputError } from '../errors';
import type { ErrorModel, MeasurementStream } from '../covariance/error-model';
import { inOutage } from '../covariance/measurement-schedule';
import { TIME_SLACK_S, type NominalTrajectory } from '../mission/nominal-trajectory';
import type { ResolvedMission } from '../mission/resolve-mission';

/** A calibration state as a truth process (docs/planar-model.md §3). */
export interface CalibrationProcess {
  state: number;
  /** 1/T, 1/s (0 for a random constant or walk). */
  decayPerS: number;
  /** Two-sided PSD of the driving noise, SI² per s. */
  psdSI: number;
  initialSigmaSI: number;
}

/** A dead-reckoning sensor's output noise and quantum, per sample. */
export interface OutputNoise {
  rateHz: number;
  /** White noise sigma of one sample, SI (rad/s or m/s). */
  whiteSigmaSI: number;
  /** LSB the output is rounded to, SI (0: not quantised). */
  quantumSI: number;
}

/**
 * Everything a planar run needs from the budget's {@link ErrorModel}, worked
 * out once per study: F split as F0 + v Fv + ω Fω, the continuous Q diagonal,
 * the truth processes, the sensors' per-sample noise and when each aiding
 * sensor measures.
 */
export interface PlanarPlan {
  model: ErrorModel;
  mission: ResolvedMission;
  trajectory: NominalTrajectory;
  n: number;
  f0: Float64Array;
  fSpeed: Float64Array;
  fTurn: Float64Array;
  /** Continuous PSD on each state's diagonal (noise that is on while parked, too). */
  qcAlways: Float64Array;
  /** Continuous PSD on each state's diagonal that is off while the wheel reads zero. */
  qcMoving: Float64Array;
  initialVariance: Float64Array;
  /**
   * Sign of each state's error in the filter: +1 for estimate - truth, -1 for
   * calibration states that drive dead reckoning, whose error is truth -
   * estimate so that the budget's F (heading' = +bias) holds as written.
   */
  sign: Float64Array;
  calibration: CalibrationProcess[];
  gyro: OutputNoise;
  speed?: OutputNoise;
  /** Angle quantum of the heading output, rad (0: none). */
  headingQuantumRad: number;
  /** Per-sample variance added to the speed output while moving, (m/s)² (the budget's speed formula). */
  speedOutputVarianceSI: number;
  /** R of each measurement key, SI². */
  rByKey: Map<string, number>;
  /** Streams measuring at each step boundary (one entry per measurement instant). */
  events: MeasurementStream[][];
}

/**
 * Works out the plan of a planar study.
 * @throws InputError when the model couples calibration states to each other
 *   or to cross-track position, which the planar truth model does not draw.
 */
export function planPlanarRuns(model: ErrorModel, mission: ResolvedMission, trajectory: NominalTrajectory): PlanarPlan {
  const n = model.states.length;
  const f0 = model.dynamics(0, 0);
  const fSpeed = model.dynamics(1, 0).map((x, e) => x - f0[e]);
  const fTurn = model.dynamics(0, 1).map((x, e) => x - f0[e]);
  const { qcAlways, qcMoving } = continuousNoise(model);
  const initialVariance = new Float64Array(n);
  for (const src of model.sources) for (const p of src.initialVariance) initialVariance[p.state] += p.varianceSI;
  const sign = new Float64Array(n).fill(1);
  const calibration = calibrationProcesses(model, f0, fSpeed, fTurn, qcAlways, initialVariance, sign);
  return {
    model, mission, trajectory, n, f0, fSpeed, fTurn, qcAlways, qcMoving, initialVariance, sign, calibration,
    gyro: outputNoise(model, model.core.heading, model.deadReckoningRateHz.gyro),
    speed: model.hasSpeedInput ? outputNoise(model, model.core.along, model.deadReckoningRateHz.speed) : undefined,
    headingQuantumRad: Math.sqrt(12 * model.sources.reduce((a, s) => a + s.headingOutputVarianceSI, 0)),
    speedOutputVarianceSI: model.sources.reduce((a, s) => a + s.speedOutputVarianceSI, 0),
    rByKey: noiseByKey(model),
    events: measurementEvents(model, trajectory),
  };
}

function continuousNoise(model: ErrorModel): { qcAlways: Float64Array; qcMoving: Float64Array } {
  const n = model.states.length;
  const qcAlways = new Float64Array(n), qcMoving = new Float64Array(n);
  for (const src of model.sources) {
    for (const p of src.noise) (p.onlyWhileMoving ? qcMoving : qcAlways)[model.channels[p.channel].stateIndex] += p.psdSI;
  }
  return { qcAlways, qcMoving };
}

function calibrationProcesses(
  model: ErrorModel, f0: Float64Array, fSpeed: Float64Array, fTurn: Float64Array,
  qc: Float64Array, p0: Float64Array, sign: Float64Array,
): CalibrationProcess[] {
  const n = model.states.length;
  const { along, cross, heading } = model.core;
  const core = new Set([along, cross, heading]);
  const out: CalibrationProcess[] = [];
  for (let s = 0; s < n; s++) {
    if (core.has(s)) continue;
    const any = (i: number, j: number) => f0[i * n + j] !== 0 || fSpeed[i * n + j] !== 0 || fTurn[i * n + j] !== 0;
    for (let i = 0; i < n; i++) {
      if (i !== s && !core.has(i) && any(i, s)) throw new InputError('sensors', `the simulation cannot draw "${model.states[i].name}" driven by "${model.states[s].name}"`);
    }
    if (any(cross, s)) throw new InputError('sensors', `the simulation cannot draw a cross-track error driven by "${model.states[s].name}"`);
    if (fSpeed[s * n + s] !== 0 || fTurn[s * n + s] !== 0) throw new InputError('sensors', `"${model.states[s].name}" has speed-dependent dynamics`);
    if (any(heading, s) || any(along, s)) sign[s] = -1;
    out.push({ state: s, decayPerS: -f0[s * n + s], psdSI: qc[s], initialSigmaSI: Math.sqrt(p0[s]) });
  }
  return out;
}

/**
 * White noise per sample (PSD × rate, docs/planar-model.md §3) and LSB of the
 * sensor whose noise drives `state`. Several LSB rows combine as one of the
 * root-sum-square size (the budget adds their variances).
 */
function outputNoise(model: ErrorModel, state: number, rateHz: number): OutputNoise {
  let whiteVariance = 0, quantumSI = 0;
  for (const src of model.sources) {
    for (const p of src.noise) {
      if (model.channels[p.channel].stateIndex !== state) continue;
      if (src.quantumSI !== undefined) quantumSI = Math.hypot(quantumSI, src.quantumSI);
      else whiteVariance += p.psdSI * rateHz;
    }
  }
  return { rateHz, whiteSigmaSI: Math.sqrt(whiteVariance), quantumSI };
}

function noiseByKey(model: ErrorModel): Map<string, number> {
  const map = new Map<string, number>();
  for (const src of model.sources) for (const p of src.measurementNoise) map.set(p.measurement, (map.get(p.measurement) ?? 0) + p.varianceSI);
  return map;
}

/** Each aiding measurement instant j/f, processed at the first step boundary at or after it (docs/planar-model.md §5). */
function measurementEvents(model: ErrorModel, traj: NominalTrajectory): MeasurementStream[][] {
  const last = traj.tS.length - 1;
  const events: MeasurementStream[][] = Array.from({ length: last + 1 }, () => []);
  for (const stream of model.streams) {
    for (let j = 0; ; j++) {
      const tS = j / stream.rateHz;
      if (tS > traj.tS[last] + TIME_SLACK_S) break;
      if (inOutage(stream.outages, tS)) continue;
      events[Math.min(last, Math.max(0, Math.ceil(tS / traj.stepS - 1e-9)))].push(stream);
    }
  }
  return events;
}
