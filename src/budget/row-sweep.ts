import { InputError } from '../errors';
import type { BudgetInput } from '../inputs/budget-input';
import { findRow, requirementsWith } from './sizing';

/** One swept value (in the row's unit) and each requirement's worst value there (in its limit's unit). */
export interface SweepPoint {
  value: number;
  worst: number[];
  verdicts: ('pass' | 'fail')[];
}

/** A row's magnitude swept over values: the curve of each requirement's worst value against it. */
export interface RowSweep {
  sourceId: string;
  /** Unit of the swept values (the row's own). */
  unit: string;
  requirements: { id: string; limit: number; unit: string }[];
  points: SweepPoint[];
}

/**
 * `n` evenly spaced values from `from` to `to` inclusive (n >= 2), in the row's unit.
 * @throws InputError at 'sweep' for n below 2, non-finite ends or from >= to.
 */
export function sweepValues(from: number, to: number, n: number): number[] {
  if (!Number.isInteger(n) || n < 2 || n > 1000) throw new InputError('sweep', `needs a whole number of points from 2 to 1000, got ${n}`);
  if (!Number.isFinite(from) || !Number.isFinite(to) || !(from < to) || from < 0) {
    throw new InputError('sweep', `needs 0 <= FROM < TO, got ${from} to ${to}`);
  }
  return Array.from({ length: n }, (_, k) => from + ((to - from) * k) / (n - 1));
}

/**
 * Runs the budget once per value with row `sourceId`'s magnitude replaced and
 * reads every requirement (or those in `requirementIds`) at each: the curve
 * docs/planar-model.md §9 bisects, drawn whole. `onPoint` reports progress.
 * @throws InputError for an unknown row or requirement, or a value outside the row's valid range.
 */
export function sweepRow(input: BudgetInput, sourceId: string, values: number[], requirementIds?: string[], onPoint?: (done: number, total: number) => void): RowSweep {
  const row = findRow(input, sourceId);
  const ids = requirementIds ?? (input.requirements ?? []).map((r) => r.id);
  const known = new Set((input.requirements ?? []).map((r) => r.id));
  const unknown = ids.find((id) => !known.has(id));
  if (unknown !== undefined) throw new InputError('requirement', `no requirement "${unknown}"; the budget has ${[...known].join(', ') || 'none'}`);
  if (ids.length === 0) throw new InputError('requirement', 'the budget has no requirements to sweep against');
  let requirements: RowSweep['requirements'] = [];
  const points = values.map((value, k) => {
    const results = requirementsWith(input, sourceId, value);
    const picked = ids.map((id) => results.find((r) => r.id === id)!);
    requirements = picked.map((r) => ({ id: r.id, limit: r.limit.value, unit: r.limit.unit }));
    onPoint?.(k + 1, values.length);
    return { value, worst: picked.map((r) => r.worstValue), verdicts: picked.map((r) => r.verdict) };
  });
  return { sourceId, unit: row.value.unit, requirements, points };
}
