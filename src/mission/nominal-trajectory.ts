import type { ResolvedMission, ResolvedSegment } from './resolve-mission';

/** Pose and motion of the nominal path at one instant (SI, north/east frame). */
export interface NominalPose {
  northM: number;
  eastM: number;
  /** From north towards east. */
  headingRad: number;
  speedMps: number;
  turnRateRadps: number;
  /** Index of the segment that holds this instant. */
  segmentIndex: number;
}

/** The nominal path sampled at the output steps t_k = k * stepS (the last step ends at the mission's end). */
export interface NominalTrajectory {
  stepS: number;
  /** Step times, length = number of steps + 1. */
  tS: Float64Array;
  northM: Float64Array;
  eastM: Float64Array;
  headingRad: Float64Array;
  speedMps: Float64Array;
  turnRateRadps: Float64Array;
  segments: ResolvedSegment[];
}

/** Tolerance for comparing times on the mission clock, seconds (docs/planar-model.md §5). */
export const TIME_SLACK_S = 1e-9;

/**
 * Step times t_k = k * stepS, computed as products (never accumulated), with a
 * last, shorter step ending exactly at the mission's end when the duration is
 * not a whole number of steps.
 */
export function stepTimes(durationS: number, stepS: number): Float64Array {
  const whole = Math.floor(durationS / stepS + 1e-9);
  const lastS = whole * stepS;
  const extra = durationS - lastS > TIME_SLACK_S ? 1 : 0;
  const t = new Float64Array(whole + 1 + extra);
  for (let k = 0; k <= whole; k++) t[k] = k * stepS;
  if (extra) t[whole + 1] = durationS;
  else t[whole] = durationS;
  return t;
}

/** Index of the segment holding time t (a boundary belongs to the later segment, the end to the last). */
export function segmentIndexAt(segments: ResolvedSegment[], tS: number): number {
  for (let i = 0; i < segments.length; i++) {
    if (tS < segments[i].endS - TIME_SLACK_S) return i;
  }
  return segments.length - 1;
}

/**
 * Displacement along a segment of constant turn rate and linearly ramped speed,
 * in closed form: the integral of (v0 + a s) exp(i (psi0 + w s)) ds from 0 to tau
 * (north = real part, east = imaginary part). A Taylor series replaces the
 * closed form when w*tau is tiny, where the closed form cancels.
 */
function arcDisplacement(v0: number, accel: number, psi0: number, w: number, tau: number): [number, number] {
  let i0Re: number, i0Im: number, i1Re: number, i1Im: number;
  const x = w * tau;
  if (Math.abs(x) < 1e-4) {
    i0Re = tau - (w * w * tau ** 3) / 6;
    i0Im = (w * tau * tau) / 2 - (w ** 3 * tau ** 4) / 24;
    i1Re = (tau * tau) / 2 - (w * w * tau ** 4) / 8;
    i1Im = (w * tau ** 3) / 3 - (w ** 3 * tau ** 5) / 30;
  } else {
    const c = Math.cos(x), s = Math.sin(x);
    // I0 = (e^{ix} - 1)/(i w);  I1 = tau e^{ix}/(i w) + (e^{ix} - 1)/w^2
    i0Re = s / w;
    i0Im = (1 - c) / w;
    i1Re = (tau * s) / w + (c - 1) / (w * w);
    i1Im = (-tau * c) / w + s / (w * w);
  }
  const re = v0 * i0Re + accel * i1Re;
  const im = v0 * i0Im + accel * i1Im;
  const cp = Math.cos(psi0), sp = Math.sin(psi0);
  return [cp * re - sp * im, sp * re + cp * im];
}

/** Start pose of each segment, by chaining closed-form arcs. */
function segmentStarts(m: ResolvedMission): { n: number; e: number; psi: number }[] {
  const starts = [{ n: m.startNorthM, e: m.startEastM, psi: m.startHeadingRad }];
  for (const seg of m.segments) {
    const s = starts[starts.length - 1];
    const tau = seg.endS - seg.startS;
    const accel = (seg.speedEndMps - seg.speedStartMps) / tau;
    const [dn, de] = arcDisplacement(seg.speedStartMps, accel, s.psi, seg.turnRateRadps, tau);
    starts.push({ n: s.n + dn, e: s.e + de, psi: s.psi + seg.turnRateRadps * tau });
  }
  return starts;
}

/** A function giving the nominal pose at any mission time. */
export function poseFunction(m: ResolvedMission): (tS: number) => NominalPose {
  const starts = segmentStarts(m);
  return (tS: number) => {
    const i = segmentIndexAt(m.segments, tS);
    const seg = m.segments[i];
    const s = starts[i];
    const tau = Math.max(0, tS - seg.startS);
    const accel = (seg.speedEndMps - seg.speedStartMps) / (seg.endS - seg.startS);
    const [dn, de] = arcDisplacement(seg.speedStartMps, accel, s.psi, seg.turnRateRadps, tau);
    return {
      northM: s.n + dn,
      eastM: s.e + de,
      headingRad: s.psi + seg.turnRateRadps * tau,
      speedMps: seg.speedStartMps + accel * tau,
      turnRateRadps: seg.turnRateRadps,
      segmentIndex: i,
    };
  };
}

/** Samples the nominal path at every output step. */
export function buildNominalTrajectory(m: ResolvedMission, stepS: number): NominalTrajectory {
  const tS = stepTimes(m.durationS, stepS);
  const pose = poseFunction(m);
  const len = tS.length;
  const traj: NominalTrajectory = {
    stepS,
    tS,
    northM: new Float64Array(len),
    eastM: new Float64Array(len),
    headingRad: new Float64Array(len),
    speedMps: new Float64Array(len),
    turnRateRadps: new Float64Array(len),
    segments: m.segments,
  };
  for (let k = 0; k < len; k++) {
    const p = pose(tS[k]);
    traj.northM[k] = p.northM;
    traj.eastM[k] = p.eastM;
    traj.headingRad[k] = p.headingRad;
    traj.speedMps[k] = p.speedMps;
    traj.turnRateRadps[k] = p.turnRateRadps;
  }
  return traj;
}
