/**
 * Fields that a document may write on any sensor or row but that only some
 * kinds read. Written where nothing reads them they would be silently
 * ignored (`landmarks` on a GNSS receiver, `quantum: "angle"` on a wheel
 * speed's LSB), so the user would believe in a model that is not run.
 */
import { InputError } from '../errors';
import type { SensorInput, SensorKind, SourceInput, SourceKind } from '../inputs/budget-input';
import { unitDimension } from '../units';

/** Sensor fields read by some kinds only. */
const SENSOR_FIELDS: Record<string, SensorKind[]> = {
  landmarks: ['range-bearing'], maxRange: ['range-bearing'], fieldOfView: ['range-bearing'], observables: ['range-bearing'],
};

/** Row options read by some source kinds (and sensor kinds) only. */
const ROW_OPTIONS: Record<string, { sources?: SourceKind[]; sensors?: SensorKind[] }> = {
  quantum: { sources: ['quantisation'], sensors: ['yaw-gyro'] },
  biasForm: { sources: ['bias-instability'] },
  multipathModel: { sources: ['multipath'] },
  component: { sensors: ['range-bearing'] },
};

const list = (xs: readonly string[]) => xs.map((x) => `"${x}"`).join(', ');

/** A quantisation row's `quantum` must agree with its unit: an angle LSB is "angle", a rate LSB "rate". */
function checkQuantum(row: SourceInput, path: string): void {
  if (row.quantum === undefined) return;
  const dim = unitDimension(row.value?.unit);
  const implied = dim === 'angle' ? 'angle' : dim === 'angular-rate' ? 'rate' : undefined;
  if (implied && row.quantum !== implied) {
    throw new InputError(`${path}.quantum`, `is "${row.quantum}", but the unit '${row.value.unit}' makes this ${implied === 'angle' ? 'an angle-increment' : 'a rate'} LSB; write "${implied}" or change the unit`);
  }
}

/**
 * Refuses fields that the sensor's kind, or a row's kind, does not read.
 * @throws InputError at the field (`sensors[2].landmarks`, `sensors[1].sources[0].quantum`).
 */
export function refuseUnreadFields(sensor: SensorInput, path: string): void {
  for (const [field, kinds] of Object.entries(SENSOR_FIELDS)) {
    if ((sensor as unknown as Record<string, unknown>)[field] !== undefined && !kinds.includes(sensor.kind)) {
      throw new InputError(`${path}.${field}`, `a ${sensor.kind} sensor does not use "${field}" (only ${list(kinds)} does); remove it or change the sensor's kind`);
    }
  }
  (Array.isArray(sensor.sources) ? sensor.sources : []).forEach((row, j) => {
    const rowPath = `${path}.sources[${j}]`;
    for (const [field, rule] of Object.entries(ROW_OPTIONS)) {
      if ((row as unknown as Record<string, unknown>)?.[field] === undefined) continue;
      if (rule.sources && !rule.sources.includes(row.kind)) {
        throw new InputError(`${rowPath}.${field}`, `a "${row.kind}" row does not use "${field}" (only ${list(rule.sources)} rows do); remove it`);
      }
      if (rule.sensors && !rule.sensors.includes(sensor.kind)) {
        throw new InputError(`${rowPath}.${field}`, `a row of a ${sensor.kind} sensor does not use "${field}" (only rows of ${list(rule.sensors)} do); remove it`);
      }
    }
    if (row?.kind === 'quantisation') checkQuantum(row, rowPath);
  });
}
