/**
 * The trade-unit table: every unit symbol the parser knows, with its factor to SI.
 *
 * Why a small table of our own rather than a general units library:
 * - datasheets write deg/√h, °/√hr, ug/rtHz, ppm, and 'g' meaning standard
 *   gravity (never gram, which this trade does not use);
 * - noise terms need half powers of time (√Hz, √h), which general libraries
 *   handle poorly or reject;
 * - angle has to stay a dimension of its own, so that deg/h (an angular rate)
 *   is never taken for 1/h (a frequency) as it is when the radian counts as 1;
 * - the report shows each conversion step for provenance ("1 h = 3600 s"),
 *   which general libraries do not expose.
 *
 * Spellings are case-sensitive ('mg' is milli-g; 'MG' and 'Mg' are unknown),
 * with listed aliases for common datasheet habits: 'hr' and 'sec' for h and s,
 * 'hz' and 'khz' for Hz and kHz, and three spellings of micro: 'u', 'µ'
 * (U+00B5 micro sign) and 'μ' (U+03BC Greek mu).
 */
import { dimension, DIMENSIONLESS, type Dimension } from './dimension';

/** One unit symbol of the table. */
export interface UnitAtom {
  /** The canonical symbol, used in provenance text. */
  readonly symbol: string;
  /** Every accepted spelling, the canonical symbol first. */
  readonly spellings: readonly string[];
  /** Multiply a value in this unit by this to get SI (m, rad, s). */
  readonly factorToSI: number;
  /** Exponents of m, rad and s, doubled. */
  readonly dimension: Dimension;
  /** What one of this unit is, for reports ("π/180 rad"); absent for m, rad and s. */
  readonly definition?: string;
}

const ANGLE = dimension(0, 1, 0);
const LENGTH = dimension(1, 0, 0);
const TIME = dimension(0, 0, 1);
const FREQUENCY = dimension(0, 0, -1);
const ANGULAR_RATE = dimension(0, 1, -1);
const SPEED = dimension(1, 0, -1);
const ACCELERATION = dimension(1, 0, -2);

/** Standard gravity in m/s², exact by definition (3rd CGPM, 1901: 980.665 cm/s²). */
const STANDARD_GRAVITY_M_PER_S2 = 9.80665;
/** The international nautical mile in m, exact by definition. */
const NAUTICAL_MILE_M = 1852;
const DEGREE_RAD = Math.PI / 180;
const HOUR_S = 3600;

function atom(spellings: string[], factorToSI: number, dim: Dimension, definition?: string): UnitAtom {
  return { symbol: spellings[0], spellings, factorToSI, dimension: dim, definition };
}

/** The table, grouped by dimension. Literal factors are exact decimal definitions. */
export const UNIT_ATOMS: readonly UnitAtom[] = [
  atom(['rad'], 1, ANGLE),
  atom(['mrad'], 1e-3, ANGLE, '1e-3 rad'),
  atom(['µrad', 'μrad', 'urad'], 1e-6, ANGLE, '1e-6 rad'),
  atom(['deg', '°'], DEGREE_RAD, ANGLE, 'π/180 rad'),
  atom(['mdeg', 'm°'], DEGREE_RAD / 1000, ANGLE, '1e-3 deg'),
  atom(['arcmin', '′'], Math.PI / 10800, ANGLE, '1/60 deg'),
  atom(['arcsec', '″'], Math.PI / 648000, ANGLE, '1/3600 deg'),
  atom(['rev'], 2 * Math.PI, ANGLE, '2π rad'),
  atom(['m'], 1, LENGTH),
  atom(['km'], 1e3, LENGTH, '1000 m'),
  atom(['cm'], 1e-2, LENGTH, '0.01 m'),
  atom(['mm'], 1e-3, LENGTH, '0.001 m'),
  atom(['µm', 'μm', 'um'], 1e-6, LENGTH, '1e-6 m'),
  atom(['nmi'], NAUTICAL_MILE_M, LENGTH, '1852 m (international nautical mile)'),
  atom(['s', 'sec'], 1, TIME),
  atom(['ms'], 1e-3, TIME, '0.001 s'),
  atom(['µs', 'μs', 'us'], 1e-6, TIME, '1e-6 s'),
  atom(['min'], 60, TIME, '60 s'),
  atom(['h', 'hr'], HOUR_S, TIME, '3600 s'),
  atom(['Hz', 'hz'], 1, FREQUENCY, '1/s'),
  atom(['kHz', 'khz'], 1e3, FREQUENCY, '1000/s'),
  atom(['dps'], DEGREE_RAD, ANGULAR_RATE, '1 deg/s'),
  atom(['mdps'], DEGREE_RAD / 1000, ANGULAR_RATE, '1e-3 deg/s (MEMS datasheets)'),
  atom(['dph'], DEGREE_RAD / HOUR_S, ANGULAR_RATE, '1 deg/h'),
  atom(['kn', 'kt'], NAUTICAL_MILE_M / HOUR_S, SPEED, '1852/3600 m/s (knot, nmi/h)'),
  atom(['g'], STANDARD_GRAVITY_M_PER_S2, ACCELERATION, '9.80665 m/s² (standard gravity)'),
  atom(['mg'], 9.80665e-3, ACCELERATION, '9.80665e-3 m/s²'),
  atom(['µg', 'μg', 'ug'], 9.80665e-6, ACCELERATION, '9.80665e-6 m/s²'),
  atom(['%'], 1e-2, DIMENSIONLESS, '0.01'),
  atom(['ppm'], 1e-6, DIMENSIONLESS, '1e-6'),
  atom(['ppb'], 1e-9, DIMENSIONLESS, '1e-9'),
];

const BY_SPELLING: ReadonlyMap<string, UnitAtom> = new Map(
  UNIT_ATOMS.flatMap((a) => a.spellings.map((s): [string, UnitAtom] => [s, a])),
);

/** The atom spelled exactly `spelling` (case-sensitive), or undefined. Throws nothing. */
export function findAtom(spelling: string): UnitAtom | undefined {
  return BY_SPELLING.get(spelling);
}

/**
 * A known spelling that differs from `spelling` only in letter case ('HZ' ->
 * 'Hz'), to suggest in an error message; undefined when there is none.
 * Throws nothing.
 */
export function spellingInOtherCase(spelling: string): string | undefined {
  const lower = spelling.toLowerCase();
  for (const known of BY_SPELLING.keys()) {
    if (known.toLowerCase() === lower) return known;
  }
  return undefined;
}
