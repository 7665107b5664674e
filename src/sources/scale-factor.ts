import { InputError } from '../errors';
import type { SourceInput } from '../inputs/budget-input';
import { resolveRandomConstant, type ResolvedRandomConstant } from './turn-on-bias';
import type { SourceKindSpec } from './source-kind';

declare module '../inputs/budget-input' {
  interface SourceKindMap {
    'scale-factor': true;
  }
}

/** Scale factor error: a random constant ratio (ppm, %). */
export const scaleFactorSpec: SourceKindSpec = {
  kind: 'scale-factor',
  label: 'scale factor',
  summary: 'A random constant scale-factor error (1σ) in ppm or %: the reading is (1 + s) times the truth.',
  parameters: [{ field: 'value', label: '1σ scale factor', dimensions: ['ratio'], range: '0 to 50 %', required: true }],
  idBase: 'sf',
};

/**
 * Resolves a scale-factor row.
 * @throws InputError for a negative value or one above 50 % (the linear model does not hold there).
 */
export function resolveScaleFactor(row: SourceInput, path: string): ResolvedRandomConstant {
  const r = resolveRandomConstant(row, 'ratio', path);
  if (Math.sqrt(r.varianceSI) > 0.5) {
    throw new InputError(`${path}.value`, `a scale factor above 50 % is outside what a linearised model can describe; got ${row.value.value} ${row.value.unit}`);
  }
  return r;
}
