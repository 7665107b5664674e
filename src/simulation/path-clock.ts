import type { ResolvedMission } from '../mission/resolve-mission';

/**
 * Heading and distance travelled along the nominal path at any mission time,
 * for the true sensor inputs: a gyro sample reports the mean turn rate over
 * its interval, (ψ(t1) - ψ(t0)) / (t1 - t0), a speed sample the mean speed,
 * (d(t1) - d(t0)) / (t1 - t0). Both are exact on the mission's segments
 * (constant turn rate, speed constant or ramped linearly). Times must be asked
 * for in non-decreasing order (a cursor walks the segments).
 */
export class PathClock {
  private readonly startHeadingRad: Float64Array;
  private readonly startDistanceM: Float64Array;
  private segment = 0;

  constructor(private readonly mission: ResolvedMission) {
    const segs = mission.segments;
    this.startHeadingRad = new Float64Array(segs.length);
    this.startDistanceM = new Float64Array(segs.length);
    let psi = mission.startHeadingRad, d = 0;
    segs.forEach((s, i) => {
      this.startHeadingRad[i] = psi;
      this.startDistanceM[i] = d;
      const tau = s.endS - s.startS;
      psi += s.turnRateRadps * tau;
      d += 0.5 * (s.speedStartMps + s.speedEndMps) * tau;
    });
  }

  /** Rewinds to the mission's start (for the next run). */
  reset(): void {
    this.segment = 0;
  }

  /** Heading (rad, from north towards east, not wrapped) and distance (m) at tS. */
  at(tS: number, out: { headingRad: number; distanceM: number }): void {
    const segs = this.mission.segments;
    while (this.segment < segs.length - 1 && tS >= segs[this.segment].endS) this.segment++;
    const s = segs[this.segment];
    const tau = Math.min(tS, s.endS) - s.startS;
    // Past the mission's end (a sample interval that straddles it) the vehicle keeps its final speed and turn rate.
    const beyond = Math.max(0, tS - s.endS);
    const accel = (s.speedEndMps - s.speedStartMps) / (s.endS - s.startS);
    out.headingRad = this.startHeadingRad[this.segment] + s.turnRateRadps * (tau + beyond);
    out.distanceM = this.startDistanceM[this.segment] + s.speedStartMps * tau + 0.5 * accel * tau * tau + s.speedEndMps * beyond;
  }
}
