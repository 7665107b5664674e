import type { SourceInput } from '../inputs/budget-input';
import type { ConversionStep } from '../covariance/error-model';
import type { DimensionName } from '../units';
import { readMagnitude, rowRateHz, type SourceKindSpec } from './source-kind';

declare module '../inputs/budget-input' {
  interface SourceKindMap {
    quantisation: true;
  }
}

/** Quantisation: the least significant bit of a reported rate or speed, or of an output angle increment. */
export const quantisationSpec: SourceKindSpec = {
  kind: 'quantisation',
  label: 'quantisation',
  summary:
    'LSB q of the reported rate (deg/s) or speed (m/s) at the output rate: white noise of variance q²/12 per ' +
    'sample (assumes a busy input; a steady rate below one LSB is a bias of up to q/2). An angle-increment ' +
    'quantum s (deg) is a bounded heading error of variance s²/12 that does not accumulate.',
  parameters: [
    { field: 'value', label: 'LSB', dimensions: ['angular-rate', 'speed', 'angle'], range: '>= 0', required: true },
    { field: 'rate', label: 'output rate', dimensions: ['frequency'], range: '> 0', required: false },
  ],
  idBase: 'lsb',
};

/** Quantisation in SI. */
export interface ResolvedQuantisation {
  /** Per-sample variance q²/12 (Widrow, Kollár & Liu 1996; docs/checks.md §9). */
  perSampleVarianceSI: number;
  /** Two-sided PSD q²/(12 f_s) for a rate or speed LSB; 0 for an angle quantum. */
  psdSI: number;
  rateHz: number;
  derivation: string;
  conversions: ConversionStep[];
}

/**
 * Resolves a quantisation row whose LSB has dimension `dimension`
 * (angular-rate or speed: white noise; angle: bounded output error).
 * @throws InputError for a negative LSB or a unit of another dimension.
 */
export function resolveQuantisation(row: SourceInput, dimension: DimensionName, sensorRateHz: number, path: string): ResolvedQuantisation {
  const conversions: ConversionStep[] = [];
  const q = readMagnitude(row.value, dimension, `${path}.value`, conversions);
  const variance = (q * q) / 12;
  if (dimension === 'angle') {
    return { perSampleVarianceSI: variance, psdSI: 0, rateHz: 0, derivation: 'bounded error, variance s²/12', conversions };
  }
  const rateHz = rowRateHz(row, sensorRateHz, path, conversions);
  return {
    perSampleVarianceSI: variance,
    psdSI: variance / rateHz,
    rateHz,
    derivation: `variance q²/12 per sample at ${rateHz} Hz, PSD q²/(12 f_s)`,
    conversions,
  };
}
