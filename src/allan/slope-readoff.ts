/**
 * Method (a): IEEE Std 952 slope read-offs. For a term of slope α (−1, −½,
 * +½, +1) the region of the curve where the local log–log slope is nearest α
 * is found, a line of slope exactly α is fitted to it, and the line is read
 * at the term's reference τ (√3, 1, 3, √2 s; IEEE Std 952-1997 Annex C as in
 * docs/checks.md §1.1). Bias instability is read from the floor instead
 * (floor-reading.ts).
 *
 * Choices of this project (common practice, no source):
 * - local slopes over ±¼ decade (log-log-lines.ts);
 * - a region is the run of neighbouring points whose local slope is within
 *   ±¼ of α (half the spacing between the IEEE slopes), grown from the point
 *   nearest α;
 * - only points with δ ≤ 0.1 (at least 51 independent clusters) may choose a
 *   region. Measured here on 40 seeded white-noise logs: the local slope's
 *   rms error is about 1.1δ (0.085 for δ ≤ 0.1, 0.27 for δ near 0.25), so
 *   beyond δ = 0.1 noise alone moves a slope across the ±¼ tolerance and
 *   invents regions (and floors) in the last decade of a log;
 * - the line's level is a weighted mean with weights 1/(δ² + (s − α)²), and
 *   the reading's uncertainty is the best point's √(δ² + (s − α)²): the
 *   distance of the local slope from α bounds the share of a neighbouring
 *   term (log-log-lines.ts), which does not average out;
 * - a term whose slope is nowhere within ±¼ is reported as an upper bound:
 *   the largest coefficient whose curve stays under σ(1 + δ) at every point.
 */
import { bestReadingUncertainty, DEFAULT_HALF_WINDOW_DECADES, fixedSlopeLineAt, localLogLogSlopes, type CurvePoints } from './log-log-lines';
import { noiseTerm, type NoiseTermId } from './noise-terms';

/** One term read from the curve, in the curve's units (SI when the curve is SI). */
export interface TermReading {
  readonly id: NoiseTermId;
  /** The coefficient (Q, N, B, K or R), or its upper bound when `upperBound`. */
  readonly coefficient: number;
  /** σ where the coefficient was read: at the reference τ, at the floor, or at the limiting point of a bound (rate unit). */
  readonly deviation: number;
  /** Relative uncertainty of the coefficient (0.1 = 10 %): the best point's √(δ² + (s − α)²), see log-log-lines.ts. */
  readonly relativeUncertainty: number;
  /** τ in s where the value was read (reference τ, floor τ, or limiting point). */
  readonly readAtTauS: number;
  /** τ span in s of the points used. */
  readonly tauRangeS: readonly [number, number];
  /** True when `readAtTauS` lies outside `tauRangeS`: the line was extrapolated. */
  readonly extrapolated: boolean;
  /** True when the term was not seen and `coefficient` is only an upper bound. */
  readonly upperBound: boolean;
}

/** Tuning of the read-offs; every field has the default described in the file comment. */
export interface SlopeReadOptions {
  /** Half-width of the local-slope window, decades; default 0.25. */
  readonly halfWindowDecades?: number;
  /** Largest |local slope − α| a region may have; default 0.25. */
  readonly slopeTolerance?: number;
  /** Largest δ of a point that may choose a region or bound a term; default 0.1. */
  readonly maxPercentageError?: number;
}

/** Resolved options with their defaults. */
export interface ResolvedSlopeOptions {
  readonly halfWindowDecades: number;
  readonly slopeTolerance: number;
  readonly maxPercentageError: number;
}

/** Fills in the defaults of {@link SlopeReadOptions}. Throws nothing. */
export function resolveSlopeOptions(options: SlopeReadOptions = {}): ResolvedSlopeOptions {
  return {
    halfWindowDecades: options.halfWindowDecades ?? DEFAULT_HALF_WINDOW_DECADES,
    slopeTolerance: options.slopeTolerance ?? 0.25,
    maxPercentageError: options.maxPercentageError ?? 0.1,
  };
}

