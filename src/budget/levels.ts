import { InputError } from '../errors';
import type { ConfidenceLevel } from '../inputs/budget-input';
import { QUANTITY_NAMES, quantitySpec, type QuantityName } from '../inputs/quantities';
import type { BudgetSeries, VarianceQuantity } from './budget-series';
import { confidenceFactor1D } from './confidence';
import type { DimensionName } from '../units';

/** The levels a requirement may use. */
export const LEVELS: readonly ConfidenceLevel[] = ['1sigma', '2sigma', '95%', '50%'];

/** The quantities a requirement may constrain (from the quantity table, src/inputs/quantities.ts). */
export { QUANTITY_NAMES };

/** Dimension of a quantity's limit. Throws nothing for a quantity of the table. */
export function limitDimension(q: QuantityName): DimensionName {
  return quantitySpec(q).dimension;
}

/**
 * The series a requirement compares with its limit, in SI: a 1-D quantity's
 * sigma times the level's factor; for 'horizontal', DRMS (1σ), 2DRMS (2σ),
 * the exact R95 (95 %) or CEP (50 %) (docs/planar-model.md §8).
 * @throws InputError when the suite does not produce the quantity.
 */
export function levelSeries(series: BudgetSeries, quantity: QuantityName, level: ConfidenceLevel, path: string): Float64Array {
  if (quantity === 'horizontal') {
    const drms = requireVariance(series, 'drms', path);
    if (level === '95%' || level === '50%') {
      const radii = level === '95%' ? series.r95M : series.cepM;
      if (radii.length !== drms.length) throw new Error('CEP/R95 were not computed for this series (buildTotalSeries with radii)');
      return radii;
    }
    const f = level === '2sigma' ? 2 : 1;
    return drms.map((v) => f * Math.sqrt(Math.max(0, v)));
  }
  const variance = requireVariance(series, quantity, path);
  const f = confidenceFactor1D(level);
  return variance.map((v) => f * Math.sqrt(Math.max(0, v)));
}

function requireVariance(series: BudgetSeries, q: VarianceQuantity, path: string): Float64Array {
  const s = series.quantities[q];
  if (!s) throw new InputError(path, `the suite has no speed input, so it reports no ${q}; add a wheel-speed sensor or constrain heading`);
  return s.total;
}
