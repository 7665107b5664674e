/**
 * How 3-D quantities are shown: display unit (degrees for attitude, SI
 * otherwise), the JSON series key, and the factor to the report level. Every
 * quantity of INERTIAL_QUANTITIES gets these from its SI unit, so a new
 * quantity needs no entry here.
 */
import { confidenceFactor1D } from '../budget/confidence';
import type { ConfidenceLevel } from '../inputs/budget-input';
import { INERTIAL_QUANTITIES } from '../inertial/inertial-quantities';
import { fromSI, type DimensionName } from '../units';

const BY_UNIT: Record<string, { unit: string; dimension: DimensionName; key: string }> = {
  m: { unit: 'm', dimension: 'length', key: 'm' },
  'm/s': { unit: 'm/s', dimension: 'speed', key: 'mps' },
  rad: { unit: 'deg', dimension: 'angle', key: 'deg' },
};

/** The display of one 3-D quantity. */
export interface InertialDisplay {
  id: string;
  label: string;
  unit: string;
  /** Display-unit value of 1 SI unit (rad -> 57.29…). */
  factor: number;
  /** Key of its 1σ series in the JSON result, e.g. `velocity_north_sigma_mps`. */
  seriesKey: string;
}

const snake = (id: string) => id.replace(/[A-Z]/g, (c) => `_${c.toLowerCase()}`);

/** Every 3-D quantity's display, in the table's order. */
export const INERTIAL_DISPLAY: readonly InertialDisplay[] = INERTIAL_QUANTITIES.map((q) => {
  const d = BY_UNIT[q.unitSI];
  return { id: q.id, label: q.label, unit: d.unit, factor: fromSI(1, d.unit, d.dimension, q.id), seriesKey: `${snake(q.id)}_sigma_${d.key}` };
});

const BY_ID = new Map(INERTIAL_DISPLAY.map((d) => [d.id, d]));

/** The display of quantity `id`. @throws Error for an id not in INERTIAL_QUANTITIES (a programming error). */
export function inertialDisplay(id: string): InertialDisplay {
  const d = BY_ID.get(id);
  if (!d) throw new Error(`unknown inertial quantity "${id}"`);
  return d;
}

/** Factor from 1σ to the report level: the normal factor, but 1 for the radii DRMS and MRSE (shown at 1σ, as planar DRMS). */
export function inertialLevelFactor(id: string, level: ConfidenceLevel): number {
  return id === 'drms' || id === 'mrse' ? 1 : confidenceFactor1D(level);
}
