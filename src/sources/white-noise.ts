import type { SourceInput } from '../inputs/budget-input';
import type { ConversionStep } from '../covariance/error-model';
import { formatSignificant, type DimensionName } from '../units';
import { pickDimension, readMagnitude, rowRateHz, type SourceKindSpec } from './source-kind';

declare module '../inputs/budget-input' {
  interface SourceKindMap {
    'white-noise': true;
  }
}

/** White noise: a random walk coefficient / noise density, or a per-sample sigma at an output rate. */
export const whiteNoiseSpec: SourceKindSpec = {
  kind: 'white-noise',
  label: 'white noise',
  summary:
    'Angle random walk (deg/√h) or a noise density (deg/s/√Hz for a gyro, m/s/√Hz for a speed sensor; two-sided ' +
    'unless marked one-sided), or a per-sample sigma at the output rate (deg/s, m/s, m, deg).',
  parameters: [
    { field: 'value', label: 'magnitude', dimensions: ['angle-random-walk', 'angular-rate', 'length-random-walk', 'speed', 'length', 'angle'], range: '>= 0', required: true },
    { field: 'rate', label: 'output rate (per-sample sigma only)', dimensions: ['frequency'], range: '> 0', required: false },
  ],
  idBase: 'noise',
  option: {
    field: 'densitySides', label: 'density sides',
    choices: [{ value: 'two', label: 'two-sided' }, { value: 'one', label: 'one-sided' }],
    fallback: () => 'two',
    appliesTo: (dim, current) => dim === 'angle-random-walk' || dim === 'velocity-random-walk' || current !== undefined,
  },
};

/** How a sensor accepts white noise: a density dimension (dead-reckoning inputs) and a per-sample one. */
export interface WhiteNoiseForms {
  density?: DimensionName;
  perSample: DimensionName;
}

/** White noise in SI: the continuous PSD (dead-reckoning inputs) and the per-sample variance. */
export interface ResolvedWhiteNoise {
  /** Two-sided PSD, SI unit squared per hertz (e.g. rad²/s for a rate noise). */
  psdSI: number;
  /** Variance of one output sample at `rateHz`. */
  perSampleVarianceSI: number;
  rateHz: number;
  derivation: string;
  conversions: ConversionStep[];
}

/**
 * Resolves a white-noise row (IEEE Std 952 two-sided convention: a rate noise
 * of two-sided PSD N² has angle random walk N, and N = σ_d/√f_s for a
 * per-sample sigma σ_d at rate f_s; docs/checks.md §2). A density marked
 * one-sided is divided by √2.
 * @throws InputError for a negative value or a unit of neither accepted dimension.
 */
export function resolveWhiteNoise(row: SourceInput, forms: WhiteNoiseForms, sensorRateHz: number, path: string): ResolvedWhiteNoise {
  const conversions: ConversionStep[] = [];
  const allowed = forms.density ? [forms.density, forms.perSample] : [forms.perSample];
  const dim = pickDimension(row.value, allowed, `${path}.value`);
  const v = readMagnitude(row.value, dim, `${path}.value`, conversions);
  if (dim === forms.density) {
    const oneSided = row.densitySides === 'one';
    const coefficient = oneSided ? v / Math.SQRT2 : v;
    const psdSI = coefficient * coefficient;
    const rateHz = rowRateHz(row, sensorRateHz, path, conversions);
    const derivation = oneSided
      ? `one-sided density ${formatSignificant(v, 6)} / √2 = ${formatSignificant(coefficient, 6)}; PSD = coefficient²`
      : `PSD = coefficient² (two-sided, IEEE Std 952)`;
    return { psdSI, perSampleVarianceSI: psdSI * rateHz, rateHz, derivation, conversions };
  }
  const rateHz = rowRateHz(row, sensorRateHz, path, conversions);
  return {
    psdSI: (v * v) / rateHz,
    perSampleVarianceSI: v * v,
    rateHz,
    derivation: `per-sample sigma ${formatSignificant(v, 6)} at ${rateHz} Hz: variance σ², PSD σ²/f_s`,
    conversions,
  };
}
