/**
 * Names and units of the noise terms for each kind of sensor a log can come
 * from. SI units follow docs/planar-model.md §1 (rad/√s for angle random walk, rad/s for
 * bias instability, rad/s/√s for rate random walk); display units are the
 * trade's (docs/checks.md §2): a gyro's terms in deg/√h, deg/h, deg/h/√h
 * whether its log is in deg/s or deg/h.
 *
 * The third kind, a speed sensor (odometer, water-speed log), is outside
 * IEEE Std 952 and 1293; its white-noise term integrates to a distance
 * random walk and is named so. Its display unit m/s/√Hz is the engine's
 * speed white-noise density (docs/planar-model.md §3).
 */
import type { DimensionName } from '../units';
import type { NoiseTermId } from './noise-terms';

/** The kinds of sensor log the Allan analysis understands. */
export type AllanSensorKind = 'gyro' | 'accelerometer' | 'speed';

/** Every sensor kind, for option checks. */
export const ALLAN_SENSOR_KINDS: readonly AllanSensorKind[] = ['gyro', 'accelerometer', 'speed'];

/** A term's name and units for one sensor kind. */
export interface TermLabel {
  /** IEEE Std 952 term name, e.g. "angle random walk". */
  readonly name: string;
  /** Display unit, e.g. "deg/√h". */
  readonly unit: string;
  /** SI unit, e.g. "rad/√s". */
  readonly unitSI: string;
}

/** What a sensor kind measures and how its terms are labelled. */
export interface SensorTermUnits {
  /** Dimension of the rate samples (deg/s, m/s², m/s). */
  readonly rateDimension: DimensionName;
  /** Dimension of per-sample increments (deg, m/s, m). */
  readonly incrementDimension: DimensionName;
  /** SI unit of the rate (σ of the Allan curve). */
  readonly rateUnitSI: string;
  readonly terms: Readonly<Record<NoiseTermId, TermLabel>>;
}

const label = (name: string, unit: string, unitSI: string): TermLabel => ({ name, unit, unitSI });

/** Term labels per sensor kind. */
export const SENSOR_TERM_UNITS: Readonly<Record<AllanSensorKind, SensorTermUnits>> = {
  gyro: {
    rateDimension: 'angular-rate',
    incrementDimension: 'angle',
    rateUnitSI: 'rad/s',
    terms: {
      'quantisation': label('quantisation', 'arcsec', 'rad'),
      'random-walk': label('angle random walk', 'deg/√h', 'rad/√s'),
      'bias-instability': label('bias instability', 'deg/h', 'rad/s'),
      'rate-random-walk': label('rate random walk', 'deg/h/√h', 'rad/s/√s'),
      'rate-ramp': label('rate ramp', 'deg/h²', 'rad/s²'),
    },
  },
  accelerometer: {
    rateDimension: 'acceleration',
    incrementDimension: 'speed',
    rateUnitSI: 'm/s²',
    terms: {
      'quantisation': label('quantisation', 'm/s', 'm/s'),
      'random-walk': label('velocity random walk', 'm/s/√h', 'm/s/√s'),
      'bias-instability': label('bias instability', 'mg', 'm/s²'),
      'rate-random-walk': label('rate random walk', 'mg/√h', 'm/s²/√s'),
      'rate-ramp': label('rate ramp', 'mg/h', 'm/s³'),
    },
  },
  speed: {
    rateDimension: 'speed',
    incrementDimension: 'length',
    rateUnitSI: 'm/s',
    terms: {
      'quantisation': label('quantisation', 'm', 'm'),
      'random-walk': label('distance random walk', 'm/s/√Hz', 'm/√s'),
      'bias-instability': label('bias instability', 'm/s', 'm/s'),
      'rate-random-walk': label('rate random walk', 'm/s/√h', 'm/s/√s'),
      'rate-ramp': label('rate ramp', 'm/s/h', 'm/s²'),
    },
  },
};

/**
 * The sensor kind a log unit implies: an angular rate or angle means a gyro,
 * an acceleration an accelerometer, a speed or length a speed sensor
 * (velocity increments from an accelerometer need the kind given explicitly).
 * @returns the kind, or undefined when the dimension fits none. Throws nothing.
 */
export function kindFromDimension(dimension: DimensionName | undefined): AllanSensorKind | undefined {
  switch (dimension) {
    case 'angular-rate':
    case 'angle':
      return 'gyro';
    case 'acceleration':
      return 'accelerometer';
    case 'speed':
    case 'length':
      return 'speed';
    default:
      return undefined;
  }
}
