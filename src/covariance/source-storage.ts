import type { ModelSource } from './error-model';

/** What storage needs to know of a source: its P0 entries, and whether it owns any Q or R. */
export type StoredSource = Pick<ModelSource, 'initialVariance'> & { noise: readonly unknown[]; measurementNoise: readonly unknown[] };

/** The states and sources a run stores (the planar ErrorModel is one). */
export interface StoredModel {
  states: { length: number };
  sources: readonly StoredSource[];
}

/**
 * Where each source's covariance lives during a run: a dense n x n matrix
 * (sources with process or measurement noise), or a few rank-one factors ψ
 * with P_s = Σ ψ ψᵀ (sources that own initial variance only).
 */
export interface SourceStorage {
  /** Per source: dense matrix slot (1-based after the total) or -1. */
  denseSlot: Int32Array;
  /** Per source: first vector index and how many vectors (0 for dense sources). */
  firstVector: Int32Array;
  vectorCount: Int32Array;
  /** Dense slots in use, the total included. */
  denseCount: number;
  vectors: number;
  /** For each dense slot after the total, the source it holds. */
  denseSources: number[];
}

/** Decides the storage of every source; `contributions: false` keeps the total only. */
export function planSourceStorage(model: StoredModel, contributions: boolean): SourceStorage {
  const S = model.sources.length;
  const plan: SourceStorage = {
    denseSlot: new Int32Array(S).fill(-1), firstVector: new Int32Array(S), vectorCount: new Int32Array(S),
    denseCount: 1, vectors: 0, denseSources: [],
  };
  if (!contributions) return plan;
  model.sources.forEach((src, s) => {
    const initialOnly = src.noise.length === 0 && src.measurementNoise.length === 0;
    if (initialOnly) {
      plan.firstVector[s] = plan.vectors;
      plan.vectorCount[s] = src.initialVariance.length;
      plan.vectors += src.initialVariance.length;
    } else {
      plan.denseSlot[s] = plan.denseCount++;
      plan.denseSources.push(s);
    }
  });
  return plan;
}

/** Fills the dense matrices and vectors with each source's P0 (and the total with all of them). */
export function initialiseStorage(model: StoredModel, plan: SourceStorage, mats: Float64Array, vecs: Float64Array, contributions: boolean): void {
  const n = model.states.length, nn = n * n;
  model.sources.forEach((src, s) => {
    src.initialVariance.forEach(({ state, varianceSI }, j) => {
      mats[state * n + state] += varianceSI;
      if (!contributions) return;
      if (plan.denseSlot[s] >= 0) mats[plan.denseSlot[s] * nn + state * n + state] += varianceSI;
      else vecs[(plan.firstVector[s] + j) * n + state] = Math.sqrt(varianceSI);
    });
  });
}

/** P_s[i][j] of a source at the current time. */
export function sourceEntry(plan: SourceStorage, mats: Float64Array, vecs: Float64Array, n: number, s: number, i: number, j: number): number {
  const slot = plan.denseSlot[s];
  if (slot >= 0) return mats[slot * n * n + i * n + j];
  let sum = 0;
  const first = plan.firstVector[s];
  for (let c = first; c < first + plan.vectorCount[s]; c++) sum += vecs[c * n + i] * vecs[c * n + j];
  return sum;
}

/** A source's full P_s, row-major. */
export function sourceMatrix(plan: SourceStorage, mats: Float64Array, vecs: Float64Array, n: number, s: number): Float64Array {
  const p = new Float64Array(n * n);
  for (let i = 0; i < n; i++) for (let j = 0; j < n; j++) p[i * n + j] = sourceEntry(plan, mats, vecs, n, s, i, j);
  return p;
}
