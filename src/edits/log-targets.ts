/**
 * Which sensors of the open document a log's results may be written into,
 * and which rows such a sensor takes: the sensor kinds' own lists
 * (src/sensors) and the units each row accepts there (unit-choices.ts).
 */
import type { AllanSensorKind } from '../allan/sensor-term-units';
import type { BudgetDocument } from '../document';
import type { SensorKind, SourceKind } from '../inputs/budget-input';
import { SENSOR_KIND_NAMES, SENSOR_KINDS } from '../sensors/registry';
import type { SensorKindSpec } from '../sensors/sensor-kind';
import { unitDimension, type DimensionName } from '../units';
import { rowDimensions } from './unit-choices';

/** The first sensor kind (registry order) whose `logs` satisfy `test`. */
const firstKind = (test: (logs: NonNullable<SensorKindSpec['logs']>) => boolean): SensorKind | undefined =>
  SENSOR_KIND_NAMES.find((k) => test(SENSOR_KINDS[k].logs ?? {}));

/** The budget's sensor kind that takes each log kind's noise terms (the kinds' `logs.allan`); none takes an accelerometer's. */
export const ALLAN_TARGET_KIND: Readonly<Record<AllanSensorKind, SensorKind | undefined>> = {
  gyro: firstKind((l) => l.allan === 'gyro'),
  accelerometer: firstKind((l) => l.allan === 'accelerometer'),
  speed: firstKind((l) => l.allan === 'speed'),
};

/** The sensor kind a calibration log's unit points at (the kinds' `logs.calibration`): rates to a gyro, speeds to a wheel-speed sensor, angles to a compass. */
export const CALIBRATION_TARGET_KIND: Readonly<Partial<Record<DimensionName, SensorKind>>> = Object.fromEntries(
  SENSOR_KIND_NAMES.flatMap((k) => (SENSOR_KINDS[k].logs?.calibration ?? []).map((d) => [d, k])),
);

/** A sensor of the document a result may go into. */
export interface TargetSensor {
  /** Index in `sensors`. */
  index: number;
  id: string;
  kind: SensorKind;
}

/** The document's sensors of `kind`, in document order. Throws nothing. */
export function sensorsOfKind(doc: BudgetDocument, kind: SensorKind | undefined): TargetSensor[] {
  if (kind === undefined) return [];
  return doc.sensors.flatMap((s, index) => (s.kind === kind ? [{ index, id: s.id, kind }] : []));
}

/** Why a sensor of `sensorKind` cannot take a `sourceKind` row in `unit`, or undefined when it can. Throws nothing. */
export function rowRefusal(sensorKind: SensorKind, sourceKind: SourceKind, unit: string): string | undefined {
  const spec = SENSOR_KINDS[sensorKind];
  if (!spec.sourceKinds.includes(sourceKind)) return `a ${spec.label} has no ${sourceKind} row`;
  const dim = unitDimension(unit);
  if (dim === undefined || !rowDimensions(sensorKind, sourceKind).includes(dim)) return `a ${spec.label}'s ${sourceKind} row does not take ${unit}`;
  return undefined;
}
