/**
 * What the R choice costs: one aiding sensor's R in the filter scaled from
 * ×0.1 to ×10 (every other row as tuned), with each requirement's worst
 * actual and believed value at each scale. With the filter otherwise equal
 * to the truth, the actual worst is smallest at ×1 (the Kalman filter is the
 * minimum-variance linear filter for the truth; Gelb, Applied Optimal
 * Estimation, 1974, ch. 4 and §7.2), while the believed value only grows
 * with R: inflating R buys a conservative filter at a price in actual error.
 */
import { InputError } from '../errors';
import type { BudgetInput } from '../inputs/budget-input';
import type { BudgetResult } from '../pipeline';
import { computeFilterDesign } from './compute-filter-design';

/** Scales tried by default: 17 points evenly spaced in log from 0.1 to 10. */
export const DEFAULT_R_SCALES = Array.from({ length: 17 }, (_, i) => 10 ** (-1 + i / 8));

/** One requirement at one R scale, values in the requirement's unit. */
export interface RSweepValue {
  requirementId: string;
  unit: string;
  limit: number;
  actualWorst: number;
  believedWorst: number;
}

/** The sweep of one sensor's filter R. */
export interface RSweep {
  sensorId: string;
  points: { factor: number; values: RSweepValue[] }[];
  /** Per requirement, the scale with the smallest actual worst value (the one nearest ×1 among round-off ties). */
  bestFactor: Record<string, number>;
}

/**
 * Sweeps `sensorId`'s filter R over `factors`; `onPoint` hears after each point.
 * @throws InputError naming the sensor when it has no R (not an aiding sensor, or no noise rows) or the budget has no requirements.
 */
export function sweepFilterR(
  input: BudgetInput, base: BudgetResult, sensorId: string, factors: number[] = DEFAULT_R_SCALES,
  onPoint?: (done: number, total: number) => void,
): RSweep {
  if (!base.model.sources.some((s) => s.sensorId === sensorId && s.measurementNoise.length > 0)) {
    const aiding = [...new Set(base.model.sources.filter((s) => s.measurementNoise.length > 0).map((s) => s.sensorId))];
    throw new InputError('--sensor', `"${sensorId}" gives the filter no R to scale; aiding sensors with R here: ${aiding.join(', ') || 'none'}`);
  }
  if (!base.requirements.length) throw new InputError('requirements', 'the R sweep reports each requirement\'s worst value; the budget has no requirements');
  const points = factors.map((factor, k) => {
    const d = computeFilterDesign(input, base, { contributions: false, rScale: { sensorId, factor } });
    onPoint?.(k + 1, factors.length);
    return {
      factor,
      values: d.actual.requirements.map((r, i) => ({
        requirementId: r.id, unit: r.limit.unit, limit: r.limit.value, actualWorst: r.worstValue, believedWorst: d.believed.requirements[i].worstValue,
      })),
    };
  });
  const bestFactor: Record<string, number> = {};
  base.requirements.forEach((r, i) => {
    // Ties to round-off (a worst value set by P0 alone, before any update) go to the scale nearest ×1.
    const nearOne = (f: number) => Math.abs(Math.log(f));
    let best = points[0];
    for (const p of points) {
      const a = p.values[i].actualWorst, b = best.values[i].actualWorst;
      if (a < b * (1 - 1e-12) || (a <= b * (1 + 1e-12) && nearOne(p.factor) < nearOne(best.factor))) best = p;
    }
    bestFactor[r.id] = best.factor;
  });
  return { sensorId, points, bestFactor };
}
