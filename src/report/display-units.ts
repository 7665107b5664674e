import type { VarianceQuantity } from '../budget/budget-series';
import { fromSI, type DimensionName } from '../units';

/** How a quantity's sigma is shown: its display unit and dimension. */
export interface DisplayUnit {
  unit: string;
  dimension: DimensionName;
  label: string;
}

/** Display units of the reported quantities (degrees for heading; the rest in SI). */
export const DISPLAY: Record<VarianceQuantity, DisplayUnit> = {
  heading: { unit: 'deg', dimension: 'angle', label: 'heading' },
  speed: { unit: 'm/s', dimension: 'speed', label: 'speed' },
  north: { unit: 'm', dimension: 'length', label: 'north' },
  east: { unit: 'm', dimension: 'length', label: 'east' },
  'along-track': { unit: 'm', dimension: 'length', label: 'along-track' },
  'cross-track': { unit: 'm', dimension: 'length', label: 'cross-track' },
  drms: { unit: 'm', dimension: 'length', label: 'DRMS' },
};

/** A sigma in SI shown in the quantity's display unit. */
export function sigmaForDisplay(q: VarianceQuantity, sigmaSI: number): number {
  return fromSI(sigmaSI, DISPLAY[q].unit, DISPLAY[q].dimension, q);
}

/** Factor from SI variance to display-unit variance (e.g. rad² -> deg²). */
export function varianceFactor(q: VarianceQuantity): number {
  const f = fromSI(1, DISPLAY[q].unit, DISPLAY[q].dimension, q);
  return f * f;
}
