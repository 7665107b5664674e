import type { NominalTrajectory } from '../mission/nominal-trajectory';
import { TIME_SLACK_S } from '../mission/nominal-trajectory';

/** A stretch of one step inside one segment, with the motion the dynamics use there. */
export interface StepPiece {
  segmentIndex: number;
  lengthS: number;
  speedMps: number;
  turnRateRadps: number;
  /** Equal keys mean equal discretisations (constant-speed segments reuse theirs). */
  cacheKey: string;
}

/**
 * Splits the step (t_{k-1}, t_k] at segment boundaries. On a speed ramp the
 * speed is taken at the piece's midpoint (second-order accurate in the step;
 * docs/planar-model.md §4 allows F at the step's start); elsewhere F is exact.
 */
export function stepPieces(traj: NominalTrajectory, k: number): StepPiece[] {
  const t0 = traj.tS[k - 1], t1 = traj.tS[k];
  const pieces: StepPiece[] = [];
  traj.segments.forEach((seg, i) => {
    const a = Math.max(t0, seg.startS), b = Math.min(t1, seg.endS);
    if (b - a <= TIME_SLACK_S) return;
    const ramp = seg.speedEndMps !== seg.speedStartMps;
    const mid = (a + b) / 2;
    const speed = ramp
      ? seg.speedStartMps + ((seg.speedEndMps - seg.speedStartMps) * (mid - seg.startS)) / (seg.endS - seg.startS)
      : seg.speedStartMps;
    const lengthS = b - a;
    const cacheKey = ramp ? '' : `${i}|${lengthS.toPrecision(12)}`;
    pieces.push({ segmentIndex: i, lengthS, speedMps: speed, turnRateRadps: seg.turnRateRadps, cacheKey });
  });
  return pieces;
}
