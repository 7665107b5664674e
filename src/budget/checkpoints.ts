import { InputError } from '../errors';
import { quantityToSI, requireArray, requireId } from '../inputs/checks';
import type { CheckpointInput } from '../inputs/budget-input';
import type { ModelSource } from '../covariance/error-model';
import { TIME_SLACK_S } from '../mission/nominal-trajectory';
import type { BudgetSeries, VarianceQuantity } from './budget-series';

/** One source's part of a quantity at a checkpoint. */
export interface SourceShare {
  sourceId: string;
  /** Square root of the source's variance contribution, SI. */
  sigmaSI: number;
  /** Share of the total variance, 0..1. */
  fraction: number;
}

/** The budget table of one quantity at one checkpoint. */
export interface QuantityBudget {
  quantity: VarianceQuantity;
  totalSigmaSI: number;
  /** Largest share first. */
  shares: SourceShare[];
}

/** The budget at a named time. */
export interface CheckpointBudget {
  id: string;
  /** The step the checkpoint was read at (the step nearest the requested time), s. */
  tS: number;
  requestedS: number;
  quantities: QuantityBudget[];
}

/** A checkpoint's id and requested time, validated. */
export interface WantedCheckpoint {
  id: string;
  /** Requested time, s. */
  s: number;
}

/**
 * Validates the checkpoints against the mission and adds "end" (the mission's
 * end) unless one is named so.
 * @throws InputError for a checkpoint outside the mission.
 */
export function resolveCheckpoints(list: CheckpointInput[] | undefined, endS: number): WantedCheckpoint[] {
  const wanted = requireArray(list ?? [], 'checkpoints', true).map((c, i) => {
    const p = `checkpoints[${i}]`;
    const id = requireId(c?.id, `${p}.id`);
    const s = quantityToSI(c.time, 'time', `${p}.time`);
    if (s < -TIME_SLACK_S || s > endS + TIME_SLACK_S) throw new InputError(`${p}.time`, `must lie within the mission, 0 to ${endS} s; got ${s} s`);
    return { id, s };
  });
  if (!wanted.some((w) => w.id === 'end')) wanted.push({ id: 'end', s: endS });
  return wanted;
}

/**
 * Budget tables at the checkpoints (and always at the mission's end, as id
 * "end"), each read at the series' step nearest its time: the series must
 * hold the step of the run nearest each checkpoint (the record plan keeps them).
 */
export function checkpointBudgets(wanted: WantedCheckpoint[], series: BudgetSeries, sources: ModelSource[]): CheckpointBudget[] {
  const t = series.tS;
  return wanted.map(({ id, s }) => {
    const k = nearestStep(t, s);
    return { id, tS: t[k], requestedS: s, quantities: budgetsAt(series, sources, k) };
  });
}

/** Index of the step nearest tS. */
export function nearestStep(t: Float64Array, tS: number): number {
  let best = 0;
  for (let k = 1; k < t.length; k++) if (Math.abs(t[k] - tS) < Math.abs(t[best] - tS)) best = k;
  return best;
}

/** Every quantity's budget at step k, sources sorted by share (largest first, zeros left out). */
export function budgetsAt(series: BudgetSeries, sources: ModelSource[], k: number): QuantityBudget[] {
  return (Object.keys(series.quantities) as VarianceQuantity[]).map((q) => {
    const s = series.quantities[q]!;
    return { quantity: q, totalSigmaSI: Math.sqrt(Math.max(0, s.total[k])), shares: sharesAt(s.total[k], s.bySource, sources, k) };
  });
}

/**
 * Each source's part of a variance `total` (SI) at step k, from the sources'
 * variance series of either model (indexed like `sources`), largest first,
 * zeros left out. Throws nothing.
 */
export function sharesAt(total: number, bySource: readonly ArrayLike<number>[], sources: readonly { id: string }[], k: number): SourceShare[] {
  return bySource
    .map((v, i) => ({ sourceId: sources[i].id, sigmaSI: Math.sqrt(Math.max(0, v[k])), fraction: total > 0 ? v[k] / total : 0 }))
    .filter((x) => x.fraction > 0)
    .sort((a, b) => b.fraction - a.fraction);
}
