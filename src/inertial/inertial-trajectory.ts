import { InputError } from '../errors';
import { poseFunction, segmentIndexAt, stepTimes } from '../mission/nominal-trajectory';
import { EARTH, type EarthModel } from './earth';
import type { ResolvedInertialMission } from './inertial-mission';

/** The nominal motion at one instant, SI, navigation frame NED (docs/inertial-model.md §1, §2). */
export interface NominalRow {
  tS: number;
  segmentIndex: number;
  northM: number; eastM: number; downM: number;
  heightM: number; latitudeRad: number;
  /** Track (= yaw), pitch and roll, rad. */
  yawRad: number; pitchRad: number; rollRad: number;
  /** Horizontal speed v, its rate v̇, the turn rate ω and the vertical speed (up positive). */
  speedMps: number; accelMps2: number; turnRateRadps: number; verticalSpeedMps: number;
  /** v^n, m/s. */
  velocityNed: [number, number, number];
  /** Specific force f^n = a^n − (0, 0, g), m/s². */
  specificForceNed: [number, number, number];
  /** C_b^n row-major (body x fwd, y right, z down to NED). */
  bodyToNav: Float64Array;
  /** ω_ib^b = C_n^b (0, 0, ω), rad/s. */
  bodyRateRadps: [number, number, number];
  /** f^b = C_n^b f^n, m/s². */
  specificForceBody: [number, number, number];
}

/** Largest pitch the attitude rules allow under `banked`, rad: the yaw relation of §5 is singular at ±90°. */
const MAX_BANKED_PITCH_RAD = (80 * Math.PI) / 180;
/** Steepest slope under `ground`, rad (docs/inertial-model.md §2). */
const MAX_GROUND_SLOPE_RAD = (60 * Math.PI) / 180;

/** C_b^n = R_z(ψ) R_y(θ) R_x(φ), row-major (docs/inertial-model.md §1). */
export function bodyToNavMatrix(yawRad: number, pitchRad: number, rollRad: number): Float64Array {
  const cy = Math.cos(yawRad), sy = Math.sin(yawRad), cp = Math.cos(pitchRad), sp = Math.sin(pitchRad);
  const cr = Math.cos(rollRad), sr = Math.sin(rollRad);
  return Float64Array.of(
    cy * cp, cy * sp * sr - sy * cr, cy * sp * cr + sy * sr,
    sy * cp, sy * sp * sr + cy * cr, sy * sp * cr - cy * sr,
    -sp, cp * sr, cp * cr,
  );
}

/** Cᵀ v for a row-major 3 x 3 C. */
function transposeTimes(c: Float64Array, v: readonly number[]): [number, number, number] {
  return [
    c[0] * v[0] + c[3] * v[1] + c[6] * v[2],
    c[1] * v[0] + c[4] * v[1] + c[7] * v[2],
    c[2] * v[0] + c[5] * v[1] + c[8] * v[2],
  ];
}

/**
 * A function giving the nominal row at any mission time (segments half-open):
 * horizontal position from the planar closed-form arcs, D = −∫ v_up dt,
 * attitude from the mission's rule (docs/inertial-model.md §2).
 * @throws InputError (at build time) naming the segment whose attitude would
 *   put the pitch near ±90°.
 */
export function nominalRowFunction(m: ResolvedInertialMission, earth: EarthModel = EARTH): (tS: number) => NominalRow {
  const pose = poseFunction(m);
  const downAtStart: number[] = [0];
  m.segments.forEach((seg, i) => {
    checkAttitude(m, i);
    downAtStart.push(downAtStart[i] - m.verticalSpeedMps[i] * (seg.endS - seg.startS));
  });
  const g = earth.gravityMps2;
  return (tS) => {
    const p = pose(tS);
    const i = segmentIndexAt(m.segments, tS);
    const seg = m.segments[i];
    const vUp = m.verticalSpeedMps[i];
    const downM = downAtStart[i] - vUp * Math.max(0, tS - seg.startS);
    const heightM = m.startHeightM - downM;
    const v = p.speedMps, w = p.turnRateRadps, psi = p.headingRad;
    const accel = (seg.speedEndMps - seg.speedStartMps) / (seg.endS - seg.startS);
    const pitch = m.attitudeRule === 'level' ? 0 : Math.atan2(vUp, v);
    const roll = m.attitudeRule === 'banked' ? Math.atan((v * w) / g) : 0;
    const c = Math.cos(psi), s = Math.sin(psi);
    const fNed: [number, number, number] = [accel * c - v * w * s, accel * s + v * w * c, -g];
    const cbn = bodyToNavMatrix(psi, pitch, roll);
    return {
      tS, segmentIndex: i, northM: p.northM, eastM: p.eastM, downM, heightM,
      latitudeRad: m.startLatitudeRad + p.northM / (earth.radiusM + heightM),
      yawRad: psi, pitchRad: pitch, rollRad: roll,
      speedMps: v, accelMps2: accel, turnRateRadps: w, verticalSpeedMps: vUp,
      velocityNed: [v * c, v * s, -vUp], specificForceNed: fNed, bodyToNav: cbn,
      bodyRateRadps: transposeTimes(cbn, [0, 0, w]), specificForceBody: transposeTimes(cbn, fNed),
    };
  };
}

/** The nominal rows at every step t_k = k·stepS. */
export function buildInertialTrajectory(m: ResolvedInertialMission, stepS: number, earth: EarthModel = EARTH): NominalRow[] {
  const row = nominalRowFunction(m, earth);
  return Array.from(stepTimes(m.durationS, stepS), (t) => row(t));
}

function checkAttitude(m: ResolvedInertialMission, i: number): void {
  if (m.attitudeRule === 'level') return;
  const seg = m.segments[i];
  const vUp = Math.abs(m.verticalSpeedMps[i]);
  const slowest = Math.min(seg.speedStartMps, seg.speedEndMps);
  const pitch = vUp === 0 ? 0 : Math.atan2(vUp, slowest);
  const limit = m.attitudeRule === 'banked' ? MAX_BANKED_PITCH_RAD : MAX_GROUND_SLOPE_RAD;
  if (pitch > limit) {
    const what = m.attitudeRule === 'banked'
      ? 'climbs or descends with (almost) no forward speed, so the banked rule would pitch the vehicle near ±90°'
      : `is steeper than ${Math.round((limit * 180) / Math.PI)}° for the ground rule`;
    throw new InputError(`mission.segments[${i}].verticalSpeed`,
      `segment ${i + 1} ${what}; the yaw relation is singular there (use the level rule, or give the segment forward speed)`);
  }
}
