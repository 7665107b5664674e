/**
 * Fields that a document may write on any sensor or row but that only some
 * kinds read. Written where nothing reads them they would be silently
 * ignored (`landmarks` on a GNSS receiver, `quantum: "angle"` on a wheel
 * speed's LSB), so the user would believe in a model that is not run.
 * Which kind reads what comes from the registries: a sensor kind's
 * `settings`, and a row's option from the sensor's `rowOptions` or the
 * source kind's own `option`.
 */
import { InputError } from '../errors';
import type { SensorInput, SourceInput } from '../inputs/budget-input';
import { SOURCE_KINDS } from '../sources/registry';
import type { OptionField } from '../sources/source-kind';
import { unitDimension } from '../units';
import { SENSOR_KINDS } from './registry';

/** Sensor fields some kinds read besides id, kind, rate, sources and outages. */
const SENSOR_SETTING_FIELDS = ['landmarks', 'maxRange', 'fieldOfView', 'observables'] as const;
const OPTION_FIELDS: readonly OptionField[] = ['biasForm', 'densitySides', 'multipathModel', 'component', 'quantum'];

/** The option a row of this sensor reads, if any. */
function rowOption(sensor: SensorInput, row: SourceInput) {
  return SENSOR_KINDS[sensor.kind]?.rowOptions?.[row.kind] ?? SOURCE_KINDS[row.kind]?.option;
}

/** A row's option must agree with its unit where the option says it applies to some dimensions only. */
function checkAgainstUnit(sensor: SensorInput, row: SourceInput, field: OptionField, path: string): void {
  const spec = rowOption(sensor, row);
  const dim = unitDimension(row.value?.unit);
  if (!spec || !dim || typeof spec.fallback !== 'function') return;
  const implied = spec.fallback(dim);
  if (field === 'quantum' && implied !== undefined && (row as unknown as Record<string, unknown>)[field] !== implied) {
    throw new InputError(`${path}.${field}`, `is "${String(row.quantum)}", but the unit '${row.value.unit}' makes this ${implied === 'angle' ? 'an angle-increment' : 'a rate'} LSB; write "${implied}" or change the unit`);
  }
}

/**
 * Refuses fields that the sensor's kind, or a row's kind, does not read.
 * @throws InputError at the field (`sensors[2].landmarks`, `sensors[1].sources[0].quantum`).
 */
export function refuseUnreadFields(sensor: SensorInput, path: string): void {
  const spec = SENSOR_KINDS[sensor.kind];
  if (!spec) return;
  const read = new Set((spec.settings ?? []).map((s) => ('field' in s ? s.field : s.type)));
  for (const field of SENSOR_SETTING_FIELDS) {
    if ((sensor as unknown as Record<string, unknown>)[field] !== undefined && !read.has(field)) {
      throw new InputError(`${path}.${field}`, `a ${sensor.kind} sensor does not use "${field}"; remove it or change the sensor's kind`);
    }
  }
  (Array.isArray(sensor.sources) ? sensor.sources : []).forEach((row, j) => {
    if (!row || typeof row !== 'object') return;
    const rowPath = `${path}.sources[${j}]`;
    const option = rowOption(sensor, row)?.field;
    for (const field of OPTION_FIELDS) {
      if ((row as unknown as Record<string, unknown>)[field] === undefined) continue;
      if (field !== option) throw new InputError(`${rowPath}.${field}`, `a "${row.kind}" row of a ${sensor.kind} sensor does not use "${field}"; remove it`);
      checkAgainstUnit(sensor, row, field, rowPath);
    }
  });
}
