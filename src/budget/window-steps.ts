/**
 * A requirement's window must hold at least one step of the analysis, or
 * its verdict would be read off nothing (a window of 100.01-100.02 s at a
 * 0.1 s step once passed with a worst value of -Infinity).
 */
import { InputError } from '../errors';
import { TIME_SLACK_S } from '../mission/nominal-trajectory';
import { formatSignificant } from '../units';
import type { ResolvedRequirement } from './requirements';

/** Index of the first step time >= tS (t.length when none). */
function firstAtOrAfter(t: Float64Array, tS: number): number {
  let lo = 0, hi = t.length;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (t[mid] < tS) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}

/**
 * Throws for the first requirement whose window holds no step time.
 * @param stepTimesS the analysis's step times, increasing, s.
 * @throws InputError at `requirements[i].window` naming the nearest steps before and after.
 */
export function refuseWindowsWithoutSteps(requirements: ResolvedRequirement[], stepTimesS: Float64Array, stepS: number): void {
  for (const r of requirements) {
    const k = firstAtOrAfter(stepTimesS, r.windowStartS - TIME_SLACK_S);
    if (k < stepTimesS.length && stepTimesS[k] <= r.windowEndS + TIME_SLACK_S) continue;
    const s = (x: number) => `${formatSignificant(x, 9)} s`;
    const near = [stepTimesS[k - 1], stepTimesS[k]].filter((x) => x !== undefined).map(s).join(' and ');
    throw new InputError(`${r.path}.window`, `${s(r.windowStartS)} to ${s(r.windowEndS)} holds no step of the analysis (a step every ${s(stepS)}; the nearest are ${near}): widen the window to include one, or use a shorter step`);
  }
}
