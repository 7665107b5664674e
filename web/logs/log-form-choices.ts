/**
 * What the import forms offer: the units of each sensor kind's log (rates
 * and per-sample increments, from the src/units pickers), a first guess of
 * the time column, and the calibration units.
 */
import { ALLAN_SENSOR_KINDS, SENSOR_TERM_UNITS, type AllanSensorKind } from '../../src';
import { DIMENSIONS, type DimensionName } from '../../src';

/** A labelled group of units for a select. */
export interface UnitChoiceGroup {
  label: string;
  units: readonly string[];
}

/** Names of the sensor kinds in the kind select. */
export const KIND_LABELS: Readonly<Record<AllanSensorKind, string>> = {
  gyro: 'gyro (angular rate)',
  accelerometer: 'accelerometer (acceleration)',
  speed: 'speed sensor (wheel speed, odometer, water-speed log)',
};

/** The kinds in select order. */
export const KINDS = ALLAN_SENSOR_KINDS;

/** The units a log of `kind` may be in: rates first, then increments per sample. Throws nothing. */
export function logUnitGroups(kind: AllanSensorKind): UnitChoiceGroup[] {
  const u = SENSOR_TERM_UNITS[kind];
  return [
    { label: `rates (${DIMENSIONS[u.rateDimension].label})`, units: DIMENSIONS[u.rateDimension].picker },
    { label: `increments per sample (${DIMENSIONS[u.incrementDimension].label})`, units: DIMENSIONS[u.incrementDimension].picker },
  ];
}

/** The unit a log of `kind` starts with: deg/s, m/s², m/s. */
export const DEFAULT_LOG_UNIT: Readonly<Record<AllanSensorKind, string>> = { gyro: 'deg/s', accelerometer: 'm/s²', speed: 'm/s' };

/** Dimensions a calibration log may be in, each pointing at a sensor kind (log-targets.ts). */
export const CALIBRATION_DIMENSIONS: readonly DimensionName[] = ['angular-rate', 'speed', 'angle', 'acceleration'];

/** The calibration unit groups. Throws nothing. */
export function calibrationUnitGroups(): UnitChoiceGroup[] {
  return CALIBRATION_DIMENSIONS.map((d) => ({ label: DIMENSIONS[d].label, units: DIMENSIONS[d].picker }));
}

const TIME_NAMES = /^(t|time|times|timestamp|time_?s|t_?s|seconds|secs?|elapsed)$/i;

/** The column that looks like a time axis, or undefined. Throws nothing. */
export function guessTimeColumn(columns: readonly string[]): string | undefined {
  return columns.find((c) => TIME_NAMES.test(c.trim())) ?? columns.find((c) => /time/i.test(c));
}

/** Column names worth offering (a trailing delimiter leaves an empty one). Throws nothing. */
export function usableColumns(columns: readonly string[]): string[] {
  return columns.filter((c) => c.trim() !== '');
}

/** The time unit a column name suggests ("time_ms" -> ms), else s. Throws nothing. */
export function guessTimeUnit(column: string | undefined): string {
  if (column && /(^|[_\s([])ms[)\]]?$/i.test(column.trim())) return 'ms';
  if (column && /(^|[_\s([])min[)\]]?$/i.test(column.trim())) return 'min';
  return 's';
}
