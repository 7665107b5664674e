import { quantitySpec, VARIANCE_QUANTITIES, type VarianceQuantity } from '../inputs/quantities';
import { fromSI, type DimensionName } from '../units';

/** How a quantity's sigma is shown: its display unit and dimension. */
export interface DisplayUnit {
  unit: string;
  dimension: DimensionName;
  label: string;
}

/** Display units of the reported quantities (degrees for heading; the rest in SI), from the quantity table. */
export const DISPLAY = Object.fromEntries(
  VARIANCE_QUANTITIES.map((q) => {
    const spec = quantitySpec(q);
    return [q, { unit: spec.displayUnit, dimension: spec.dimension, label: spec.label }];
  }),
) as Record<VarianceQuantity, DisplayUnit>;

/** A sigma in SI shown in the quantity's display unit. */
export function sigmaForDisplay(q: VarianceQuantity, sigmaSI: number): number {
  return fromSI(sigmaSI, DISPLAY[q].unit, DISPLAY[q].dimension, q);
}

/** Factor from SI variance to display-unit variance (e.g. rad² -> deg²). */
export function varianceFactor(q: VarianceQuantity): number {
  const f = fromSI(1, DISPLAY[q].unit, DISPLAY[q].dimension, q);
  return f * f;
}
