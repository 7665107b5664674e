import { InputError } from '../errors';
import type { SourceInput } from '../inputs/budget-input';
import type { ConversionStep } from '../covariance/error-model';
import { formatSignificant, type DimensionName } from '../units';
import { flickerCoefficientToFloor, gaussMarkovSigmaFromAllanFloor, GM_ALLAN_PEAK_RATIO } from './gauss-markov-allan';
import { readMagnitude, readPositive, type SourceKindSpec } from './source-kind';

declare module '../inputs/budget-input' {
  interface SourceKindMap {
    'bias-instability': true;
  }
}

/** Bias instability as a first-order Gauss-Markov state (docs/planar-model.md §3). */
export const biasInstabilitySpec: SourceKindSpec = {
  kind: 'bias-instability',
  label: 'bias instability',
  summary:
    'The Allan-deviation floor (deg/h), or the flicker coefficient B (floor = 0.664 B, IEEE Std 952 Annex C), ' +
    'modelled as a Gauss-Markov bias whose Allan peak equals the floor; the correlation time is required.',
  parameters: [
    { field: 'value', label: 'floor or flicker coefficient', dimensions: ['angular-rate'], range: '>= 0', required: true },
    { field: 'correlationTime', label: 'correlation time', dimensions: ['time'], range: '> 0', required: true },
  ],
  idBase: 'bi',
  option: {
    field: 'biasForm', label: 'bias form',
    choices: [{ value: 'floor', label: 'Allan floor' }, { value: 'flicker-coefficient', label: 'flicker B' }],
    fallback: () => 'floor',
  },
  // 100 s when the datasheet gives none: common practice, no source (docs/planar-model.md §3).
  assumedCells: [{
    field: 'correlationTime', value: 100, unit: 's',
    note: 'assumed: correlation time 100 s, the usual guess when the datasheet gives none; replace it with the Allan plot\'s value',
  }],
};

/** A Gauss-Markov bias in SI. */
export interface ResolvedGaussMarkov {
  /** Stationary sigma of the state, SI. */
  sigmaSI: number;
  correlationTimeS: number;
  /** Two-sided PSD of the driving noise, 2 σ² / T. */
  psdSI: number;
  derivation: string;
  conversions: ConversionStep[];
}

/**
 * Resolves a bias-instability row: sigma = floor / 0.6173643 so that the
 * Gauss-Markov Allan deviation peaks at the floor (at tau = 1.8926 T), and
 * the driving PSD is 2 σ²/T (docs/planar-model.md §3).
 * @throws InputError for a missing or non-positive correlation time.
 */
export function resolveBiasInstability(row: SourceInput, dimension: DimensionName, path: string): ResolvedGaussMarkov {
  const conversions: ConversionStep[] = [];
  const value = readMagnitude(row.value, dimension, `${path}.value`, conversions);
  if (row.correlationTime === undefined) {
    throw new InputError(`${path}.correlationTime`, 'is required for bias instability (a time such as 100 s; mark it assumed if unknown)');
  }
  const correlationTimeS = readPositive(row.correlationTime, 'time', `${path}.correlationTime`, 'correlationTime', conversions);
  const flicker = row.biasForm === 'flicker-coefficient';
  const floor = flicker ? flickerCoefficientToFloor(value) : value;
  const sigmaSI = gaussMarkovSigmaFromAllanFloor(floor);
  const ratio = formatSignificant(GM_ALLAN_PEAK_RATIO, 10);
  const derivation =
    (flicker ? `floor = 0.6642825 × B = ${formatSignificant(floor, 6)}; ` : '') +
    `σ = floor / ${ratio} = ${formatSignificant(sigmaSI, 6)}; PSD = 2σ²/T with T = ${correlationTimeS} s`;
  return { sigmaSI, correlationTimeS, psdSI: (2 * sigmaSI * sigmaSI) / correlationTimeS, derivation, conversions };
}
