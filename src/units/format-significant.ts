/**
 * Number formatting for reports and provenance texts: a fixed count of
 * significant digits, trailing zeros dropped, and exponent notation only for
 * magnitudes where plain decimals would be long (below 1e-3 or from 1e6 up).
 */
import { InputError } from '../errors';

/** Doubles carry about 17 significant digits; more would print noise. */
const MAX_DIGITS = 17;
/** Plain decimals from 1e-3 up to (not including) 1e6; exponent notation outside. */
const PLAIN_MIN_EXPONENT = -3;
const PLAIN_MAX_EXPONENT = 5;

function dropTrailingZeros(text: string): string {
  return text.includes('.') ? text.replace(/\.?0+$/, '') : text;
}

/**
 * Formats `x` with `digits` significant digits, e.g.
 * formatSignificant(2.908882086657216e-4, 6) === '2.90888e-4',
 * formatSignificant(206264.80624709636, 6) === '206265',
 * formatSignificant(0.5, 6) === '0.5'. Zero (and -0) give '0'; NaN and
 * ±Infinity give 'NaN', 'Infinity', '-Infinity' so that a report can show them.
 * The result has no unit: the caller writes the unit beside it.
 * @throws InputError at path 'digits' when `digits` is not a whole number from 1 to 17.
 */
export function formatSignificant(x: number, digits: number): string {
  if (!Number.isInteger(digits) || digits < 1 || digits > MAX_DIGITS) {
    throw new InputError('digits', `must be a whole number from 1 to ${MAX_DIGITS}, got ${digits}`);
  }
  if (!Number.isFinite(x)) return String(x);
  if (x === 0) return '0';
  // toExponential rounds once; the plain form re-prints that rounded value, so no double rounding.
  const [mantissa, exponentText] = x.toExponential(digits - 1).split('e');
  const exponent = Number(exponentText);
  if (exponent >= PLAIN_MIN_EXPONENT && exponent <= PLAIN_MAX_EXPONENT) {
    const decimals = Math.max(0, digits - 1 - exponent);
    return dropTrailingZeros(Number(`${mantissa}e${exponent}`).toFixed(decimals));
  }
  return `${dropTrailingZeros(mantissa)}e${exponent}`;
}
