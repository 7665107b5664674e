/**
 * Axis ticks with one number format per axis: every label of an axis gets
 * the same count of decimals, or every label is in exponent notation with
 * the same mantissa digits, so an axis never mixes "0.001" with "1e-4".
 * Tick positions come from d3-array's `ticks` (1-2-5 steps).
 */
import { tickStep, ticks } from 'd3-array';

/** Positions and labels of about `count` ticks covering [lo, hi]. */
export interface AxisTicks {
  values: number[];
  labels: string[];
}

/** Plain decimals from 1e-3 up to (not including) 1e5 in magnitude; exponent notation outside. */
const PLAIN_SMALLEST_STEP = 1e-3;
const PLAIN_LARGEST_VALUE = 1e5;

/** Ticks of a linear axis over [lo, hi] (any units), labelled in one format. */
export function linearTicks(lo: number, hi: number, count = 5): AxisTicks {
  const values = ticks(lo, hi, count);
  return { values, labels: formatTickValues(values, Math.abs(tickStep(lo, hi, count))) };
}

/**
 * Labels for evenly spaced tick values `step` apart: decimals from the step
 * when every value is plain, otherwise exponent notation with the mantissa
 * digits the step needs.
 */
export function formatTickValues(values: number[], step: number): string[] {
  const largest = Math.max(0, ...values.map(Math.abs));
  if (!(step > 0)) return values.map((v) => String(v));
  const stepExponent = Math.floor(Math.log10(step) + 1e-9);
  if (step >= PLAIN_SMALLEST_STEP && largest < PLAIN_LARGEST_VALUE) {
    const decimals = Math.max(0, -stepExponent);
    return values.map((v) => (Math.abs(v) < step / 2 ? 0 : v).toFixed(decimals));
  }
  const topExponent = Math.floor(Math.log10(largest || step) + 1e-9);
  const mantissaDecimals = Math.max(0, topExponent - stepExponent);
  return values.map((v) => (Math.abs(v) < step / 2 ? '0' : v.toExponential(mantissaDecimals).replace('e+', 'e')));
}
