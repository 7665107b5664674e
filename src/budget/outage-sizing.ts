/**
 * How long an aiding sensor may be out: one of its outages is lengthened
 * (its start kept) and each requirement read. Removing measurements never
 * lowers the covariance of an optimal filter (docs/planar-model.md §6, §9:
 * less information, larger P), so a requirement's worst value never
 * decreases with the outage's length and the longest length that holds is
 * found by bisection.
 */
import { InputError } from '../errors';
import type { BudgetInput } from '../inputs/budget-input';
import { quantityToSI } from '../inputs/checks';
import { resolveMission } from '../mission/resolve-mission';
import { requirementsOf } from './sizing';
import type { RequirementResult } from './requirements';

/** Which outage: sensor id and the outage's index in that sensor's list. */
export interface OutageRef {
  sensorId: string;
  outageIndex: number;
}

/** The longest length of the outage that still meets one requirement, s. */
export interface OutageLimit {
  requirementId: string;
  /** Longest passing length, s (0 when even a zero-length outage fails). */
  longestS: number;
  /** True when the requirement holds even with the outage lasting to the mission's end. */
  holdsToEnd: boolean;
  /** True when it fails even without the outage (other sources break it). */
  failsWithout: boolean;
  /** Half the final bracket, s. */
  toleranceS: number;
}

/** Start of the outage and the most it can last (to the mission's end), s. */
export function outageSpan(input: BudgetInput, ref: OutageRef): { startS: number; maxLengthS: number } {
  const outage = findOutage(input, ref);
  const startS = quantityToSI(outage.start, 'time', 'outage.start');
  return { startS, maxLengthS: resolveMission(input.mission).durationS - startS };
}

/**
 * Every requirement with the outage `lengthS` seconds long (from its own start),
 * from one run of the total covariance.
 * @throws InputError for an unknown sensor or outage.
 */
export function requirementsWithOutage(input: BudgetInput, ref: OutageRef, lengthS: number): RequirementResult[] {
  const copy = JSON.parse(JSON.stringify(input)) as BudgetInput;
  const { startS } = outageSpan(copy, ref);
  const sensor = copy.sensors.find((s) => s.id === ref.sensorId)!;
  if (lengthS <= 0) sensor.outages!.splice(ref.outageIndex, 1);
  else sensor.outages![ref.outageIndex] = { ...sensor.outages![ref.outageIndex], start: { value: startS, unit: 's' }, end: { value: startS + lengthS, unit: 's' } };
  return requirementsOf(copy);
}

/**
 * The longest outage that still meets each requirement, by bisection to
 * `toleranceS` (default 0.5 s) between no outage and one lasting to the end.
 * @throws InputError for an unknown sensor, outage or requirement.
 */
export function longestOutage(input: BudgetInput, ref: OutageRef, requirementIds: string[], toleranceS = 0.5): OutageLimit[] {
  const { maxLengthS } = outageSpan(input, ref);
  const verdicts = (lengthS: number) => pick(requirementsWithOutage(input, ref, lengthS), requirementIds);
  const atZero = verdicts(0), atEnd = verdicts(maxLengthS);
  return requirementIds.map((id, i) => {
    if (atZero[i].verdict === 'fail') return { requirementId: id, longestS: 0, holdsToEnd: false, failsWithout: true, toleranceS: 0 };
    if (atEnd[i].verdict === 'pass') return { requirementId: id, longestS: maxLengthS, holdsToEnd: true, failsWithout: false, toleranceS: 0 };
    let lo = 0, hi = maxLengthS;
    while (hi - lo > 2 * toleranceS) {
      const mid = 0.5 * (lo + hi);
      if (verdicts(mid)[i].verdict === 'pass') lo = mid; else hi = mid;
    }
    return { requirementId: id, longestS: lo, holdsToEnd: false, failsWithout: false, toleranceS: 0.5 * (hi - lo) };
  });
}

/** The requirements named in `ids`, in that order. @throws InputError for an unknown id. */
export function pick(results: RequirementResult[], ids: string[]): RequirementResult[] {
  return ids.map((id) => {
    const r = results.find((x) => x.id === id);
    if (!r) throw new InputError('requirement', `no requirement "${id}"; the budget has ${results.map((x) => x.id).join(', ') || 'none'}`);
    return r;
  });
}

function findOutage(input: BudgetInput, ref: OutageRef) {
  const sensor = input.sensors?.find((s) => s.id === ref.sensorId);
  const outage = sensor?.outages?.[ref.outageIndex];
  if (!outage) {
    const known = (input.sensors ?? []).flatMap((s) => (s.outages ?? []).map((_, i) => `${s.id}[${i}]`));
    throw new InputError('outage', `no outage ${ref.outageIndex} of sensor "${ref.sensorId}"; the budget has ${known.join(', ') || 'none'}`);
  }
  return outage;
}
