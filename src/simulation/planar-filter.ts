import { scalarJosephUpdate } from './scalar-joseph-update';
import { propagationKernel, type PropagationKernel } from '../covariance/compiled-propagation';
import { reachability, toSparseRows, type SparseRows } from '../covariance/sparse-rows';
import type { PlanarPlan } from './planar-plan';

/**
 * The covariance half of the extended Kalman filter of a planar run: the
 * budget's error-state model (docs/planar-model.md §3, §6) with F evaluated at
 * the filter's own speed and turn rate each step, and position errors in the
 * frame of the filter's own heading (not the nominal path's). Per step
 *   Φ = I + A + A²/2 + A³/6,  A = F Δ,
 *   Q_d = Q Δ + (F Q + Q Fᵀ) Δ²/2 + F Q Fᵀ Δ³/3,
 * the Taylor series of e^{FΔ} and of Van Loan's integral (Van Loan, IEEE
 * Trans. Automatic Control 23(3), 1978); their first neglected terms are
 * O((‖F‖Δ)⁴) and O(‖F‖³Δ⁴), below 1e-8 of P for the planar model at 0.1 s.
 * Updates are scalar and in Joseph form.
 */
export class PlanarFilter {
  /** Covariance of the error state, row-major n × n. */
  readonly p: Float64Array;
  private readonly n: number;
  private readonly fEntries: { i: number; j: number; c0: number; cv: number; cw: number }[];
  private readonly phiPattern: SparseRows;
  /** Columns of F's pattern in each row, and rows of (F²)'s pattern in each column. */
  private readonly aRowCols: Int32Array[];
  private readonly a2ColRows: Int32Array[];
  /** States driven by white noise, with the rows of F that are non-zero in their column. */
  private readonly noiseColumns: { state: number; rows: number[] }[] = [];
  private readonly kernel: PropagationKernel;
  private readonly a: Float64Array;
  private readonly a2: Float64Array;
  private readonly phiDense: Float64Array;
  private readonly phiVal: Float64Array;
  private readonly scratch: Float64Array;
  private readonly u: Float64Array;
  /** Gain of the last update, length n. */
  readonly gain: Float64Array;

  constructor(private readonly plan: PlanarPlan) {
    const n = (this.n = plan.n);
    this.p = new Float64Array(n * n);
    this.fEntries = [];
    const pattern = new Float64Array(n * n);
    for (let e = 0; e < n * n; e++) {
      if (plan.f0[e] !== 0 || plan.fSpeed[e] !== 0 || plan.fTurn[e] !== 0) {
        this.fEntries.push({ i: Math.floor(e / n), j: e % n, c0: plan.f0[e], cv: plan.fSpeed[e], cw: plan.fTurn[e] });
        pattern[e] = 1;
      }
    }
    for (let st = 0; st < n; st++) {
      if (plan.qcAlways[st] === 0 && plan.qcMoving[st] === 0) continue;
      this.noiseColumns.push({ state: st, rows: this.fEntries.filter((f) => f.j === st).map((f) => f.i) });
    }
    this.aRowCols = Array.from({ length: n }, (_, i) => Int32Array.from(this.fEntries.filter((f) => f.i === i).map((f) => f.j)));
    this.a2ColRows = Array.from({ length: n }, (_, j) => {
      const rows: number[] = [];
      for (let i = 0; i < n; i++) if (this.fEntries.some((f) => f.i === i && pattern[f.j * n + j] !== 0)) rows.push(i);
      return Int32Array.from(rows);
    });
    this.phiPattern = toSparseRows(new Float64Array(n * n), n, reachability(pattern, n), true);
    this.kernel = propagationKernel(this.phiPattern);
    this.a = new Float64Array(n * n);
    this.a2 = new Float64Array(n * n);
    this.phiDense = new Float64Array(n * n);
    this.phiVal = new Float64Array(this.phiPattern.col.length);
    this.scratch = new Float64Array(n * n);
    this.u = new Float64Array(n);
    this.gain = new Float64Array(n);
  }

  /** P = P0 (the budget's initial variances, diagonal). */
  reset(): void {
    const n = this.n;
    this.p.fill(0);
    for (let i = 0; i < n; i++) this.p[i * n + i] = this.plan.initialVariance[i];
  }

