import { formatTickValues, linearTicks } from '../../src/index';
import { formatSignificant } from '../../src';

/**
 * Log-axis tick label: over several decades (`crowded`) only at 1, 2 and 5
 * times a power of ten; otherwise at every one-digit value (0.5, 0.6, ...),
 * so the axis's own end values (0.49) do not print over their neighbours.
 */
function logTick(v: number, crowded: boolean): string {
  const mantissa = v / 10 ** Math.floor(Math.log10(v) + 1e-9);
  const shown = crowded ? [1, 2, 5].some((m) => Math.abs(mantissa - m) < 1e-6) : Math.abs(mantissa - Math.round(mantissa)) < 1e-6;
  return shown ? formatSignificant(v, 3) : '';
}

/**
 * Labels of one y axis: a linear axis in one number format for all ticks
 * (never "0.001" beside "1e-4"); a log axis at 1-2-5 (or every digit) as
 * logTick says, or at every tick when that would leave fewer than two
 * labels (a narrow range inside one decade).
 */
export function yTickLabels(values: number[], logarithmic: boolean): string[] {
  if (!logarithmic) return formatTickValues(values, values.length > 1 ? Math.abs(values[1] - values[0]) : 0);
  if (evenlySpaced(values)) return distinctLabels(values);
  const labels = values.map((v) => logTick(v, values.length > 8));
  const shown = labels.filter((l) => l !== '');
  if (shown.length < 2) return distinctLabels(values);
  const mixed = shown.some((l) => l.includes('e')) && shown.some((l) => !l.includes('e'));
  return mixed ? labels.map((l, i) => (l === '' ? '' : values[i].toExponential(0).replace('e+', 'e'))) : labels;
}


/** Largest ratio of top to bottom of a log axis that still gets evenly spaced ticks instead of log ones. */
const NARROW_LOG_RATIO = 10;

/**
 * Ticks for a log axis over less than a decade (`min` to `max`, both > 0):
 * chart.js then puts them at uneven, crowded places (0.016, 0.0165, 0.017 …)
 * with the same label twice, so the axis gets round, evenly spaced values
 * instead, at least two of them inside the range; undefined for a wider range.
 */
export function narrowLogTicks(min: number, max: number): number[] | undefined {
  if (!(min > 0) || !(max > min) || max / min >= NARROW_LOG_RATIO) return undefined;
  for (const count of [5, 8, 12]) {
    const inside = linearTicks(min, max, count).values.filter((v) => v >= min && v <= max);
    if (inside.length >= 2) return inside;
  }
  return undefined;
}

/** True for three or more ticks at one step (linear or narrow-log ticks), within round-off. */
function evenlySpaced(values: number[]): boolean {
  if (values.length < 3) return false;
  const step = values[1] - values[0];
  return step !== 0 && values.every((v, i) => i === 0 || Math.abs(v - values[i - 1] - step) <= 1e-9 * Math.abs(step) * values.length);
}

/** Each value with the fewest significant digits (2 to 6) that tell every label apart. */
function distinctLabels(values: number[]): string[] {
  for (let digits = 2; digits < 6; digits++) {
    const labels = values.map((v) => formatSignificant(v, digits));
    if (new Set(labels).size === labels.length) return labels;
  }
  return values.map((v) => formatSignificant(v, 6));
}
