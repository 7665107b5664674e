/**
 * Is a residual series white? Two checks at the 5 % level:
 * - the lag-1 sample autocorrelation r₁ = Σ(e_t − ē)(e_{t+1} − ē) / Σ(e_t − ē)²
 *   against ±1.96/√n, the approximate 95 % band of r_k for white noise
 *   (standard error 1/√n; G. E. P. Box, G. M. Jenkins and G. C. Reinsel,
 *   "Time Series Analysis", 4th ed., Wiley 2008, §2.1 and §6.2; from memory);
 * - the Ljung-Box portmanteau statistic Q = n(n + 2) Σ_{k=1}^{h} r_k²/(n − k),
 *   approximately χ² with h degrees of freedom for white noise (G. M. Ljung
 *   and G. E. P. Box, "On a measure of lack of fit in time series models",
 *   Biometrika 65(2):297–303, 1978), with h = min(10, ⌊n/5⌋) lags (common
 *   practice, no source).
 * Residuals of a straight-line fit lose two degrees of freedom, which these
 * large-sample tests ignore; with hundreds of samples that does not matter.
 */
import { InputError } from '../errors';
import { chiSquareUpperTail } from './chi-square-tail';

/** The outcome of {@link checkResidualWhiteness}. */
export interface WhitenessCheck {
  /** r₁, dimensionless. */
  readonly lag1Autocorrelation: number;
  /** 1.96/√n: |r₁| above it is unlikely (5 %) for white residuals. */
  readonly lag1Bound95: number;
  /** Ljung-Box Q. */
  readonly ljungBox: number;
  /** Lags h summed in Q. */
  readonly ljungBoxLags: number;
  /** P(χ²_h > Q). */
  readonly ljungBoxPValue: number;
  /** True when |r₁| ≤ bound and the p-value ≥ 0.05. */
  readonly white: boolean;
}

/**
 * The sample autocorrelations r₁…r_h of `e` (Box, Jenkins & Reinsel, §2.1).
 * @returns h values, dimensionless; all 0 when `e` is constant. Throws nothing.
 */
export function sampleAutocorrelations(e: Float64Array, maxLag: number): Float64Array {
  const n = e.length;
  let mean = 0;
  for (let i = 0; i < n; i++) mean += e[i];
  mean /= n;
  let c0 = 0;
  for (let i = 0; i < n; i++) c0 += (e[i] - mean) ** 2;
  const r = new Float64Array(maxLag);
  if (!(c0 > 0)) return r;
  for (let k = 1; k <= maxLag; k++) {
    let ck = 0;
    for (let t = 0; t + k < n; t++) ck += (e[t] - mean) * (e[t + k] - mean);
    r[k - 1] = ck / c0;
  }
  return r;
}

/**
 * Checks residuals for serial correlation.
 * @param residuals in log order, any unit; at least 10.
 * @throws InputError when there are fewer than 10 residuals.
 */
export function checkResidualWhiteness(residuals: Float64Array): WhitenessCheck {
  const n = residuals.length;
  if (n < 10) throw new InputError('residuals', `a whiteness check needs at least 10 residuals, got ${n}`);
  const lags = Math.min(10, Math.floor(n / 5));
  const r = sampleAutocorrelations(residuals, lags);
  let q = 0;
  for (let k = 1; k <= lags; k++) q += (r[k - 1] * r[k - 1]) / (n - k);
  q *= n * (n + 2);
  const bound = 1.96 / Math.sqrt(n);
  const pValue = chiSquareUpperTail(q, lags);
  return {
    lag1Autocorrelation: r[0], lag1Bound95: bound, ljungBox: q, ljungBoxLags: lags, ljungBoxPValue: pValue,
    white: Math.abs(r[0]) <= bound && pValue >= 0.05,
  };
}