  /**
   * P ← Φ P Φᵀ + Q_d over dtS at the filter's speed (m/s) and turn rate
   * (rad/s); `moving` false turns off the noise a parked wheel does not have.
   */
  propagate(speedMps: number, turnRateRadps: number, dtS: number, moving: boolean): void {
    const { n, a, a2, phiDense } = this;
    for (const f of this.fEntries) a[f.i * n + f.j] = (f.c0 + f.cv * speedMps + f.cw * turnRateRadps) * dtS;
    // A² and A³ by A's few non-zeros; Φ = I + A + A²/2 + A³/6. Only terms inside A's and A²'s
    // patterns are added: the others are ±0, and adding ±0 to a sum that starts at +0 changes no bit.
    a2.fill(0);
    const { fEntries, aRowCols, a2ColRows } = this;
    for (let q = 0; q < fEntries.length; q++) {
      const f = fEntries[q];
      const v = a[f.i * n + f.j], cols = aRowCols[f.j];
      for (let c = 0; c < cols.length; c++) a2[f.i * n + cols[c]] += v * a[f.j * n + cols[c]];
    }
    for (let e = 0; e < n * n; e++) phiDense[e] = a[e] + 0.5 * a2[e];
    for (let q = 0; q < fEntries.length; q++) {
      const f = fEntries[q];
      const v = a[f.i * n + f.j] / 6, rows = a2ColRows[f.i];
      for (let r = 0; r < rows.length; r++) phiDense[rows[r] * n + f.j] += a2[rows[r] * n + f.i] * v;
    }
    for (let i = 0; i < n; i++) phiDense[i * n + i] += 1;
    const { rowStart, col } = this.phiPattern;
    for (let i = 0; i < n; i++) for (let q = rowStart[i]; q < rowStart[i + 1]; q++) this.phiVal[q] = phiDense[i * n + col[q]];
    this.kernel(this.p, 0, this.phiVal, this.scratch);
    this.addProcessNoise(dtS, moving);
  }

  private addProcessNoise(dtS: number, moving: boolean): void {
    const { n, p, a } = this;
    const { qcAlways, qcMoving } = this.plan;
    for (const { state: s, rows } of this.noiseColumns) {
      const q = (qcAlways[s] + (moving ? qcMoving[s] : 0)) * dtS;
      if (q === 0) continue;
      // Column s of A = F Δ carries F's coupling of the noise on state s.
      p[s * n + s] += q;
      for (const i of rows) {
        const ai = a[i * n + s];
        const half = 0.5 * q * ai;
        p[i * n + s] += half;
        p[s * n + i] += half;
        for (const j of rows) p[i * n + j] += (q * ai * a[j * n + s]) / 3;
      }
    }
  }

  /**
   * Scalar Joseph update with sparse h (indices, coefficients) and variance r;
   * leaves the gain in {@link gain}. Returns the innovation variance, or 0
   * (and P unchanged) when it is not positive.
   */
  update(hIdx: Int32Array, hVal: Float64Array, count: number, r: number): number {
    return scalarJosephUpdate(this.p, this.n, hIdx.subarray(0, count), hVal.subarray(0, count), r, this.u, this.gain);
  }

  /**
   * Re-expresses P after the filter's heading moved by dAlphaRad: the
   * position error states are along and across the filter's own heading.
   */
  rotateFrame(dAlphaRad: number, along: number, cross: number): void {
    if (dAlphaRad === 0) return;
    const { n, p } = this;
    const c = Math.cos(dAlphaRad), s = Math.sin(dAlphaRad);
    // [a'; x'] = [[c, s], [-s, c]] [a; x], applied to rows then columns.
    for (let j = 0; j < n; j++) {
      const pa = p[along * n + j], px = p[cross * n + j];
      p[along * n + j] = c * pa + s * px;
      p[cross * n + j] = -s * pa + c * px;
    }
    for (let i = 0; i < n; i++) {
      const pa = p[i * n + along], px = p[i * n + cross];
      p[i * n + along] = c * pa + s * px;
      p[i * n + cross] = -s * pa + c * px;
    }
  }
}
