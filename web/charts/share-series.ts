import type { JsonResult } from '../../src';
import { quantitySpec, VARIANCE_QUANTITIES } from '../../src';
import { NEUTRAL_COLOUR, seriesColour } from '../styles/palette';
import type { LineDataset } from './chart-controller';

/** Keys of `contributions` (and of checkpoint budgets) with their names in words, in the share picker's order. */
export const SHARE_QUANTITIES: [key: string, label: string][] = VARIANCE_QUANTITIES.map((q) => [quantitySpec(q).resultKey!, quantitySpec(q).label]);

/** How many sources get their own colour; the rest are summed as "other sources". */
export const NAMED_SOURCES = 7;
/** Legend label of the grouped small sources. */
export const OTHER_SOURCES = 'other sources';

/**
 * Each source's share of the total variance of one quantity, in % at each
 * step (null where the total is zero). The total at a step is the sum of the
 * sources' variances, so the shares at a step sum to 100 %.
 */
export function sharePercent(contributions: Record<string, number[]>): Map<string, (number | null)[]> {
  const ids = Object.keys(contributions);
  const steps = ids.length ? contributions[ids[0]].length : 0;
  const total = Array.from({ length: steps }, (_, k) => ids.reduce((sum, id) => sum + contributions[id][k], 0));
  return new Map(ids.map((id) => [id, contributions[id].map((v, k) => (total[k] > 0 ? (100 * v) / total[k] : null))]));
}

const peak = (values: (number | null)[]) => values.reduce<number>((m, v) => (v !== null && v > m ? v : m), -Infinity);

/**
 * Stacked-area datasets of share of variance for `quantity` (a key of
 * `result.contributions`): the {@link NAMED_SOURCES} sources with the
 * largest peak share, largest at the bottom, in palette colours; all others
 * summed on top as {@link OTHER_SOURCES} in neutral grey.
 */
export function shareDatasets(result: JsonResult, quantity: string): LineDataset[] {
  const shares = sharePercent(result.contributions[quantity] ?? {});
  const ranked = [...shares.entries()].sort((a, b) => peak(b[1]) - peak(a[1]));
  const named = ranked.length > NAMED_SOURCES ? ranked.slice(0, NAMED_SOURCES) : ranked;
  const rest = ranked.slice(named.length);
  const sets = named.map(([id, data], i) => area(id, data, seriesColour(i), i));
  if (rest.length) {
    const summed = rest[0][1].map((_, k) => (rest[0][1][k] === null ? null : rest.reduce((s, [, d]) => s + (d[k] ?? 0), 0)));
    sets.push(area(`${OTHER_SOURCES} (${rest.length})`, summed, NEUTRAL_COLOUR, sets.length));
  }
  return sets;
}

function area(label: string, data: (number | null)[], colour: string, index: number): LineDataset {
  return {
    label, data, borderColor: '#ffffff', backgroundColor: colour, borderWidth: 0.5,
    fill: index === 0 ? 'origin' : '-1', stack: 'shares',
  };
}
