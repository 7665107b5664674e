/**
 * Which truth states the augmented state z = [x; e] has to carry. The
 * filter's error obeys e' = F_f e + (F_f T − T F_t) x − T w, and a
 * measurement adds K (h_t − Tᵀ h_f)ᵀ x; a truth state that enters neither
 * coupling, and feeds no state that does, never reaches e, so it can be
 * dropped from x exactly (its columns of the discrete coupling are zero).
 * With filter = truth nothing is carried and the run costs what the
 * optimal one does. The truth's speed scale factor is kept when the filter
 * has none, since the actual speed error is then that state itself.
 */
import type { ErrorModel } from '../covariance/error-model';
import type { MeasurementPair } from './measurement-pair';

/** The truth states carried in x: their truth indices, and each truth index's position in x (−1 when dropped). */
export interface CarriedStates {
  index: Int32Array;
  position: Int32Array;
}

/**
 * The carried truth states. F is affine in speed and turn rate, so its
 * values at (0, 0), (1, 0) and (0, 1) show every entry that can be non-zero.
 * @param couplings the measurement pairs' g over [x (all n_t truth states); e].
 */
export function carriedStates(truth: ErrorModel, filter: ErrorModel, truthMap: Float64Array, couplings: Iterable<Int32Array>): CarriedStates {
  const nt = truth.states.length, nf = filter.states.length;
  const keep = new Uint8Array(nt);
  const points: [number, number][] = [[0, 0], [1, 0], [0, 1]];
  const ft = points.map(([v, w]) => truth.dynamics(v, w)), ff = points.map(([v, w]) => filter.dynamics(v, w));
  for (let p = 0; p < points.length; p++) {
    for (let j = 0; j < nt; j++) {
      for (let i = 0; i < nf && !keep[j]; i++) {
        let d = 0;
        for (let k = 0; k < nf; k++) d += ff[p][i * nf + k] * truthMap[k * nt + j];
        for (let k = 0; k < nt; k++) d -= truthMap[i * nt + k] * ft[p][k * nt + j];
        if (d !== 0) keep[j] = 1;
      }
    }
  }
  for (const g of couplings) for (const i of g) if (i < nt) keep[i] = 1;
  if (filter.core.speedScale < 0 && truth.core.speedScale >= 0) keep[truth.core.speedScale] = 1;
  // Close under "feeds": a state driving a carried state is carried too.
  for (let changed = true; changed;) {
    changed = false;
    for (let j = 0; j < nt; j++) {
      if (!keep[j]) continue;
      for (let i = 0; i < nt; i++) if (!keep[i] && ft.some((f) => f[j * nt + i] !== 0)) { keep[i] = 1; changed = true; }
    }
  }
  const index = Int32Array.from(Array.from(keep.keys()).filter((i) => keep[i]));
  const position = new Int32Array(nt).fill(-1);
  index.forEach((i, p) => (position[i] = p));
  return { index, position };
}

/** The g indices of every pair, for {@link carriedStates}. */
export function* couplingIndices(pairs: MeasurementPair[][]): Iterable<Int32Array> {
  for (const list of pairs) for (const p of list) yield p.gIdx;
}
