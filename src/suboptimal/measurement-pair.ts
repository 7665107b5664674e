/**
 * One scalar measurement seen by the truth and by the filter. With
 * z = h_tᵀ x + v and the filter's prediction h_fᵀ x̂, the innovation is
 * ν = (h_t − Tᵀ h_f)ᵀ x − h_fᵀ e + v = −gᵀ z + v with
 * g = [Tᵀ h_f − h_t; h_f] over z = [x; e] (Gelb, Applied Optimal
 * Estimation, 1974, §7.2, in error form; docs/suboptimal-filter.md).
 */
import { InputError } from '../errors';
import type { ScheduledMeasurement } from '../covariance/measurement-schedule';

/** The truth's and the filter's view of one measurement, and g over the augmented state. */
export interface MeasurementPair {
  truth: ScheduledMeasurement;
  filter: ScheduledMeasurement;
  gIdx: Int32Array;
  gVal: Float64Array;
}

/**
 * Pairs the truth's and the filter's measurement at one boundary.
 * @throws InputError when the two schedules disagree (they come from one suite, so this is a defect).
 */
export function measurementPair(truth: ScheduledMeasurement, filter: ScheduledMeasurement | undefined, truthMap: Float64Array, nt: number, nf: number): MeasurementPair {
  if (!filter || filter.key !== truth.key) {
    throw new InputError('sensors', `the filter's measurements do not match the truth's at ${truth.key} (t = ${truth.tS} s)`);
  }
  const g = new Float64Array(nt + nf);
  for (let p = 0; p < truth.hIdx.length; p++) g[truth.hIdx[p]] -= truth.hVal[p];
  for (let p = 0; p < filter.hIdx.length; p++) {
    const j = filter.hIdx[p], h = filter.hVal[p];
    g[nt + j] += h;
    for (let i = 0; i < nt; i++) g[i] += truthMap[j * nt + i] * h;
  }
  let count = 0;
  for (let i = 0; i < g.length; i++) if (g[i] !== 0) count++;
  const gIdx = new Int32Array(count), gVal = new Float64Array(count);
  for (let i = 0, c = 0; i < g.length; i++) if (g[i] !== 0) { gIdx[c] = i; gVal[c++] = g[i]; }
  return { truth, filter, gIdx, gVal };
}
