/**
 * Dimensions of trade units: exponents of length (m), angle (rad) and time (s).
 *
 * Angle is a base dimension here, unlike in SI where the radian counts as 1:
 * otherwise deg/h (an angular rate) and 1/h (a frequency) would be the same
 * thing and a wrong unit would slip through unnoticed.
 *
 * Exponents are stored doubled ("half-steps") so that the half powers of
 * noise terms (√h, √Hz, √s) stay exact integers.
 */
import { InputError } from '../errors';

/**
 * Exponents of the three base dimensions, each stored as twice the exponent.
 * Example: rad/√s is `{ lengthHalfSteps: 0, angleHalfSteps: 2, timeHalfSteps: -1 }`.
 */
export interface Dimension {
  /** Twice the exponent of length (m). */
  readonly lengthHalfSteps: number;
  /** Twice the exponent of angle (rad). */
  readonly angleHalfSteps: number;
  /** Twice the exponent of time (s). */
  readonly timeHalfSteps: number;
}

/** The dimension of a plain ratio (ppm, %, 1). */
export const DIMENSIONLESS: Dimension = { lengthHalfSteps: 0, angleHalfSteps: 0, timeHalfSteps: 0 };

/**
 * Builds a dimension from ordinary exponents, e.g. `dimension(0, 1, -0.5)` for rad/√s.
 * @throws InputError (path 'dimension') when an exponent is not a multiple of 1/2.
 */
export function dimension(lengthExp: number, angleExp: number, timeExp: number): Dimension {
  const halves = [lengthExp, angleExp, timeExp].map((e) => e * 2);
  if (!halves.every(Number.isInteger)) {
    throw new InputError('dimension', `exponents must be multiples of 1/2, got ${lengthExp}, ${angleExp}, ${timeExp}`);
  }
  return { lengthHalfSteps: halves[0], angleHalfSteps: halves[1], timeHalfSteps: halves[2] };
}

/** The dimension of a product of two quantities (exponents add). Throws nothing. */
export function multiplyDimensions(a: Dimension, b: Dimension): Dimension {
  return {
    lengthHalfSteps: a.lengthHalfSteps + b.lengthHalfSteps,
    angleHalfSteps: a.angleHalfSteps + b.angleHalfSteps,
    timeHalfSteps: a.timeHalfSteps + b.timeHalfSteps,
  };
}

/**
 * The dimension of `d` raised to the power `exponentHalfSteps / 2`, or
 * `undefined` when the result would need quarter powers (√√h). Throws nothing.
 */
export function raiseDimension(d: Dimension, exponentHalfSteps: number): Dimension | undefined {
  // `+ 0` turns -0 into 0 so that results compare and print cleanly.
  const scale = (halfSteps: number): number => (halfSteps * exponentHalfSteps) / 2 + 0;
  const raised: Dimension = {
    lengthHalfSteps: scale(d.lengthHalfSteps),
    angleHalfSteps: scale(d.angleHalfSteps),
    timeHalfSteps: scale(d.timeHalfSteps),
  };
  return Object.values(raised).every(Number.isInteger) ? raised : undefined;
}

/** True when both dimensions have the same exponents. Throws nothing. */
export function sameDimension(a: Dimension, b: Dimension): boolean {
  return (
    a.lengthHalfSteps === b.lengthHalfSteps &&
    a.angleHalfSteps === b.angleHalfSteps &&
    a.timeHalfSteps === b.timeHalfSteps
  );
}

const BASE_SYMBOLS: readonly [keyof Dimension, string][] = [
  ['lengthHalfSteps', 'm'],
  ['angleHalfSteps', 'rad'],
  ['timeHalfSteps', 's'],
];

/** Writes one base to a positive power as trade text: s, s², √s, s/√s parts. */
function powerParts(symbol: string, halfSteps: number): string[] {
  const whole = Math.floor(halfSteps / 2);
  const parts: string[] = [];
  if (whole === 1) parts.push(symbol);
  else if (whole === 2) parts.push(`${symbol}²`);
  else if (whole === 3) parts.push(`${symbol}³`);
  else if (whole > 3) parts.push(`${symbol}^${whole}`);
  if (halfSteps % 2 === 1) parts.push(`√${symbol}`);
  return parts;
}

/**
 * The SI text of a dimension in the trade's own style, e.g. `rad/s/√s`,
 * `m·rad`, `1/s`, or `1` when dimensionless. Used to name a dimension that has
 * no entry in the named-dimension table. Throws nothing.
 */
export function formatDimension(d: Dimension): string {
  const above: string[] = [];
  const below: string[] = [];
  for (const [key, symbol] of BASE_SYMBOLS) {
    const halfSteps = d[key];
    if (halfSteps > 0) above.push(...powerParts(symbol, halfSteps));
    if (halfSteps < 0) below.push(...powerParts(symbol, -halfSteps));
  }
  const numerator = above.length > 0 ? above.join('·') : '1';
  return [numerator, ...below].join('/');
}
