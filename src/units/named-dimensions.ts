/**
 * The dimensions the engine asks for by name, each with its SI unit text and
 * the units a unit picker offers for it.
 *
 * Some names share nothing but a dimension with other quantities: a gyro rate
 * noise density (deg/s/√Hz) is an angle random walk, and an accelerometer
 * noise density (µg/√Hz) is a velocity random walk, so both are offered there.
 */
import { dimension, sameDimension, type Dimension } from './dimension';
import { readUnit } from './parse-unit';

/** Every dimension name, in the order a picker lists them. */
export const DIMENSION_NAMES = [
  'angle',
  'angular-rate',
  'angle-random-walk',
  'rate-random-walk',
  'angular-acceleration',
  'length',
  'speed',
  'velocity-random-walk',
  'acceleration',
  'acceleration-random-walk',
  'length-random-walk',
  'ratio',
  'time',
  'frequency',
] as const;

/** A dimension the engine asks for by name. */
export type DimensionName = (typeof DIMENSION_NAMES)[number];

/** What the engine and the UI know about one named dimension. */
export interface NamedDimension {
  /** Words for messages and labels ("angular rate"). */
  readonly label: string;
  /** The SI unit text that engine values of this dimension are in. */
  readonly si: string;
  /** Units offered by a unit picker, most usual first; the first three serve as examples in messages. */
  readonly picker: readonly string[];
  /** Exponents of m, rad and s, doubled. */
  readonly dimension: Dimension;
}

/** The named dimensions. Every `si` and `picker` text parses to the entry's dimension (tested). */
export const DIMENSIONS: Readonly<Record<DimensionName, NamedDimension>> = {
  'angle': { label: 'angle', si: 'rad', picker: ['deg', 'rad', 'mrad', 'arcmin', 'arcsec', 'µrad'], dimension: dimension(0, 1, 0) },
  'angular-rate': { label: 'angular rate', si: 'rad/s', picker: ['deg/h', 'deg/s', 'rad/s', 'mrad/s', 'dps', 'mdeg/s'], dimension: dimension(0, 1, -1) },
  'angle-random-walk': {
    label: 'angle random walk',
    si: 'rad/√s',
    picker: ['deg/√h', 'deg/s/√Hz', 'rad/√s', 'deg/h/√Hz', 'rad/s/√Hz', 'mrad/√s', 'mdps/√Hz'],
    dimension: dimension(0, 1, -0.5),
  },
  'rate-random-walk': {
    label: 'rate random walk',
    si: 'rad/s/√s',
    picker: ['deg/h/√h', 'deg/s/√h', 'rad/s/√s', 'deg/s/√s'],
    dimension: dimension(0, 1, -1.5),
  },
  'angular-acceleration': { label: 'angular acceleration', si: 'rad/s²', picker: ['deg/h²', 'deg/s²', 'rad/s²'], dimension: dimension(0, 1, -2) },
  'length': { label: 'length', si: 'm', picker: ['m', 'km', 'nmi', 'cm', 'mm'], dimension: dimension(1, 0, 0) },
  'speed': { label: 'speed', si: 'm/s', picker: ['m/s', 'km/h', 'kn', 'cm/s', 'mm/s'], dimension: dimension(1, 0, -1) },
  'velocity-random-walk': {
    label: 'velocity random walk',
    si: 'm/s/√s',
    picker: ['m/s/√h', 'µg/√Hz', 'm/s/√s', 'mg/√Hz', 'm/s²/√Hz'],
    dimension: dimension(1, 0, -1.5),
  },
  'acceleration': { label: 'acceleration', si: 'm/s²', picker: ['mg', 'µg', 'm/s²', 'g'], dimension: dimension(1, 0, -2) },
  'acceleration-random-walk': {
    label: 'accelerometer bias random walk',
    si: 'm/s²/√s',
    picker: ['µg/√h', 'mg/√h', 'm/s²/√s', 'µg/√s'],
    dimension: dimension(1, 0, -2.5),
  },
  'length-random-walk': { label: 'speed noise density', si: 'm/√s', picker: ['m/s/√Hz', 'm/√h', 'm/√s', 'cm/s/√Hz'], dimension: dimension(1, 0, -0.5) },
  'ratio': { label: 'ratio', si: '1', picker: ['ppm', '%', '1', 'ppb'], dimension: dimension(0, 0, 0) },
  'time': { label: 'time', si: 's', picker: ['s', 'min', 'h', 'ms'], dimension: dimension(0, 0, 1) },
  'frequency': { label: 'frequency', si: 'Hz', picker: ['Hz', 'kHz'], dimension: dimension(0, 0, -1) },
};

/** True when `name` is a known dimension name (for checking documents). Throws nothing. */
export function isDimensionName(name: unknown): name is DimensionName {
  return typeof name === 'string' && (DIMENSION_NAMES as readonly string[]).includes(name);
}

/** The name of a unit's dimension, or undefined when it has no name here (m·rad). Throws nothing. */
export function dimensionOf(unit: { readonly dimension: Dimension }): DimensionName | undefined {
  return DIMENSION_NAMES.find((name) => sameDimension(DIMENSIONS[name].dimension, unit.dimension));
}

/**
 * The named dimension of a unit text ('deg/√h' -> 'angle-random-walk'), or
 * undefined when the text is not a string, unknown, malformed, or of a
 * dimension without a name here. For choosing a row's form by its unit.
 * Throws nothing.
 */
export function unitDimension(unit: string): DimensionName | undefined {
  if (typeof unit !== 'string') return undefined;
  const reading = readUnit(unit);
  return reading.ok ? dimensionOf(reading.unit) : undefined;
}

/** The label with its article: "an angular rate", "a speed". Throws nothing. */
export function labelWithArticle(name: DimensionName): string {
  const label = DIMENSIONS[name].label;
  return `${/^[aeiou]/.test(label) ? 'an' : 'a'} ${label}`;
}

/**
 * What a message says is expected, e.g. "an angular rate such as deg/h, deg/s, rad/s".
 * Throws nothing.
 */
export function describeExpected(name: DimensionName): string {
  return `${labelWithArticle(name)} such as ${DIMENSIONS[name].picker.slice(0, 3).join(', ')}`;
}
