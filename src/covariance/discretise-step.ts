import type { ErrorModel } from './error-model';
import { reachability, toSparseRows, type SparseRows } from './sparse-rows';
import { propagationKernel, type PropagationKernel } from './compiled-propagation';
import { expm } from './matrix-exponential';
import { discretiseVanLoan } from './van-loan';
import { discretiseBySeries } from './series-discretisation';

/** A symmetric matrix's non-zero entries (both triangles), to add into a dense one. */
export interface SparseEntries {
  index: Int32Array;
  val: Float64Array;
}

/** Φ and every source's Q_d over one piece of a step. */
export interface StepDiscretisation {
  phi: SparseRows;
  /** Φ Φᵀ-propagation specialised to Φ's pattern. */
  propagate: PropagationKernel;
  /** Q_d of each source (index = source index), sparse. */
  qdBySource: SparseEntries[];
  /** Q_d of the whole model, dense row-major. */
  qdTotal: Float64Array;
}

/** How Φ and Q_d are computed: Van Loan's block exponential (constant segments), or the equivalent power series (ramps). */
export type DiscretisationMethod = 'van-loan' | 'series';

/**
 * Discretises the model over a piece of length dtS at speed v and turn rate w
 * (constant over the piece), once per noise channel with unit PSD; Q_d is
 * linear in the PSD, so each source's Q_d is its PSDs times its channels'
 * unit Q_d (docs/planar-model.md §4: never slice a total Q_d). Van Loan's method by
 * default; `series` evaluates the same integrals by power series, cheaper
 * when F changes every step (speed ramps).
 */
export function discretiseStep(
  model: ErrorModel, speedMps: number, turnRateRadps: number, dtS: number, method: DiscretisationMethod = 'van-loan',
  pattern?: Uint8Array,
): StepDiscretisation {
  const n = model.states.length;
  const f = model.dynamics(speedMps, turnRateRadps);
  // A fixed pattern keeps every stored entry it allows, zero or not, so discretisations at
  // different speeds share one sparse structure (see ramp-discretisation.ts).
  const reach = pattern ?? reachability(f, n);
  const { phiDense, unitQd } = method === 'series' ? bySeries(model, f, dtS) : byVanLoan(model, f, dtS);
  unitQd.forEach((qd, c) => {
    // Q_d[i][j] can be non-zero only where both i and j are reached from the channel's state.
    const s = model.channels[c].stateIndex;
    for (let i = 0; i < n; i++) {
      for (let j = 0; j < n; j++) if (!reach[i * n + s] || !reach[j * n + s]) qd[i * n + j] = 0;
    }
  });
  const qdTotal = new Float64Array(n * n);
  const qdBySource = model.sources.map((src) => {
    const qd = new Float64Array(n * n);
    for (const piece of src.noise) {
      if (piece.onlyWhileMoving && !(speedMps > 0)) continue;
      const unit = unitQd[piece.channel];
      for (let e = 0; e < n * n; e++) qd[e] += piece.psdSI * unit[e];
    }
    for (let e = 0; e < n * n; e++) qdTotal[e] += qd[e];
    return sparseEntries(qd, pattern && structuralMask(model, src, reach));
  });
  const phi = toSparseRows(phiDense, n, reach, pattern !== undefined);
  return { phi, propagate: propagationKernel(phi), qdBySource, qdTotal };
}

function byVanLoan(model: ErrorModel, f: Float64Array, dtS: number): { phiDense: Float64Array; unitQd: Float64Array[] } {
  const n = model.states.length;
  const unitQd = model.channels.map((ch) => {
    const gqg = new Float64Array(n * n);
    gqg[ch.stateIndex * n + ch.stateIndex] = 1;
    return discretiseVanLoan(f, gqg, n, dtS).qd;
  });
  return { phiDense: expm(f.map((x) => x * dtS), n), unitQd };
}

function bySeries(model: ErrorModel, f: Float64Array, dtS: number): { phiDense: Float64Array; unitQd: Float64Array[] } {
  const { phi, unitQd } = discretiseBySeries(f, model.states.length, dtS, model.channels.map((c) => c.stateIndex));
  return { phiDense: phi, unitQd };
}

/** Entries of a source's Q_d that can be non-zero: both states reached from one of its channels. */
function structuralMask(model: ErrorModel, src: ErrorModel['sources'][number], reach: Uint8Array): Uint8Array {
  const n = model.states.length;
  const mask = new Uint8Array(n * n);
  for (const piece of src.noise) {
    const c = model.channels[piece.channel].stateIndex;
    for (let i = 0; i < n; i++) for (let j = 0; j < n; j++) if (reach[i * n + c] && reach[j * n + c]) mask[i * n + j] = 1;
  }
  return mask;
}

/** The non-zero entries of a dense matrix, or every entry `keep` allows when given. */
function sparseEntries(dense: Float64Array, keep?: Uint8Array): SparseEntries {
  const index: number[] = [];
  const val: number[] = [];
  for (let e = 0; e < dense.length; e++) {
    if (keep ? keep[e] : dense[e] !== 0) {
      index.push(e);
      val.push(dense[e]);
    }
  }
  return { index: Int32Array.from(index), val: Float64Array.from(val) };
}
