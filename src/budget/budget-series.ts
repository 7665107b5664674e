import type { ErrorModel } from '../covariance/error-model';
import type { CovarianceHistory } from '../covariance/run-covariance';
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
  /** Exact circular error probable and 95 % radius from the 2 x 2 position covariance, m. */
  cepM: Float64Array;
  r95M: Float64Array;
}


/**
 * Turns the recorded covariance entries into variance series. North/east
 * come from the path frame by the heading: north = [cos, -sin] p, east =
 * [sin, cos] p. Speed is v² P[so,so] plus the speed sensor's per-sample white
 * variance while moving; heading adds any angle-quantum variance (docs/planar-model.md §8).
 */
export function buildBudgetSeries(model: ErrorModel, traj: NominalTrajectory, hist: CovarianceHistory): BudgetSeries {
  const steps = hist.steps, S = hist.sourceCount;
  const quantities: Partial<Record<VarianceQuantity, VarianceSeries>> = {};
  const names = VARIANCE_QUANTITIES.filter((q) => model.hasSpeedInput || !quantitySpec(q).needsSpeedInput);
  for (const q of names) quantities[q] = { unitSI: quantitySpec(q).varianceUnitSI!, total: new Float64Array(steps), bySource: [] };
  for (let m = 0; m <= S; m++) {
    const src = m === 0 ? undefined : model.sources[m - 1];
    const series = Object.fromEntries(names.map((q) => [q, new Float64Array(steps)])) as Record<VarianceQuantity, Float64Array>;
    for (let k = 0; k < steps; k++) fillStep(model, traj, hist, m, k, src, series);
    for (const q of names) {
      if (m === 0) quantities[q]!.total = series[q];
      else quantities[q]!.bySource.push(series[q]);
    }
  }
  return { tS: traj.tS, quantities, ...horizontalRadii(traj, hist, model.hasSpeedInput) };
}

function fillStep(
  model: ErrorModel, traj: NominalTrajectory, hist: CovarianceHistory, m: number, k: number,
  src: ErrorModel['sources'][number] | undefined, out: Record<VarianceQuantity, Float64Array>,
): void {
  const e = hist.entries, at = m * hist.steps + k;
  const headingExtra = src ? src.headingOutputVarianceSI : totalOutputVariances(model).heading;
  out.heading[k] = e.headingHeading[at] + headingExtra;
  if (!model.hasSpeedInput) return;
  const aa = e.alongAlong[at], cc = e.crossCross[at], ac = e.alongCross[at];
  const c = Math.cos(traj.headingRad[k]), s = Math.sin(traj.headingRad[k]);
  out.north[k] = c * c * aa - 2 * c * s * ac + s * s * cc;
  out.east[k] = s * s * aa + 2 * c * s * ac + c * c * cc;
  out['along-track'][k] = aa;
  out['cross-track'][k] = cc;
  out.drms[k] = aa + cc;
  const v = traj.speedMps[k];
  const white = v > 0 ? (src ? src.speedOutputVarianceSI : totalOutputVariances(model).speed) : 0;
  out.speed[k] = v * v * e.speedScale[at] + white;
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

function horizontalRadii(traj: NominalTrajectory, hist: CovarianceHistory, hasPosition: boolean): { cepM: Float64Array; r95M: Float64Array } {
  const steps = hist.steps;
  const cepM = new Float64Array(steps), r95M = new Float64Array(steps);
  if (!hasPosition) return { cepM, r95M };
  const e = hist.entries;
  for (let k = 0; k < steps; k++) {
    const aa = e.alongAlong[k], cc = e.crossCross[k], ac = e.alongCross[k];
    // The radius is rotation invariant, so the path-frame covariance serves.
    cepM[k] = fastRadiusForProbability(aa, cc, ac, 0.5);
    r95M[k] = fastRadiusForProbability(aa, cc, ac, 0.95);
  }
  return { cepM, r95M };
}
