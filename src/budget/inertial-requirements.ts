/**
 * Requirements of 3-D budgets through the shared requirement code
 * (requirements.ts): the quantity names and limit dimensions come from
 * INERTIAL_QUANTITIES, the value at a level from the inertial budget's
 * series, and the verdict, margin and times-to-exceed from judgeRequirement.
 */
import { InputError } from '../errors';
import type { ConfidenceLevel } from '../inputs/budget-input';
import { INERTIAL_QUANTITIES, INERTIAL_REQUIREMENT_QUANTITIES } from '../inertial/inertial-quantities';
import type { InertialBudgetInput } from '../inertial/inertial-input';
import { runInertialBudget, type InertialBudget } from '../inertial/run-inertial';
import { resolveInertialMission } from '../inertial/inertial-mission';
import type { DimensionName } from '../units';
import { confidenceFactor1D } from './confidence';
import { judgeRequirement, resolveRequirementList, type RequirementResult, type ResolvedRequirement } from './requirements';

/** The dimension of each SI unit the inertial quantities use. */
const DIMENSION_OF_UNIT: Record<string, DimensionName> = { m: 'length', 'm/s': 'speed', rad: 'angle' };

/** Quantities whose sigma is a radius (sums of variances): their 95 % and 50 % are not a normal factor times sigma. */
const RADIUS_QUANTITIES = ['drms', 'mrse'];

/** Dimension of a 3-D quantity's limit. @throws Error for a name not in the table (a programming error). */
export function inertialLimitDimension(quantity: string): DimensionName {
  if (quantity === 'horizontal') return 'length';
  const q = INERTIAL_QUANTITIES.find((x) => x.id === quantity);
  const dim = q && DIMENSION_OF_UNIT[q.unitSI];
  if (!dim) throw new Error(`no limit dimension for inertial quantity "${quantity}"`);
  return dim;
}

/**
 * Validates a 3-D budget's requirements against the mission.
 * @throws InputError naming the field: what resolveRequirementList refuses,
 *   and a 95 % or 50 % level on `drms` or `mrse` (use `horizontal` for R95 and CEP).
 */
export function resolveInertialRequirements(input: InertialBudgetInput, durationS: number): ResolvedRequirement<string>[] {
  const list = resolveRequirementList(input.requirements, durationS, INERTIAL_REQUIREMENT_QUANTITIES, inertialLimitDimension);
  for (const r of list) {
    if (RADIUS_QUANTITIES.includes(r.quantity) && (r.level === '95%' || r.level === '50%')) {
      throw new InputError(`${r.path}.level`, `${r.quantity} is a root-sum-square radius, so it has no ${r.level} level; use 1sigma or 2sigma, or quantity "horizontal" for R95 and CEP`);
    }
  }
  return list;
}

/**
 * The values a requirement compares with its limit, SI, at every step: a
 * quantity's 1σ times the level's normal factor (2 for `2sigma` on a radius:
 * 2DRMS); for `horizontal`, DRMS, 2DRMS, the exact R95 or CEP, as for planar
 * budgets (docs/planar-model.md §8). Throws nothing for a resolved requirement.
 */
export function inertialLevelValues(budget: InertialBudget, quantity: string, level: ConfidenceLevel): Float64Array {
  if (quantity === 'horizontal') {
    if (level === '95%') return budget.r95M;
    if (level === '50%') return budget.cepM;
    return inertialLevelValues(budget, 'drms', level);
  }
  const sigma = budget.series[quantity].sigma;
  const f = RADIUS_QUANTITIES.includes(quantity) ? (level === '2sigma' ? 2 : 1) : confidenceFactor1D(level);
  return sigma.map((s) => f * s);
}

/** Every requirement's verdict on a 3-D budget, with the time-to-exceed after each aiding outage. Throws nothing. */
export function evaluateInertialRequirements(reqs: ResolvedRequirement<string>[], budget: InertialBudget): RequirementResult<string>[] {
  const tS = Float64Array.from(budget.rows, (r) => r.tS);
  // Spans outside a sensor's windows of use are not outages: no time-to-exceed for them.
  const streams = budget.model.streams.map((s) => ({ sensorId: s.sensorId, outages: s.outages.filter((o) => !o.gap) }));
  return reqs.map((r) => judgeRequirement(r, inertialLevelValues(budget, r.quantity, r.level), tS, streams, inertialLimitDimension(r.quantity)));
}

/**
 * Every requirement's verdict of a 3-D input, from one run of the total
 * covariance (no contributions): what sizing bisects on.
 * @throws InputError naming the bad field.
 */
export function inertialRequirementsOf(input: InertialBudgetInput): RequirementResult<string>[] {
  const reqs = resolveInertialRequirements(input, resolveInertialMission(input.mission).durationS);
  return evaluateInertialRequirements(reqs, runInertialBudget(input, { contributions: false }));
}
