/**
 * What a 3-D budget's rows may hold, for the page's unit pickers, its
 * "add row" and "add sensor" menus: per IMU instrument and row kind the
 * dimensions of the magnitude, and per aiding kind its row kinds with
 * theirs and a new sensor's defaults (budgets/FORMAT.md, "3-D budgets",
 * Sensors; the engine's reading is imu-errors.ts and aiding/*.ts).
 */
import type { DimensionName } from '../units';
import { GYRO_ROW_DIMENSIONS } from '../units/gyro-row-dimensions';
import type { AidingKind, ImuRowInput } from './inertial-input';

/** IMU row kinds in the order the page offers them. */
export const IMU_ROW_KINDS = [
  'white-noise',
  'bias-instability',
  'rate-random-walk',
  'turn-on-bias',
  'scale-factor',
  'quantisation',
] as const;

/** Dimensions of an IMU row's magnitude, by instrument and row kind (the first is a new row's). */
export const IMU_ROW_DIMENSIONS: Record<
  ImuRowInput['instrument'],
  Record<(typeof IMU_ROW_KINDS)[number], DimensionName[]>
> = {
  gyro: GYRO_ROW_DIMENSIONS,
  accelerometer: {
    'white-noise': ['velocity-random-walk', 'acceleration'],
    'bias-instability': ['acceleration'],
    'rate-random-walk': ['acceleration-random-walk'],
    'turn-on-bias': ['acceleration'],
    'scale-factor': ['ratio'],
    quantisation: ['acceleration', 'speed'],
  },
};

/**
 * One aiding kind on the page: a sentence about it, its row kinds with their dimensions, and a new sensor's
 * defaults.
 */
export interface AidingPageSpec {
  label: string;
  rows: Partial<Record<'white-noise' | 'turn-on-bias' | 'multipath' | 'scale-factor', DimensionName>>;
  /** Id stem, rate (Hz) and the first row's value in the unit given. */
  defaults: { id: string; rateHz: number; white: { value: number; unit: string } };
}

/** Every aiding kind of the inertial model, as the page shows it. */
export const AIDING_PAGE_SPECS: Record<AidingKind, AidingPageSpec> = {
  'gnss-position': {
    label: 'GNSS position (lever arm, vertical σ)',
    rows: { 'white-noise': 'length', multipath: 'length' },
    defaults: { id: 'gnss', rateHz: 5, white: { value: 1.5, unit: 'm' } },
  },
  'gnss-velocity': {
    label: 'GNSS velocity (vertical σ)',
    rows: { 'white-noise': 'speed' },
    defaults: { id: 'gnssVel', rateHz: 5, white: { value: 0.05, unit: 'm/s' } },
  },
  barometer: {
    label: 'barometric height',
    rows: { 'white-noise': 'length', 'turn-on-bias': 'length' },
    defaults: { id: 'baro', rateHz: 10, white: { value: 0.5, unit: 'm' } },
  },
  'heading-aid': {
    label: 'heading (magnetometer or two-antenna GNSS)',
    rows: { 'white-noise': 'angle', 'turn-on-bias': 'angle' },
    defaults: { id: 'heading', rateHz: 5, white: { value: 2, unit: 'deg' } },
  },
  'zero-velocity': {
    label: 'zero velocity at stops (windows)',
    rows: { 'white-noise': 'speed' },
    defaults: { id: 'zupt', rateHz: 10, white: { value: 0.01, unit: 'm/s' } },
  },
  'motion-constraint': {
    label: 'no sideways or vertical body velocity',
    rows: { 'white-noise': 'speed' },
    defaults: { id: 'nhc', rateHz: 10, white: { value: 0.1, unit: 'm/s' } },
  },
  odometer: {
    label: 'odometer (speed, scale factor)',
    rows: { 'white-noise': 'speed', 'scale-factor': 'ratio' },
    defaults: { id: 'odo', rateHz: 10, white: { value: 0.05, unit: 'm/s' } },
  },
};
