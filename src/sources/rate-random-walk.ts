import type { SourceInput } from '../inputs/budget-input';
import type { ConversionStep } from '../covariance/error-model';
import { readMagnitude, type SourceKindSpec } from './source-kind';

declare module '../inputs/budget-input' {
  interface SourceKindMap {
    'rate-random-walk': true;
  }
}

/** Rate random walk: a bias that is the integral of white noise (IEEE Std 952 K). */
export const rateRandomWalkSpec: SourceKindSpec = {
  kind: 'rate-random-walk',
  label: 'rate random walk',
  summary: 'Rate random walk K (deg/h/√h, rad/s/√s): a bias driven by white noise of PSD K², starting at zero.',
  parameters: [{ field: 'value', label: 'coefficient K', dimensions: ['rate-random-walk'], range: '>= 0', required: true }],
  idBase: 'rrw',
};

/** A rate random walk in SI. */
export interface ResolvedRateRandomWalk {
  /** Two-sided PSD K² of the bias's driving noise, rad²/s³. */
  psdSI: number;
  derivation: string;
  conversions: ConversionStep[];
}

/**
 * Resolves a rate-random-walk row (heading sigma grows as K t^1.5/√3,
 * docs/checks.md §4.3).
 * @throws InputError for a negative value or a unit that is not a rate random walk.
 */
export function resolveRateRandomWalk(row: SourceInput, path: string): ResolvedRateRandomWalk {
  const conversions: ConversionStep[] = [];
  const k = readMagnitude(row.value, 'rate-random-walk', `${path}.value`, conversions);
  return { psdSI: k * k, derivation: 'PSD = K²', conversions };
}
