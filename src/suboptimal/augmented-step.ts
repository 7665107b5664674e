/**
 * Φ and Q_d of the augmented state z = [x; e] of a suboptimal-filter
 * analysis, where x holds the truth's error states that reach e (n_x of n_t) and e = x̂ − T x the
 * filter's estimation error in its own states (n_f). Over one step
 *   x⁺ = Φ_t x + w,   x̂⁻ = Φ_f x̂   =>   e⁻ = Φ_f e + (Φ_f T − T Φ_t) x − T w,
 * so Φ_a = [[Φ_t, 0], [Φ_f T − T Φ_t, Φ_f]] and each truth source's
 * Q_a = [I; −T] Q_d [I; −T]ᵀ (Gelb, Applied Optimal Estimation, 1974,
 * §7.2, here in error form; Maybeck, vol. 1, 1979, ch. 6; Brown and Hwang, ch. 6).
 * Φ_t, Φ_f and Q_d come from the engine's own discretisation (Van Loan).
 */
import type { SparseEntries, StepDiscretisation } from '../covariance/discretise-step';
import { propagationKernel, type PropagationKernel } from '../covariance/compiled-propagation';
import { toSparseRows, type SparseRows } from '../covariance/sparse-rows';
import type { CarriedStates } from './carried-states';

/** One step of the augmented model. */
export interface AugmentedStep {
  phi: SparseRows;
  propagate: PropagationKernel;
  /** Q_a of each truth source, sparse over the n_a x n_a matrix. */
  qdBySource: SparseEntries[];
  qdTotal: SparseEntries;
}

/** Builds augmented steps from truth and filter discretisations, reusing them while both stay the same. */
export class AugmentedSteps {
  private readonly cache = new Map<StepDiscretisation, { filter: StepDiscretisation; phiT: Float64Array; phiF: Float64Array; qT: Float64Array; step: AugmentedStep }>();
  private readonly nt: number;
  private readonly nx: number;

  /**
   * @param truthMap T, row-major n_f x n_t.
   * @param carried the truth states x carries (see carried-states.ts).
   */
  constructor(nt: number, private readonly nf: number, private readonly truthMap: Float64Array, private readonly carried: CarriedStates) {
    this.nt = nt;
    this.nx = carried.index.length;
  }

  /** The augmented step of a truth step and the filter step over the same piece of time. */
  get(truth: StepDiscretisation, filter: StepDiscretisation): AugmentedStep {
    const hit = this.cache.get(truth);
    // Ramp discretisers reuse one object with new values, so a hit must also match the values.
    if (hit && hit.filter === filter && same(hit.phiT, truth.phi.val) && same(hit.phiF, filter.phi.val) && same(hit.qT, truth.qdTotal)) return hit.step;
    const step = this.build(truth, filter);
    this.cache.set(truth, { filter, phiT: truth.phi.val.slice(), phiF: filter.phi.val.slice(), qT: truth.qdTotal.slice(), step });
    return step;
  }

  private build(truth: StepDiscretisation, filter: StepDiscretisation): AugmentedStep {
    const { nt, nf, nx } = this;
    const na = nx + nf, at = this.carried.index;
    const phiT = dense(truth.phi), phiF = dense(filter.phi), T = this.truthMap;
    const a = new Float64Array(na * na);
    for (let i = 0; i < nx; i++) for (let j = 0; j < nx; j++) a[i * na + j] = phiT[at[i] * nt + at[j]];
    for (let i = 0; i < nf; i++) {
      for (let j = 0; j < nf; j++) a[(nx + i) * na + nx + j] = phiF[i * nf + j];
      // (Φ_f T − T Φ_t)[i][j] on the carried columns (the others are zero: carried-states.ts)
      for (let c = 0; c < nx; c++) {
        const j = at[c];
        let d = 0;
        for (let k = 0; k < nf; k++) d += phiF[i * nf + k] * T[k * nt + j];
        for (let k = 0; k < nt; k++) d -= T[i * nt + k] * phiT[k * nt + j];
        a[(nx + i) * na + c] = d;
      }
    }
    // Exact non-zeros only: an exactly zero coupling (filter = truth) costs nothing.
    const phi = toSparseRows(a, na, new Uint8Array(na * na).fill(1));
    const qdBySource = truth.qdBySource.map((q) => this.augmentNoise(q));
    const total = new Float64Array(nt * nt);
    for (const q of truth.qdBySource) for (let e = 0; e < q.index.length; e++) total[q.index[e]] += q.val[e];
    return { phi, propagate: propagationKernel(phi), qdBySource, qdTotal: this.augmentNoise(sparseOf(total)) };
  }

  /** [S; −T] Q [S; −T]ᵀ as sparse entries over n_a x n_a, S selecting the carried truth states. */
  private augmentNoise(q: SparseEntries): SparseEntries {
    const { nt, nf, nx } = this;
    const na = nx + nf, T = this.truthMap, pos = this.carried.position;
    // g = [S; −T] Q, n_a x n_t
    const g = new Float64Array(na * nt);
    for (let e = 0; e < q.index.length; e++) {
      const i = Math.floor(q.index[e] / nt), j = q.index[e] % nt;
      if (pos[i] >= 0) g[pos[i] * nt + j] += q.val[e];
      for (let r = 0; r < nf; r++) if (T[r * nt + i] !== 0) g[(nx + r) * nt + j] -= T[r * nt + i] * q.val[e];
    }
    const out = new Float64Array(na * na);
    for (let r = 0; r < na; r++) {
      for (let j = 0; j < nt; j++) {
        const v = g[r * nt + j];
        if (v === 0) continue;
        if (pos[j] >= 0) out[r * na + pos[j]] += v;
        for (let c = 0; c < nf; c++) if (T[c * nt + j] !== 0) out[r * na + nx + c] -= v * T[c * nt + j];
      }
    }
    return sparseOf(out);
  }
}

function same(a: Float64Array, b: Float64Array): boolean {
  if (a.length !== b.length) return false;
  for (let i = 0; i < a.length; i++) if (a[i] !== b[i]) return false;
  return true;
}

function dense(m: SparseRows): Float64Array {
  const out = new Float64Array(m.n * m.n);
  for (let i = 0; i < m.n; i++) for (let p = m.rowStart[i]; p < m.rowStart[i + 1]; p++) out[i * m.n + m.col[p]] = m.val[p];
  return out;
}


function sparseOf(dense: Float64Array): SparseEntries {
  const index: number[] = [], val: number[] = [];
  for (let e = 0; e < dense.length; e++) if (dense[e] !== 0) { index.push(e); val.push(dense[e]); }
  return { index: Int32Array.from(index), val: Float64Array.from(val) };
}
