/**
 * Bias instability read from the floor of an Allan deviation curve:
 * B = floor / √(2 ln 2/π) = floor / 0.664282 (IEEE Std 952-1997 Annex C, as in
 * docs/checks.md §1.1), with the τ of the floor kept for the Gauss-Markov
 * reading of docs/planar-model.md §3 (T_bi = τ_floor / 1.8926).
 *
 * How the floor is found (a choice of this project; only points with δ ≤ 0.1
 * take part, as in slope-readoff.ts, so that noise in the last decade of a
 * log cannot make a floor):
 * 1. Local slopes over ±¼ decade; the floor is where the slope crosses zero,
 *    τ interpolated linearly in ln τ between the two points around the
 *    crossing (the grid alone would place it only to ±13 % at 10 points per
 *    decade).
 * 2. Where the slope crosses zero more than once, the highest stationary
 *    level is taken. A Gauss-Markov bias shows as a bump after the valley where
 *    white noise meets its rising edge; docs/planar-model.md §3 models the bias by a
 *    Gauss-Markov process whose Allan peak equals the floor, so the bump's
 *    peak is the level to keep. A flat flicker floor gives crossings at
 *    nearly one level, and any of them serves.
 * 3. Without a crossing, the reliable point with the flattest slope is used
 *    if it is within ±¼ of zero (a shoulder); otherwise the floor is not seen
 *    and an upper bound is reported.
 * The level is a slope-0 line fitted (weights 1/(δ² + s²), log-log-lines.ts)
 * to the reliable points within ±¼ decade of the floor τ.
 */
import { bestReadingUncertainty, fixedSlopeLineAt, localLogLogSlopes, windowAround, type CurvePoints } from './log-log-lines';
import { noiseTerm } from './noise-terms';
import { reliableMask, resolveSlopeOptions, termUpperBound, type SlopeReadOptions, type TermReading } from './slope-readoff';

/** Candidate floor positions: interpolated ln τ of each zero crossing of the local slope. */
function zeroCrossingsLnTau(points: CurvePoints, slopes: Float64Array, ok: boolean[]): number[] {
  const out: number[] = [];
  for (let i = 0; i + 1 < slopes.length; i++) {
    if (!ok[i] || !ok[i + 1]) continue;
    const a = slopes[i], b = slopes[i + 1];
    if (a === 0) out.push(Math.log(points.tauS[i]));
    else if (a * b < 0) {
      const x0 = Math.log(points.tauS[i]), x1 = Math.log(points.tauS[i + 1]);
      out.push(x0 + (-a * (x1 - x0)) / (b - a));
    }
  }
  return out;
}

/** The flattest reliable point within tolerance, as a ln τ candidate, or none. */
function shoulderLnTau(points: CurvePoints, slopes: Float64Array, ok: boolean[], tolerance: number): number[] {
  let best = -1;
  for (let i = 0; i < slopes.length; i++) {
    if (ok[i] && (best < 0 || Math.abs(slopes[i]) < Math.abs(slopes[best]))) best = i;
  }
  return best >= 0 && Math.abs(slopes[best]) <= tolerance ? [Math.log(points.tauS[best])] : [];
}

/**
 * Reads bias instability from the floor of a curve.
 * @param points the curve, σ in any rate unit (SI gives B in rad/s or m/s²).
 * @returns a reading whose `deviation` is the floor, `readAtTauS` the floor's
 *   τ and `coefficient` B = floor / 0.664282; or an upper bound on B when no
 *   floor is seen (a curve that only falls or only rises). Throws nothing.
 */
export function readBiasInstabilityFloor(points: CurvePoints, options: SlopeReadOptions = {}): TermReading {
  const opts = resolveSlopeOptions(options);
  const slopes = localLogLogSlopes(points, opts.halfWindowDecades);
  const ok = reliableMask(points, slopes, opts.maxPercentageError);
  const crossings = zeroCrossingsLnTau(points, slopes, ok);
  const candidates = crossings.length > 0 ? crossings : shoulderLnTau(points, slopes, ok, opts.slopeTolerance);
  let best: TermReading | undefined;
  for (const lnTau of candidates) {
    const tau = Math.exp(lnTau);
    const window = windowAround(points, tau, opts.halfWindowDecades).filter((i) => ok[i]);
    if (window.length === 0) continue;
    const floor = fixedSlopeLineAt(points, slopes, window, 0, tau);
    if (best && floor <= best.deviation) continue;
    best = {
      id: 'bias-instability',
      coefficient: noiseTerm('bias-instability').coefficientFromDeviation(floor),
      deviation: floor,
      relativeUncertainty: bestReadingUncertainty(points, slopes, window, 0),
      readAtTauS: tau,
      tauRangeS: [points.tauS[window[0]], points.tauS[window[window.length - 1]]],
      extrapolated: false,
      upperBound: false,
    };
  }
  return best ?? termUpperBound(points, 'bias-instability', opts.maxPercentageError);
}
