/**
 * Checks a log's time column and derives its sample rate. The Allan variance
 * assumes samples evenly spaced in time: a log whose time stands still or
 * runs backwards, or has gaps, is refused with the lines to look at.
 *
 * Rule (a choice of this project): the nominal step is the median of the
 * steps (of up to 100 001 steps spread evenly over the log, so that the check
 * stays linear); a step outside (1 ± tolerance) × nominal is a gap (or a
 * stutter, when short). The rate is (n − 1)/(t_last − t_first), the mean over
 * the whole log, once every step passed, to 12 significant digits.
 */
import { InputError } from '../errors';
import { formatSignificant } from '../units';
import type { RowLines } from './row-lines';

/** Default relative tolerance of a time step around the nominal step. */
export const DEFAULT_GAP_TOLERANCE = 0.5;

/** Steps sampled for the median. */
const MEDIAN_SAMPLE = 100_001;
/** Gaps listed in a message. */
const LISTED_GAPS = 5;

/** What the time column says about sampling. */
export interface TimeAxis {
  /** Mean sample rate in Hz. */
  readonly rateHz: number;
  /** Median step in s. */
  readonly nominalStepS: number;
}

function medianStep(timeS: Float64Array): number {
  const steps = timeS.length - 1;
  const count = Math.min(steps, MEDIAN_SAMPLE);
  const sample = new Float64Array(count);
  for (let k = 0; k < count; k++) {
    const i = count === 1 ? 0 : Math.round((k * (steps - 1)) / (count - 1));
    sample[k] = timeS[i + 1] - timeS[i];
  }
  sample.sort();
  return sample[count >> 1];
}

const seconds = (x: number): string => `${formatSignificant(x, 6)} s`;

/**
 * Checks that time increases at an even step and returns the rate.
 * @param timeS time of each data row in s (at least 2 rows).
 * @param lines data row → file line, for messages.
 * @param source names the log in messages ("log.csv").
 * @param column the time column's header name.
 * @param tolerance relative tolerance of a step, > 0; default 0.5 (from 1 up,
 *   short steps all pass and only steps over (1 + tolerance) × nominal are gaps).
 * @throws InputError naming the line where time stands still or runs back,
 *   or the first gap with a list of the others.
 */
export function checkTimeAxis(timeS: Float64Array, lines: RowLines, source: string, column: string, tolerance = DEFAULT_GAP_TOLERANCE): TimeAxis {
  if (!(tolerance > 0) || !Number.isFinite(tolerance)) throw new InputError('gapTolerance', `must be a number above 0 (e.g. 0.5), got ${tolerance}`);
  for (let i = 1; i < timeS.length; i++) {
    if (!(timeS[i] > timeS[i - 1])) {
      throw new InputError(
        `${source} line ${lines.lineOf(i)}, column "${column}"`,
        `time ${seconds(timeS[i])} does not increase from ${seconds(timeS[i - 1])} on line ${lines.lineOf(i - 1)}; sort the log by time and remove repeated rows`,
      );
    }
  }
  const nominal = medianStep(timeS);
  const gaps: number[] = [];
  let gapCount = 0;
  for (let i = 1; i < timeS.length; i++) {
    const step = timeS[i] - timeS[i - 1];
    if (Math.abs(step - nominal) > tolerance * nominal) {
      gapCount++;
      if (gaps.length < LISTED_GAPS) gaps.push(i);
    }
  }
  if (gapCount > 0) {
    const first = gaps[0];
    const listed = gaps.map((i) => lines.lineOf(i)).join(', ');
    throw new InputError(
      `${source} line ${lines.lineOf(first)}, column "${column}"`,
      `time steps from ${seconds(timeS[first - 1])} to ${seconds(timeS[first])} (a step of ${seconds(timeS[first] - timeS[first - 1])}, ` +
        `against the usual ${seconds(nominal)}); ${gapCount} uneven step${gapCount > 1 ? 's' : ''} in all, ending on line${gapCount > 1 ? 's' : ''} ${listed}` +
        `${gapCount > LISTED_GAPS ? ', …' : ''}. The Allan variance needs evenly spaced samples: split the log at the gaps, ` +
        `or accept the steps with a larger gap tolerance (now ${tolerance})`,
    );
  }
  // Rounded to 12 significant digits: time stamps carry fewer, and the division's binary round-off would
  // otherwise print 100 Hz as 99.99999999999999.
  const rateHz = Number(((timeS.length - 1) / (timeS[timeS.length - 1] - timeS[0])).toPrecision(12));
  return { rateHz, nominalStepS: nominal };
}
