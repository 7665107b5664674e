/**
 * Offset and scale factor of a sensor from a log of its output against known
 * truth (a turntable at set rates, a surveyed course, a reference sensor):
 *   y = (1 + s)·x + b + noise,
 * y the sensor's output, x the truth, s the scale-factor error, b the offset.
 *
 * Ordinary least squares for a straight line, in the closed form of any
 * regression text (e.g. N. R. Draper and H. Smith, "Applied Regression
 * Analysis", 3rd ed., Wiley 1998, ch. 1; from memory). The line is fitted to
 * d = y − x = s·x + b, so that s comes out directly rather than as
 * (1 + s) − 1, and from centred sums:
 *   s = Σ(x − x̄)(d − d̄) / Sxx,   b = d̄ − s·x̄,   Sxx = Σ(x − x̄)²,
 *   σ̂² = Σ r² / (n − 2),   Var s = σ̂²/Sxx,   Var b = σ̂²(1/n + x̄²/Sxx),
 *   Cov(b, s) = −x̄ σ̂²/Sxx.
 * The standard deviations assume independent residuals; check them with
 * residual-whiteness.ts, since correlated residuals make them too small.
 */
import { InputError } from '../errors';

/** The fitted calibration, in the unit of the log (s is a plain ratio). */
export interface LinearCalibration {
  /** Offset b, unit of the values. */
  readonly offset: number;
  /** Scale-factor error s (1e-3 = 1000 ppm); the sensor reads (1 + s) times the truth. */
  readonly scaleFactor: number;
  /** Standard deviation of b, unit of the values. */
  readonly offsetStd: number;
  /** Standard deviation of s (ratio). */
  readonly scaleFactorStd: number;
  /** Correlation coefficient of the b and s estimates, from −1 to 1. */
  readonly correlation: number;
  /** Residual standard deviation σ̂, unit of the values. */
  readonly residualStd: number;
  /** Samples n. */
  readonly sampleCount: number;
  /** y − (1 + s)x − b for each sample, in log order, unit of the values. */
  readonly residuals: Float64Array;
}

function mean(v: Float64Array): number {
  let sum = 0;
  for (let i = 0; i < v.length; i++) sum += v[i];
  return sum / v.length;
}

function checkInputs(measured: Float64Array, truth: Float64Array): void {
  if (measured.length !== truth.length) {
    throw new InputError('truth', `has ${truth.length} values but the measured column has ${measured.length}; give one truth value per sample`);
  }
  if (measured.length < 3) throw new InputError('measured', `needs at least 3 samples (2 parameters and one degree of freedom), got ${measured.length}`);
  for (let i = 0; i < measured.length; i++) {
    if (!Number.isFinite(measured[i]) || !Number.isFinite(truth[i])) throw new InputError(`sample ${i + 1}`, 'every value must be a finite number');
  }
}

/**
 * Fits y = (1 + s)x + b by least squares.
 * @param measured sensor output y, any unit.
 * @param truth true value x at each sample, same unit as `measured`.
 * @throws InputError when the lengths differ, there are fewer than 3
 *   samples, a value is not finite, or the truth never changes (then offset
 *   and scale factor cannot be told apart).
 */
export function fitOffsetAndScaleFactor(measured: Float64Array, truth: Float64Array): LinearCalibration {
  checkInputs(measured, truth);
  const n = measured.length;
  const xBar = mean(truth);
  const d = new Float64Array(n);
  for (let i = 0; i < n; i++) d[i] = measured[i] - truth[i];
  const dBar = mean(d);
  let sxx = 0, sxd = 0;
  for (let i = 0; i < n; i++) {
    const dx = truth[i] - xBar;
    sxx += dx * dx;
    sxd += dx * (d[i] - dBar);
  }
  if (!(sxx > 0)) {
    throw new InputError('truth', 'never changes, so offset and scale factor cannot be told apart: log the sensor at two or more different known values');
  }
  const scaleFactor = sxd / sxx;
  const offset = dBar - scaleFactor * xBar;
  const residuals = new Float64Array(n);
  let rss = 0;
  for (let i = 0; i < n; i++) {
    residuals[i] = d[i] - scaleFactor * truth[i] - offset;
    rss += residuals[i] * residuals[i];
  }
  const variance = rss / (n - 2);
  const varS = variance / sxx;
  const varB = variance * (1 / n + (xBar * xBar) / sxx);
  const cov = (-xBar * variance) / sxx;
  return {
    offset, scaleFactor, offsetStd: Math.sqrt(varB), scaleFactorStd: Math.sqrt(varS),
    correlation: varB > 0 && varS > 0 ? cov / Math.sqrt(varB * varS) : 0,
    residualStd: Math.sqrt(variance), sampleCount: n, residuals,
  };
}
