import type { ErrorModel } from '../covariance/error-model';
import type { CovarianceHistory, RecordedEntries } from '../covariance/run-covariance';
import type { NominalTrajectory } from '../mission/nominal-trajectory';
import { fastRadiusForProbability } from './horizontal-radius-table';
import { quantitySpec, VARIANCE_QUANTITIES, type VarianceQuantity } from '../inputs/quantities';

/** Quantities reported as variances with per-source contributions (docs/planar-model.md §8), from the quantity table. */
export { VARIANCE_QUANTITIES, type VarianceQuantity };

/** One quantity's variance over time: the total and each source's share (they sum to the total). */
export interface VarianceSeries {
  /** SI unit of the variance, e.g. "rad²", "m²", "(m/s)²". */
  unitSI: string;
  total: Float64Array;
  /** Indexed like ErrorModel.sources. */
  bySource: Float64Array[];
}

/** The budget over time. */
export interface BudgetSeries {
  tS: Float64Array;
  quantities: Partial<Record<VarianceQuantity, VarianceSeries>>;
  /** Exact circular error probable and 95 % radius from the 2 x 2 position covariance, m (empty without position, or when not asked for). */
  cepM: Float64Array;
  r95M: Float64Array;
}


/**
 * Turns the recorded covariance entries into variance series at the recorded
 * steps (every step unless the run was thinned by a record plan). North/east
 * come from the path frame by the heading: north = [cos, -sin] p, east =
 * [sin, cos] p. Speed is v² P[so,so] plus the speed sensor's per-sample white
 * variance while moving; heading adds any angle-quantum variance (docs/planar-model.md §8).
 */
export function buildBudgetSeries(model: ErrorModel, traj: NominalTrajectory, hist: CovarianceHistory): BudgetSeries {
  return seriesOf(model, traj, hist.entries, hist.recordedSteps, hist.sourceCount, true);
}

/**
 * The totals alone (no per-source shares) at every step of the run, from
 * `hist.totalEntries`: what requirement verdicts and times-to-exceed read, so
 * they stay exact when the recorded series is thinned. CEP and R95 are
 * computed only when `radii` is true (a requirement asks for them).
 */
export function buildTotalSeries(model: ErrorModel, traj: NominalTrajectory, hist: CovarianceHistory, radii: boolean): BudgetSeries {
  return seriesOf(model, traj, hist.totalEntries, traj.tS.map((_, k) => k), 0, radii);
}

function seriesOf(
  model: ErrorModel, traj: NominalTrajectory, e: RecordedEntries, at: ArrayLike<number>, S: number, radii: boolean,
): BudgetSeries {
  const steps = at.length;
  const quantities: Partial<Record<VarianceQuantity, VarianceSeries>> = {};
  const names = VARIANCE_QUANTITIES.filter((q) => model.hasSpeedInput || !quantitySpec(q).needsSpeedInput);
  for (const q of names) quantities[q] = { unitSI: quantitySpec(q).varianceUnitSI!, total: new Float64Array(steps), bySource: [] };
  // cos/sin of the heading once per step, shared by the total and every source.
  const cos = new Float64Array(steps), sin = new Float64Array(steps), speed = new Float64Array(steps), tS = new Float64Array(steps);
  for (let r = 0; r < steps; r++) {
    const k = at[r];
    cos[r] = Math.cos(traj.headingRad[k]);
    sin[r] = Math.sin(traj.headingRad[k]);
    speed[r] = traj.speedMps[k];
    tS[r] = traj.tS[k];
  }
  const motion = { cos, sin, speed };
  for (let m = 0; m <= S; m++) {
    const src = m === 0 ? undefined : model.sources[m - 1];
    const series = Object.fromEntries(names.map((q) => [q, new Float64Array(steps)])) as Record<VarianceQuantity, Float64Array>;
    fillSeries(model, e, m * steps, motion, src, series);
    for (const q of names) {
      if (m === 0) quantities[q]!.total = series[q];
      else quantities[q]!.bySource.push(series[q]);
    }
  }
  const hasPosition = model.hasSpeedInput && radii;
  return { tS, quantities, ...horizontalRadii(e, steps, hasPosition) };
}

function fillSeries(
  model: ErrorModel, e: RecordedEntries, first: number, motion: { cos: Float64Array; sin: Float64Array; speed: Float64Array },
  src: ErrorModel['sources'][number] | undefined, out: Record<VarianceQuantity, Float64Array>,
): void {
  const headingExtra = src ? src.headingOutputVarianceSI : totalOutputVariances(model).heading;
  const white = src ? src.speedOutputVarianceSI : totalOutputVariances(model).speed;
  const { cos, sin, speed } = motion;
  for (let k = 0; k < cos.length; k++) {
    const at = first + k;
    out.heading[k] = e.headingHeading[at] + headingExtra;
    if (!model.hasSpeedInput) continue;
    const aa = e.alongAlong[at], cc = e.crossCross[at], ac = e.alongCross[at];
    const c = cos[k], s = sin[k];
    out.north[k] = c * c * aa - 2 * c * s * ac + s * s * cc;
    out.east[k] = s * s * aa + 2 * c * s * ac + c * c * cc;
    out['along-track'][k] = aa;
    out['cross-track'][k] = cc;
    out.drms[k] = aa + cc;
    const v = speed[k];
    out.speed[k] = v * v * e.speedScale[at] + (v > 0 ? white : 0);
  }
}

const outputTotals = new WeakMap<ErrorModel, { heading: number; speed: number }>();

/** The output-only variances (angle quantum, speed white noise) of all sources together, cached per model. */
function totalOutputVariances(model: ErrorModel): { heading: number; speed: number } {
  let t = outputTotals.get(model);
  if (!t) {
    t = {
      heading: model.sources.reduce((a, s) => a + s.headingOutputVarianceSI, 0),
      speed: model.sources.reduce((a, s) => a + s.speedOutputVarianceSI, 0),
    };
    outputTotals.set(model, t);
  }
  return t;
}

function horizontalRadii(e: RecordedEntries, steps: number, hasPosition: boolean): { cepM: Float64Array; r95M: Float64Array } {
  const cepM = new Float64Array(hasPosition ? steps : 0), r95M = new Float64Array(hasPosition ? steps : 0);
  if (!hasPosition) return { cepM, r95M };
  for (let k = 0; k < steps; k++) {
    const aa = e.alongAlong[k], cc = e.crossCross[k], ac = e.alongCross[k];
    // The radius is rotation invariant, so the path-frame covariance serves.
    cepM[k] = fastRadiusForProbability(aa, cc, ac, 0.5);
    r95M[k] = fastRadiusForProbability(aa, cc, ac, 0.95);
  }
  return { cepM, r95M };
}
