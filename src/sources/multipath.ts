import { InputError } from '../errors';
import type { SourceInput } from '../inputs/budget-input';
import type { ConversionStep } from '../covariance/error-model';
import { readMagnitude, readPositive, type SourceKindSpec } from './source-kind';

declare module '../inputs/budget-input' {
  interface SourceKindMap {
    multipath: true;
  }
}

/** GNSS multipath allowance: Gauss-Markov states per axis, or folded into R. */
export const multipathSpec: SourceKindSpec = {
  kind: 'multipath',
  label: 'multipath allowance',
  summary:
    'Per-axis 1σ (m) with a correlation time: Gauss-Markov states per axis, or folded into R as σ_h² + σ_m² ' +
    '(time-correlated error treated as white: optimistic).',
  parameters: [
    { field: 'value', label: '1σ per axis', dimensions: ['length'], range: '>= 0', required: true },
    { field: 'correlationTime', label: 'correlation time (states only)', dimensions: ['time'], range: '> 0', required: false },
  ],
  idBase: 'multipath',
  option: {
    field: 'multipathModel', label: 'multipath model',
    choices: [{ value: 'states', label: 'states' }, { value: 'folded', label: 'folded' }],
    fallback: () => 'states',
  },
  newRowOption: 'states',
};

/** Multipath in SI. */
export interface ResolvedMultipath {
  varianceSI: number;
  model: 'states' | 'folded';
  /** Present when modelled as states. */
  correlationTimeS?: number;
  /** 2σ²/T, when modelled as states. */
  psdSI: number;
  conversions: ConversionStep[];
}

/**
 * Resolves a multipath row (docs/planar-model.md §5).
 * @throws InputError for a negative sigma, or states without a positive correlation time.
 */
export function resolveMultipath(row: SourceInput, path: string): ResolvedMultipath {
  const conversions: ConversionStep[] = [];
  const sigma = readMagnitude(row.value, 'length', `${path}.value`, conversions);
  const model = row.multipathModel ?? 'states';
  if (model !== 'states' && model !== 'folded') {
    throw new InputError(`${path}.multipathModel`, `must be "states" or "folded", got ${JSON.stringify(model)}`);
  }
  if (model === 'folded') return { varianceSI: sigma * sigma, model, psdSI: 0, conversions };
  if (row.correlationTime === undefined) {
    throw new InputError(`${path}.correlationTime`, 'is required when multipath is modelled as states (a time such as 60 s)');
  }
  const correlationTimeS = readPositive(row.correlationTime, 'time', `${path}.correlationTime`, 'correlationTime', conversions);
  return { varianceSI: sigma * sigma, model, correlationTimeS, psdSI: (2 * sigma * sigma) / correlationTimeS, conversions };
}
