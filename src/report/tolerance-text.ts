import { formatSignificant } from '../units';

/**
 * A sized value printed to its tolerance's precision: the last digit shown is
 * the tolerance's first significant digit, so 81.6751 ± 0.0375 prints as
 * "81.68" and the tolerance as "0.04". Values of 1e6 and up, or below 1e-3,
 * fall back to significant digits covering the same precision.
 */
export function formatToTolerance(value: number, tolerance: number): { value: string; tolerance: string } {
  if (!(tolerance > 0) || !Number.isFinite(value)) return { value: formatSignificant(value, 6), tolerance: formatSignificant(tolerance, 1) };
  const decimals = -Math.floor(Math.log10(tolerance));
  const magnitude = value === 0 ? 0 : Math.floor(Math.log10(Math.abs(value)));
  if (decimals >= 0 && decimals <= 15 && Math.abs(value) < 1e6 && (value === 0 || magnitude >= -3)) {
    return { value: value.toFixed(decimals), tolerance: tolerance.toFixed(decimals) };
  }
  const digits = Math.min(17, Math.max(1, magnitude + decimals + 1));
  return { value: formatSignificant(value, digits), tolerance: formatSignificant(tolerance, 1) };
}
