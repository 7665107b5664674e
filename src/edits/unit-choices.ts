/**
 * Which units a unit picker offers: the dimensions a field accepts, from the
 * source-kind registry, narrowed by what the sensor kind declares for the
 * row's magnitude (a compass's turn-on bias is an angle, a gyro's an
 * angular rate: src/sensors/<kind>.ts, `rows`), then each dimension's
 * picker list from src/units.
 */
import type { SensorKind, SourceKind } from '../inputs/budget-input';
import { SENSOR_KINDS } from '../sensors/registry';
import { SOURCE_KINDS } from '../sources/registry';
import { DIMENSIONS, DIMENSION_NAMES, unitDimension, type DimensionName } from '../units';

/**
 * Dimensions a row's `field` accepts on a sensor of `sensorKind`: the
 * registry's list, intersected with the sensor's narrowing for the
 * magnitude. Empty when the kind has no such field. Throws nothing.
 */
export function rowDimensions(sensorKind: SensorKind, sourceKind: SourceKind, field: 'value' | 'correlationTime' | 'rate' = 'value'): DimensionName[] {
  const spec = SOURCE_KINDS[sourceKind]?.parameters.find((p) => p.field === field);
  if (!spec) return [];
  const narrow = field === 'value' ? SENSOR_KINDS[sensorKind]?.rows[sourceKind] : undefined;
  return narrow ? spec.dimensions.filter((d) => narrow.includes(d)) : [...spec.dimensions];
}

/** True when the row kind has the field (correlation time, rate override). Throws nothing. */
export function kindTakes(sourceKind: SourceKind, field: 'correlationTime' | 'rate'): boolean {
  return SOURCE_KINDS[sourceKind]?.parameters.some((p) => p.field === field) ?? false;
}

/** The unit a new value of the first accepted dimension gets ("deg/√h" for an angle random walk). Throws nothing. */
export function defaultUnit(dimensions: readonly DimensionName[]): string {
  return DIMENSIONS[dimensions[0] ?? 'ratio'].picker[0];
}

/** One group of a unit picker: a dimension's label and its units. */
export interface UnitGroup {
  label: string;
  units: string[];
}

/**
 * The picker's groups for `dimensions`; the current unit is kept (in a
 * group of its own when no list has it) so an unusual unit never vanishes.
 * Throws nothing.
 */
export function unitGroups(dimensions: readonly DimensionName[], current: string | undefined): UnitGroup[] {
  const groups = dimensions.map((d) => ({ label: DIMENSIONS[d].label, units: [...DIMENSIONS[d].picker] }));
  if (current !== undefined && current !== '' && !groups.some((g) => g.units.includes(current))) {
    const dim = unitDimension(current);
    const label = dim ? `as written (${DIMENSIONS[dim].label})` : 'as written (not a unit this field takes)';
    groups.unshift({ label, units: [current] });
  }
  return groups;
}

/** Every unit of every picker list, for free-text unit fields' suggestions. */
export const ALL_UNITS: readonly string[] = DIMENSION_NAMES.flatMap((d) => DIMENSIONS[d].picker);
