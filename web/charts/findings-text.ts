import { formatSignificant } from '../../src';
import { QUANTITIES } from '../../src';
import type { OutageHoldEntry, RequirementEntry } from './result-shapes';

/** A value for the findings' texts and tables: three significant digits (the unit goes beside it). */
export const num = (x: number) => formatSignificant(x, 3);
/** A time or duration in seconds, with its unit. */
export const seconds = (s: number) => `${formatSignificant(s, 4)} s`;

const LEVEL_WORDS: Record<string, string> = { '1sigma': '1σ', '2sigma': '2σ', '95%': '95 %', '50%': '50 %' };

/** A confidence level in words: "1σ", "2σ", "95 %", "50 %". */
export function levelText(level: string): string {
  return LEVEL_WORDS[level] ?? level;
}

/** A requirement's quantity in words ("horizontal" is the horizontal position). */
export function quantityText(quantity: string): string {
  return QUANTITIES.find((q) => q.id === quantity)?.label ?? quantity;
}

/**
 * What one outage does to one requirement, as a sentence: how long the
 * quantity stays within its limit after the outage begins, or that it holds
 * throughout (with the outage's length).
 */
export function outageSentence(req: RequirementEntry, o: OutageHoldEntry): string {
  const within = `within ${num(req.limit)} ${req.unit} (${levelText(req.level)})`;
  const what = `the ${o.sensor} outage "${o.outage}"`;
  const q = quantityText(req.quantity);
  const length = seconds(o.end_s - o.start_s);
  if (o.timeToExceed_s === null) return `${q} stays ${within} throughout ${what} (${length})`;
  if (o.timeToExceed_s <= 0) return `${q} is already beyond ${num(req.limit)} ${req.unit} (${levelText(req.level)}) when ${what} begins`;
  return `${q} stays ${within} for ${num(o.timeToExceed_s)} s after ${what} begins (the outage lasts ${length})`;
}
