/**
 * Magnitudes no budget for these vehicles (ground robots, boats, small
 * drones) can mean, by dimension, in SI. A value beyond them is a typo or a
 * hostile file, and letting it through makes an infinity or a zero appear
 * later in another field's arithmetic (a variance, a PSD, a 1/rate), where
 * the message would blame the wrong field. Each bound says why; none is a
 * limit of the model's validity.
 */
import type { DimensionName } from '../units';

/** The largest magnitude a value may have and why; for times and rates also the smallest positive one. */
export interface PlausibleRange {
  /** Largest |value| in SI. */
  maxSI: number;
  /** Why, in words, with where the bound comes from. */
  maxReason: string;
  /** Smallest value of a field that must be positive (a duration, a step, a rate), in SI; its reciprocal is used. */
  minPositiveSI?: number;
  minReason?: string;
}

const DEG = Math.PI / 180;
/** Below this a non-zero magnitude's square underflows to zero in double precision (1e-200² < 5e-324). */
const TINY = 1e-150;
const NO_SOURCE = '(common practice, no source)';

/** Bounds by dimension. */
export const PLAUSIBLE_RANGES: Record<DimensionName, PlausibleRange> = {
  'angle': { maxSI: 3600 * DEG, maxReason: `ten full turns ${NO_SOURCE}` },
  'angular-rate': {
    maxSI: (1e6 * DEG) / 3600,
    maxReason: `no gyro bias or noise is this large, and a vehicle turning faster spins most of a turn a second, beyond a planar model ${NO_SOURCE}`,
  },
  'angle-random-walk': { maxSI: (1000 * DEG) / 60, maxReason: `a hundred times the noisiest consumer MEMS gyros (about 10 deg/√h) ${NO_SOURCE}` },
  'rate-random-walk': { maxSI: (1e5 * DEG) / 3600 / 60, maxReason: `far above any gyro datasheet ${NO_SOURCE}` },
  'angular-acceleration': { maxSI: 1e4 * DEG, maxReason: `far above any vehicle or gyro ramp ${NO_SOURCE}` },
  'length': { maxSI: 4.0075e7, maxReason: "the Earth's equatorial circumference, 40 075 km (WGS 84)" },
  'speed': { maxSI: 343, maxReason: 'the speed of sound in air at 20 °C, 343 m/s, which none of these vehicles reaches' },
  'velocity-random-walk': { maxSI: 10, maxReason: `a thousand times a consumer MEMS accelerometer ${NO_SOURCE}` },
  'acceleration-random-walk': { maxSI: 1, maxReason: `far above any accelerometer datasheet's bias random walk ${NO_SOURCE}` },
  'acceleration': { maxSI: 16 * 9.80665, maxReason: `the widest full scale of common MEMS accelerometers, ±16 g ${NO_SOURCE}` },
  'length-random-walk': { maxSI: 343, maxReason: `a speed noise as large as the speed of sound in one second ${NO_SOURCE}` },
  'ratio': { maxSI: 1, maxReason: `a scale-factor error of 100 %, a sensor reading double or nothing ${NO_SOURCE}` },
  'time': {
    maxSI: 1e8, maxReason: `about three years ${NO_SOURCE}`,
    minPositiveSI: 1e-6, minReason: `one microsecond, finer than any step, period or correlation time a budget needs ${NO_SOURCE}`,
  },
  'frequency': {
    maxSI: 1e5, maxReason: `100 kHz, above any navigation sensor's output rate ${NO_SOURCE}`,
    minPositiveSI: 1e-6, minReason: `one sample in 11.6 days ${NO_SOURCE}`,
  },
};

/**
 * Why `valueSI` (of dimension `dim`) is not plausible, as a phrase to
 * follow the value ("is more than ..."), or undefined when it is;
 * `positive` marks a field whose reciprocal is used (a duration, a step, a
 * rate), which also has a smallest value. `show` writes an SI bound in the
 * user's unit. Throws nothing.
 */
export function implausibility(valueSI: number, dim: DimensionName, show: (si: number) => string, positive = false): string | undefined {
  const range = PLAUSIBLE_RANGES[dim];
  const size = Math.abs(valueSI);
  if (!Number.isFinite(valueSI)) return `is infinite once converted to SI; the largest plausible value is ${show(range.maxSI)}, ${range.maxReason}`;
  if (size > range.maxSI) return `is more than ${show(range.maxSI)}, ${range.maxReason}; check the value and its unit`;
  if (positive && range.minPositiveSI !== undefined && size > 0 && size < range.minPositiveSI) {
    return `is below ${show(range.minPositiveSI)}, ${range.minReason}; check the value and its unit`;
  }
  if (size > 0 && size < TINY) return `is below ${show(TINY)}, too small to compute with (its square, a variance, would be lost); write 0 if you mean none`;
  return undefined;
}
