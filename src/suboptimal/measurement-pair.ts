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
export function measurementPair(truth: ScheduledMeasurement, filter: ScheduledMeasurement | undefined, map: SparseTruthMap, g: Float64Array): MeasurementPair {
  if (!filter || filter.key !== truth.key) {
    throw new InputError('sensors', `the filter's measurements do not match the truth's at ${truth.key} (t = ${truth.tS} s)`);
  }
  const nt = map.nt;
  const touched: number[] = [];
  const add = (i: number, v: number) => {
    if (g[i] === 0) touched.push(i);
    g[i] += v;
  };
  for (let p = 0; p < truth.hIdx.length; p++) add(truth.hIdx[p], -truth.hVal[p]);
  for (let p = 0; p < filter.hIdx.length; p++) {
    const j = filter.hIdx[p], h = filter.hVal[p];
    add(nt + j, h);
    for (const i of map.truthOf[j]) add(i, h);
  }
  touched.sort((a, b) => a - b);
  const kept = touched.filter((i) => g[i] !== 0);
  const gIdx = Int32Array.from(kept), gVal = Float64Array.from(kept, (i) => g[i]);
  for (const i of touched) g[i] = 0;
  return { truth, filter, gIdx, gVal };
}

/** T (0/1 entries) by filter state: the truth states each stands for. */
export interface SparseTruthMap {
  nt: number;
  truthOf: number[][];
}

/** The sparse form of T (row-major n_f x n_t). */
export function sparseTruthMap(truthMap: Float64Array, nt: number, nf: number): SparseTruthMap {
  return { nt, truthOf: Array.from({ length: nf }, (_, j) => Array.from({ length: nt }, (_, i) => i).filter((i) => truthMap[j * nt + i] !== 0)) };
}

/** Renumbers g from [x (all n_t truth states); e] to [x (carried only); e]; g must vanish on dropped states. */
export function carryPair(pair: MeasurementPair, position: Int32Array, nt: number, nx: number): void {
  for (let p = 0; p < pair.gIdx.length; p++) {
    const i = pair.gIdx[p];
    pair.gIdx[p] = i < nt ? position[i] : i - nt + nx;
  }
}
