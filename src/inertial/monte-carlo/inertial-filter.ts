import { scalarJosephUpdate } from '../../simulation/scalar-joseph-update';
import { inertialDynamics, noiseColumn } from '../inertial-dynamics';
import type { InertialModel, InertialNoise } from '../inertial-model';
import type { NominalRow } from '../inertial-trajectory';
import { addRankOneQd, seriesVectors } from '../rank-one-series';

/** Most terms of the exponential series of Φ (the inertial dynamics are nearly nilpotent over a step). */
const MAX_TERMS = 40;

/**
 * The covariance half of the 3-D extended Kalman filter: the budget's error
 * model (docs/inertial-model.md §3-§4) with F and the noise columns evaluated
 * at the filter's own solution (its attitude, velocity and corrected IMU
 * outputs) each step, not at the nominal path. Φ = e^{FΔ} by its series
 * (stopped when a term is below 1e-17 of the sum, as rank-one-series.ts does),
 * Q_d per noise column by the series of rank-one-series.ts; updates are
 * scalar and in Joseph form (docs/planar-model.md §6).
 */
export class InertialFilter {
  /** Covariance of the error state, row-major n x n. */
  readonly p: Float64Array;
  /** Gain of the last update. */
  readonly gain: Float64Array;
  private readonly n: number;
  private readonly phi: Float64Array;
  private readonly term: Float64Array;
  private readonly next: Float64Array;
  private readonly scratch: Float64Array;
  private readonly qd: Float64Array;
  private readonly u: Float64Array;
  private readonly noises: InertialNoise[];

  constructor(private readonly model: InertialModel, private readonly initialVariance: Float64Array) {
    const n = (this.n = model.states.length);
    this.p = new Float64Array(n * n);
    this.gain = new Float64Array(n);
    this.phi = new Float64Array(n * n);
    this.term = new Float64Array(n * n);
    this.next = new Float64Array(n * n);
    this.scratch = new Float64Array(n * n);
    this.qd = new Float64Array(n * n);
    this.u = new Float64Array(n);
    this.noises = model.sources.flatMap((s) => s.noise).filter((q) => q.psdSI > 0);
  }

  /** P = P0 (diagonal, the budget's). */
  reset(): void {
    const n = this.n;
    this.p.fill(0);
    for (let i = 0; i < n; i++) this.p[i * n + i] = this.initialVariance[i];
  }

  /** P ← Φ P Φᵀ + Q_d over dtS, F and the noise columns at the filter's own solution `estimate`. */
  propagate(estimate: NominalRow, dtS: number): void {
    const { n, phi, term, next, scratch, qd, p } = this;
    const fh = inertialDynamics(this.model, estimate);
    for (let e = 0; e < n * n; e++) fh[e] *= dtS;
    // Φ = Σ (FΔ)^j / j!
    phi.fill(0);
    term.fill(0);
    for (let i = 0; i < n; i++) phi[i * n + i] = term[i * n + i] = 1;
    for (let j = 1; j < MAX_TERMS; j++) {
      let largest = 0;
      for (let i = 0; i < n; i++) {
        for (let k = 0; k < n; k++) {
          let s = 0;
          for (let m = 0; m < n; m++) s += fh[i * n + m] * term[m * n + k];
          next[i * n + k] = s / j;
          largest = Math.max(largest, Math.abs(next[i * n + k]));
        }
      }
      term.set(next);
      for (let e = 0; e < n * n; e++) phi[e] += term[e];
      if (largest < 1e-17) break;
    }
    // P ← Φ P Φᵀ (dense: the model has a few dozen states at most).
    for (let i = 0; i < n; i++) {
      for (let k = 0; k < n; k++) {
        let s = 0;
        for (let m = 0; m < n; m++) s += phi[i * n + m] * p[m * n + k];
        scratch[i * n + k] = s;
      }
    }
    for (let i = 0; i < n; i++) {
      for (let k = i; k < n; k++) {
        let s = 0;
        for (let m = 0; m < n; m++) s += scratch[i * n + m] * phi[k * n + m];
        p[i * n + k] = s;
        p[k * n + i] = s;
      }
    }
    qd.fill(0);
    for (const q of this.noises) addRankOneQd(seriesVectors(fh, n, noiseColumn(this.model, q, estimate)), n, dtS, q.psdSI, qd);
    for (let e = 0; e < n * n; e++) p[e] += qd[e];
  }

  /** Scalar Joseph update with sparse h; leaves the gain in {@link gain}. Returns the innovation variance, or 0 (P unchanged). */
  update(hIdx: Int32Array, hVal: Float64Array, r: number): number {
    return scalarJosephUpdate(this.p, this.n, hIdx, hVal, r, this.u, this.gain);
  }
}