/** True where a point may choose a region: σ > 0, a finite local slope and δ small enough. */
export function reliableMask(points: CurvePoints, slopes: Float64Array, maxPercentageError: number): boolean[] {
  return Array.from(slopes, (s, i) => Number.isFinite(s) && points.adev[i] > 0 && points.percentageError[i] <= maxPercentageError);
}

/**
 * The upper bound of a term that was not seen: the largest coefficient c
 * with c²·unitVariance(τ) ≤ (σ(1 + δ))² at every point whose δ is at most
 * `maxPercentageError` (all points with σ > 0 when none is), and where it
 * binds. The last points of a curve are left out because an estimate from one
 * or two differences can lie far below the truth. Throws nothing.
 */
export function termUpperBound(points: CurvePoints, id: NoiseTermId, maxPercentageError: number): TermReading {
  const term = noiseTerm(id);
  const positive = Array.from(points.tauS, (_, i) => i).filter((i) => points.adev[i] > 0);
  const reliable = positive.filter((i) => points.percentageError[i] <= maxPercentageError);
  let best = Number.POSITIVE_INFINITY, at = 0;
  for (const i of reliable.length > 0 ? reliable : positive) {
    const bound = (points.adev[i] * (1 + points.percentageError[i])) / Math.sqrt(term.unitVariance(points.tauS[i]));
    if (bound < best) {
      best = bound;
      at = i;
    }
  }
  const tau = points.tauS[at];
  return {
    id, coefficient: best, deviation: points.adev[at], relativeUncertainty: points.percentageError[at],
    readAtTauS: tau, tauRangeS: [tau, tau], extrapolated: false, upperBound: true,
  };
}

/** The contiguous run of reliable points around `start` whose slope is within `tol` of `alpha`. */
function growRegion(slopes: Float64Array, ok: boolean[], start: number, alpha: number, tol: number): number[] {
  const inside = (i: number): boolean => i >= 0 && i < slopes.length && ok[i] && Math.abs(slopes[i] - alpha) <= tol;
  let lo = start, hi = start;
  while (inside(lo - 1)) lo--;
  while (inside(hi + 1)) hi++;
  return Array.from({ length: hi - lo + 1 }, (_, k) => lo + k);
}

/**
 * Reads one sloped term (not bias instability) from a curve.
 * @param points the curve, σ in any rate unit (SI gives SI coefficients).
 * @returns the reading, or an upper bound when no region has the term's slope.
 * @throws Error when called for 'bias-instability' (use readBiasInstabilityFloor).
 */
export function readTermBySlope(points: CurvePoints, id: NoiseTermId, options: SlopeReadOptions = {}): TermReading {
  const term = noiseTerm(id);
  if (term.readOffTauS === undefined) throw new Error('bias instability is read from the floor, not by slope');
  const opts = resolveSlopeOptions(options);
  const slopes = localLogLogSlopes(points, opts.halfWindowDecades);
  const ok = reliableMask(points, slopes, opts.maxPercentageError);
  let start = -1;
  for (let i = 0; i < slopes.length; i++) {
    if (ok[i] && (start < 0 || Math.abs(slopes[i] - term.slope) < Math.abs(slopes[start] - term.slope))) start = i;
  }
  if (start < 0 || Math.abs(slopes[start] - term.slope) > opts.slopeTolerance) return termUpperBound(points, id, opts.maxPercentageError);
  const region = growRegion(slopes, ok, start, term.slope, opts.slopeTolerance);
  const tauRef = term.readOffTauS;
  const deviation = fixedSlopeLineAt(points, slopes, region, term.slope, tauRef);
  const tauRangeS: [number, number] = [points.tauS[region[0]], points.tauS[region[region.length - 1]]];
  const extrapolated = tauRef < tauRangeS[0] * (1 - 1e-12) || tauRef > tauRangeS[1] * (1 + 1e-12);
  return {
    id, coefficient: term.coefficientFromDeviation(deviation), deviation, relativeUncertainty: bestReadingUncertainty(points, slopes, region, term.slope),
    readAtTauS: tauRef, tauRangeS, extrapolated, upperBound: false,
  };
}
