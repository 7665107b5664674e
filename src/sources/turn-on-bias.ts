import type { SourceInput } from '../inputs/budget-input';
import type { ConversionStep } from '../covariance/error-model';
import type { DimensionName } from '../units';
import { readMagnitude, type SourceKindSpec } from './source-kind';

declare module '../inputs/budget-input' {
  interface SourceKindMap {
    'turn-on-bias': true;
  }
}

/** Turn-on bias: a random constant, different at each power-up (run-to-run). */
export const turnOnBiasSpec: SourceKindSpec = {
  kind: 'turn-on-bias',
  label: 'turn-on bias',
  summary: 'A random constant bias (1σ): deg/h for a gyro, deg for a compass, m for a range.',
  parameters: [{ field: 'value', label: '1σ bias', dimensions: ['angular-rate', 'angle', 'length'], range: '>= 0', required: true }],
  idBase: 'bias',
};

/** A random constant in SI. */
export interface ResolvedRandomConstant {
  varianceSI: number;
  conversions: ConversionStep[];
}

/**
 * Resolves a random-constant row (turn-on bias, and scale factor through
 * {@link resolveScaleFactor}): its variance initialises a state that never
 * changes.
 * @throws InputError for a negative value or a unit of another dimension.
 */
export function resolveRandomConstant(row: SourceInput, dimension: DimensionName, path: string): ResolvedRandomConstant {
  const conversions: ConversionStep[] = [];
  const sigma = readMagnitude(row.value, dimension, `${path}.value`, conversions);
  return { varianceSI: sigma * sigma, conversions };
}
