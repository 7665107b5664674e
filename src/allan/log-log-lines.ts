/**
 * Straight lines on the log–log Allan plot: local slopes (to find where a
 * noise term dominates) and lines of a fixed slope fitted to a stretch of the
 * curve (to read a term's level there). Natural logarithms throughout; the
 * slope is the same in any base.
 */

/** The parts of a curve the line tools read (an {@link AllanCurve} has them all). */
export interface CurvePoints {
  /** Cluster times in s, increasing. */
  readonly tauS: Float64Array;
  /** Allan deviation, rate unit; points with σ ≤ 0 are skipped. */
  readonly adev: Float64Array;
  /** Percentage error δ of each point (dimensionless). */
  readonly percentageError: Float64Array;
}

/** Half-width of the local-slope window in decades of τ: ±0.25 spans 5 points at 10 per decade. */
export const DEFAULT_HALF_WINDOW_DECADES = 0.25;

/** Slack so that points exactly on the window edge (τ ratios of whole powers of ten) are kept despite rounding. */
const EDGE_SLACK = 1e-9;

/**
 * Indices of the points within ±`halfWindowDecades` of τ_j (log10 distance)
 * that have σ > 0. Throws nothing.
 */
export function windowAround(points: CurvePoints, tauCentreS: number, halfWindowDecades: number): number[] {
  const out: number[] = [];
  const centre = Math.log10(tauCentreS);
  for (let i = 0; i < points.tauS.length; i++) {
    if (points.adev[i] > 0 && Math.abs(Math.log10(points.tauS[i]) - centre) <= halfWindowDecades + EDGE_SLACK) out.push(i);
  }
  return out;
}

/**
 * The local log–log slope at each point: the unweighted least-squares slope
 * of ln σ against ln τ over the points within ±`halfWindowDecades` of it.
 * Exact (to rounding) for a pure power law. Unweighted on purpose: weighting
 * by δ would pull every window towards its short-τ end.
 * @returns one slope per point (dimensionless); NaN where σ ≤ 0 or fewer than
 *   two usable points fall in the window. Throws nothing.
 */
export function localLogLogSlopes(points: CurvePoints, halfWindowDecades = DEFAULT_HALF_WINDOW_DECADES): Float64Array {
  const slopes = new Float64Array(points.tauS.length).fill(Number.NaN);
  for (let j = 0; j < slopes.length; j++) {
    if (!(points.adev[j] > 0)) continue;
    const idx = windowAround(points, points.tauS[j], halfWindowDecades);
    if (idx.length < 2) continue;
    const xs = idx.map((i) => Math.log(points.tauS[i]));
    const ys = idx.map((i) => Math.log(points.adev[i]));
    const mx = xs.reduce((a, b) => a + b, 0) / xs.length;
    const my = ys.reduce((a, b) => a + b, 0) / ys.length;
    let sxy = 0, sxx = 0;
    xs.forEach((x, k) => {
      sxy += (x - mx) * (ys[k] - my);
      sxx += (x - mx) * (x - mx);
    });
    slopes[j] = sxy / sxx;
  }
  return slopes;
}

/**
 * The uncertainty of ln σ at point i as a reading of a term of slope α:
 * √(δ² + (s − α)²). δ is the random part; |s − α| bounds the bias from
 * neighbouring terms to first order: when a term of slope α shares the
 * variance with one whose slope differs by ½ or 1, the local slope moves by
 * the neighbour's variance fraction w (or w/2) and ln σ sits w/2 above the
 * term alone (derived here from σ² = σ_α² + σ_neighbour²). Throws nothing.
 */
export function readingUncertainty(points: CurvePoints, slopes: Float64Array, i: number, alpha: number): number {
  return Math.hypot(points.percentageError[i], slopes[i] - alpha);
}

/**
 * Fits ln σ = slope · ln τ + b over the given points, b by weighted least
 * squares with weights 1/u² (u from {@link readingUncertainty}, so that
 * points disturbed by a neighbouring term count less), and returns σ on
 * that line at `tauS`.
 * @param indices points to use (each with σ > 0 and a finite local slope); at least one.
 * @returns σ(tauS) on the fitted line, rate unit. Throws nothing.
 */
export function fixedSlopeLineAt(points: CurvePoints, slopes: Float64Array, indices: readonly number[], slope: number, tauS: number): number {
  let sw = 0, swb = 0;
  for (const i of indices) {
    const u = readingUncertainty(points, slopes, i, slope);
    const w = 1 / (u * u);
    sw += w;
    swb += w * (Math.log(points.adev[i]) - slope * Math.log(points.tauS[i]));
  }
  return Math.exp(swb / sw + slope * Math.log(tauS));
}

/**
 * The relative uncertainty a reading from `indices` is given: the smallest
 * {@link readingUncertainty} among them. Neighbouring overlapping estimates
 * share most of their data and the bias part does not average out, so no
 * credit is taken for combining points. Throws nothing.
 */
export function bestReadingUncertainty(points: CurvePoints, slopes: Float64Array, indices: readonly number[], alpha: number): number {
  return Math.min(...indices.map((i) => readingUncertainty(points, slopes, i, alpha)));
}
