/**
 * The model option that applies to a row (bias form, density sides,
 * multipath model, range-bearing component, gyro quantum): the sensor
 * kind's own option for the row's kind when it declares one, else the
 * source kind's (src/sensors/<kind>.ts `rowOptions`, src/sources/<kind>.ts
 * `option`). The page's grid and the row edits read this.
 */
import type { SensorKind, SourceKind } from '../inputs/budget-input';
import { SENSOR_KIND_NAMES, SENSOR_KINDS } from '../sensors/registry';
import type { OptionField, RowOptionSpec } from '../sources/source-kind';
import { SOURCE_KIND_NAMES, SOURCE_KINDS } from '../sources/registry';
import type { DimensionName } from '../units';

/** The option that applies to a row, with the value meant when the field is omitted. */
export interface RowOption extends Omit<RowOptionSpec, 'fallback' | 'appliesTo'> {
  fallback: string;
}

/**
 * The option of a row of `sourceKind` on a sensor of `sensorKind` whose unit
 * has dimension `dim` and whose option field holds `current`; undefined when
 * none applies. Throws nothing.
 */
export function rowOptionFor(
  sensorKind: SensorKind, sourceKind: SourceKind, dim: DimensionName | undefined, current: (field: OptionField) => string | undefined,
): RowOption | undefined {
  const spec = SENSOR_KINDS[sensorKind]?.rowOptions?.[sourceKind] ?? SOURCE_KINDS[sourceKind]?.option;
  if (spec === undefined) return undefined;
  if (spec.appliesTo !== undefined && !spec.appliesTo(dim, current(spec.field))) return undefined;
  return { field: spec.field, label: spec.label, choices: spec.choices, fallback: spec.fallback(dim) };
}

/** Every option field some sensor or source kind declares. */
export const OPTION_FIELDS: readonly OptionField[] = [...new Set([
  ...SOURCE_KIND_NAMES.flatMap((k) => (SOURCE_KINDS[k].option ? [SOURCE_KINDS[k].option.field] : [])),
  ...SENSOR_KIND_NAMES.flatMap((k) => Object.values(SENSOR_KINDS[k].rowOptions ?? {}).map((o) => o!.field)),
])];

/** The option fields a row of `sourceKind` may carry on a sensor of `sensorKind`. Throws nothing. */
export function optionFieldsOf(sensorKind: SensorKind, sourceKind: SourceKind): OptionField[] {
  const spec = SENSOR_KINDS[sensorKind]?.rowOptions?.[sourceKind] ?? SOURCE_KINDS[sourceKind]?.option;
  return spec ? [spec.field] : [];
}
