import { InputError } from '../errors';
import { quantityToSI, requireArray, requireId, requireOneOf } from '../inputs/checks';
import type { ConfidenceLevel, QuantityName, RequirementInput } from '../inputs/budget-input';
import type { MeasurementStream } from '../covariance/error-model';
import { TIME_SLACK_S } from '../mission/nominal-trajectory';
import { fromSI, type DimensionName } from '../units';
import type { BudgetSeries } from './budget-series';
import { LEVELS, levelSeries, limitDimension, QUANTITY_NAMES } from './levels';

/**
 * A requirement in SI, validated. `Q` is the model's quantity names: the
 * planar table's by default, the inertial model's ids for 3-D budgets
 * (src/budget/inertial-requirements.ts); the code below serves both.
 */
export interface ResolvedRequirement<Q extends string = QuantityName> {
  id: string;
  quantity: Q;
  level: ConfidenceLevel;
  limitSI: number;
  /** The limit as written, for margins in the limit's unit. */
  limit: { value: number; unit: string };
  windowStartS: number;
  windowEndS: number;
  path: string;
}

/** How long a requirement holds after an aiding sensor's outage begins. */
export interface OutageHold {
  sensorId: string;
  outageId: string;
  startS: number;
  endS: number;
  /** Seconds from the outage's start until the requirement first breaks; null when it holds throughout. */
  timeToExceedS: number | null;
}

/** A requirement's verdict over its window. */
export interface RequirementResult<Q extends string = QuantityName> {
  id: string;
  quantity: Q;
  level: ConfidenceLevel;
  limit: { value: number; unit: string };
  verdict: 'pass' | 'fail';
  /** Limit minus the worst value, in the limit's unit (positive holds). */
  margin: number;
  worstValue: number;
  worstTimeS: number;
  windowStartS: number;
  windowEndS: number;
  outages: OutageHold[];
}

/** An aiding sensor's outages, as requirement code reads them (planar MeasurementStream and inertial streams alike). */
export type OutageSpans = Pick<MeasurementStream, 'sensorId' | 'outages'>;

/**
 * Validates planar requirements against the mission.
 * @throws InputError naming the requirement's field.
 */
export function resolveRequirements(list: RequirementInput[] | undefined, durationS: number): ResolvedRequirement[] {
  return resolveRequirementList(list, durationS, QUANTITY_NAMES, limitDimension);
}

/**
 * Validates requirements of either model against the mission.
 * @param quantities the names a requirement of this model may constrain.
 * @param dimensionOf the dimension of a quantity's limit.
 * @throws InputError naming the requirement's field.
 */
export function resolveRequirementList<Q extends string>(
  list: (Omit<RequirementInput, 'quantity'> & { quantity: string })[] | undefined, durationS: number,
  quantities: readonly Q[], dimensionOf: (q: Q) => DimensionName,
): ResolvedRequirement<Q>[] {
  const ids = new Set<string>();
  return requireArray(list ?? [], 'requirements', true).map((r, i) => {
    const p = `requirements[${i}]`;
    if (!r || typeof r !== 'object') throw new InputError(p, 'must be a requirement object');
    const id = requireId(r.id, `${p}.id`);
    if (ids.has(id)) throw new InputError(`${p}.id`, `"${id}" is used by another requirement`);
    ids.add(id);
    const quantity = requireOneOf(r.quantity as Q, quantities, `${p}.quantity`);
    const level = requireOneOf(r.level, LEVELS, `${p}.level`);
    const limitSI = quantityToSI(r.limit, dimensionOf(quantity), `${p}.limit`);
    if (!(limitSI > 0)) throw new InputError(`${p}.limit.value`, `must be greater than zero, got ${r.limit.value}`);
    let windowStartS = 0, windowEndS = durationS;
    if (r.window !== undefined) {
      windowStartS = quantityToSI(r.window.start, 'time', `${p}.window.start`);
      windowEndS = quantityToSI(r.window.end, 'time', `${p}.window.end`);
      if (windowStartS < -TIME_SLACK_S || windowEndS > durationS + TIME_SLACK_S || !(windowEndS > windowStartS)) {
        throw new InputError(`${p}.window`, `must satisfy 0 <= start < end <= ${durationS} s; got ${windowStartS} to ${windowEndS} s`);
      }
    }
    return { id, quantity, level, limitSI, limit: { value: r.limit.value, unit: r.limit.unit }, windowStartS, windowEndS, path: p };
  });
}

/**
 * Verdict, margin and time-to-exceed for each outage of each aiding sensor
 * (docs/planar-model.md §8): pass when the value stays <= limit at every step in the
 * window; the break time is interpolated linearly between steps.
 */
export function evaluateRequirement(req: ResolvedRequirement, series: BudgetSeries, streams: MeasurementStream[]): RequirementResult {
  return judgeRequirement(req, levelSeries(series, req.quantity, req.level, req.path), series.tS, streams, limitDimension(req.quantity));
}

/**
 * The verdict of one requirement of either model from the values it compares
 * with its limit (SI, at the requirement's level) at the steps `t`, and the
 * time-to-exceed after each outage of `streams` that overlaps its window.
 * @param dim the dimension of the limit, to show the worst value in the limit's unit.
 */
export function judgeRequirement<Q extends string>(
  req: ResolvedRequirement<Q>, values: Float64Array, t: Float64Array, streams: readonly OutageSpans[], dim: DimensionName,
): RequirementResult<Q> {
  let worst = -Infinity, worstK = 0;
  for (let k = 0; k < t.length; k++) {
    if (t[k] < req.windowStartS - TIME_SLACK_S || t[k] > req.windowEndS + TIME_SLACK_S) continue;
    if (values[k] > worst) { worst = values[k]; worstK = k; }
  }
  const worstValue = fromSI(worst, req.limit.unit, dim, `${req.path}.limit`);
  const outages: OutageHold[] = [];
  for (const stream of streams) {
    for (const o of stream.outages) {
      const a = Math.max(o.startS, req.windowStartS), b = Math.min(o.endS, req.windowEndS);
      if (b - a <= TIME_SLACK_S) continue;
      outages.push({ sensorId: stream.sensorId, outageId: o.id, startS: o.startS, endS: o.endS, timeToExceedS: timeToExceed(t, values, req.limitSI, a, b, o.startS) });
    }
  }
  return {
    id: req.id, quantity: req.quantity, level: req.level, limit: req.limit,
    verdict: worst <= req.limitSI ? 'pass' : 'fail',
    margin: req.limit.value - worstValue,
    worstValue, worstTimeS: t[worstK],
    windowStartS: req.windowStartS, windowEndS: req.windowEndS, outages,
  };
}

/** First time in [fromS, toS) at which values exceed the limit, minus originS; null when never. */
export function timeToExceed(t: Float64Array, values: Float64Array, limit: number, fromS: number, toS: number, originS: number): number | null {
  let prev = -1;
  for (let k = 0; k < t.length; k++) {
    if (t[k] < fromS - TIME_SLACK_S) { prev = k; continue; }
    if (t[k] >= toS - TIME_SLACK_S) break;
    if (values[k] > limit) {
      if (prev < 0 || values[prev] > limit) return Math.max(0, t[k] - originS);
      const frac = (limit - values[prev]) / (values[k] - values[prev]);
      return Math.max(0, t[prev] + frac * (t[k] - t[prev]) - originS);
    }
    prev = k;
  }
  return null;
}
