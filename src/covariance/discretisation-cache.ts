import type { ErrorModel } from './error-model';
import { TIME_SLACK_S, type NominalTrajectory } from '../mission/nominal-trajectory';
import { discretiseStep, type StepDiscretisation } from './discretise-step';
import { stepPieces } from './step-pieces';
import { RampDiscretiser } from './ramp-discretisation';

/**
 * Φ and Q_d for every step of a run, computed once per constant-speed
 * segment for full steps (docs/planar-model.md §4: the error dynamics are time
 * invariant in the path frame there), interpolated in speed on ramps, and
 * per piece where a step straddles a segment boundary.
 */
export class DiscretisationCache {
  private readonly perSegment: (StepDiscretisation | undefined)[];
  private readonly byKey = new Map<string, StepDiscretisation>();
  private readonly ramps = new Map<number, RampDiscretiser>();
  private segment = 0;
  /** The one-element answer of a full step, reused (the run reads it before asking for the next step). */
  private readonly single: StepDiscretisation[] = [];

  constructor(private readonly model: ErrorModel, private readonly traj: NominalTrajectory) {
    this.perSegment = new Array(traj.segments.length);
  }

  /** The discretisations that carry P from t_{k-1} to t_k, in order; steps must be asked for in increasing k. */
  forStep(k: number): readonly StepDiscretisation[] {
    const { tS, segments, stepS } = this.traj;
    const t0 = tS[k - 1], t1 = tS[k];
    while (this.segment < segments.length - 1 && t0 >= segments[this.segment].endS - TIME_SLACK_S) this.segment++;
    const seg = segments[this.segment];
    const constant = seg.speedStartMps === seg.speedEndMps;
    if (constant && t1 <= seg.endS + TIME_SLACK_S && Math.abs(t1 - t0 - stepS) <= 1e-9 * stepS) {
      const i = this.segment;
      this.perSegment[i] ??= discretiseStep(this.model, seg.speedStartMps, seg.turnRateRadps, stepS);
      this.single[0] = this.perSegment[i]!;
      return this.single;
    }
    if (!constant && t1 <= seg.endS + TIME_SLACK_S && Math.abs(t1 - t0 - stepS) <= 1e-9 * stepS) {
      let ramp = this.ramps.get(this.segment);
      if (!ramp) this.ramps.set(this.segment, (ramp = new RampDiscretiser(this.model, seg, stepS)));
      const mid = (t0 + t1) / 2;
      this.single[0] = ramp.at(seg.speedStartMps + ((seg.speedEndMps - seg.speedStartMps) * (mid - seg.startS)) / (seg.endS - seg.startS));
      return this.single;
    }
    return stepPieces(this.traj, k).map((piece) => {
      const cached = piece.cacheKey ? this.byKey.get(piece.cacheKey) : undefined;
      if (cached) return cached;
      // A ramp changes F every step: the power series is far cheaper than a Van Loan exponential per channel.
      const d = discretiseStep(this.model, piece.speedMps, piece.turnRateRadps, piece.lengthS, piece.cacheKey ? 'van-loan' : 'series');
      if (piece.cacheKey) this.byKey.set(piece.cacheKey, d);
      return d;
    });
  }
}
