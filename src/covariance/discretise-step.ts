import type { ErrorModel } from './error-model';
import { reachability, toSparseRows, type SparseRows } from './sparse-rows';
import { propagationKernel, type PropagationKernel } from './compiled-propagation';
import { expm } from './matrix-exponential';
import { discretiseVanLoan } from './van-loan';

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

/**
 * Discretises the model over a piece of length dtS at speed v and turn rate w
 * (constant over the piece) by Van Loan's method, once per noise channel with
 * unit PSD; Q_d is linear in the PSD, so each source's Q_d is its PSDs times
 * its channels' unit Q_d (ENGINE.md §4: never slice a total Q_d).
 */
export function discretiseStep(model: ErrorModel, speedMps: number, turnRateRadps: number, dtS: number): StepDiscretisation {
  const n = model.states.length;
  const f = model.dynamics(speedMps, turnRateRadps);
  const reach = reachability(f, n);
  const unitQd = model.channels.map((ch) => {
    const gqg = new Float64Array(n * n);
    gqg[ch.stateIndex * n + ch.stateIndex] = 1;
    const { qd } = discretiseVanLoan(f, gqg, n, dtS);
    // Q_d[i][j] can be non-zero only where both i and j are reached from the channel's state.
    for (let i = 0; i < n; i++) {
      for (let j = 0; j < n; j++) {
        if (!reach[i * n + ch.stateIndex] || !reach[j * n + ch.stateIndex]) qd[i * n + j] = 0;
      }
    }
    return qd;
  });
  const phiDense = expm(f.map((x) => x * dtS), n);
  const qdTotal = new Float64Array(n * n);
  const qdBySource = model.sources.map((src) => {
    const qd = new Float64Array(n * n);
    for (const piece of src.noise) {
      if (piece.onlyWhileMoving && !(speedMps > 0)) continue;
      const unit = unitQd[piece.channel];
      for (let e = 0; e < n * n; e++) qd[e] += piece.psdSI * unit[e];
    }
    for (let e = 0; e < n * n; e++) qdTotal[e] += qd[e];
    return sparseEntries(qd);
  });
  const phi = toSparseRows(phiDense, n, reach);
  return { phi, propagate: propagationKernel(phi), qdBySource, qdTotal };
}

function sparseEntries(dense: Float64Array): SparseEntries {
  const index: number[] = [];
  const val: number[] = [];
  for (let e = 0; e < dense.length; e++) {
    if (dense[e] !== 0) {
      index.push(e);
      val.push(dense[e]);
    }
  }
  return { index: Int32Array.from(index), val: Float64Array.from(val) };
}
