import type { DiscretisationProvider } from '../covariance/run-covariance';
import type { SparseEntries, StepDiscretisation } from '../covariance/discretise-step';
import { expm } from '../covariance/matrix-exponential';
import { reachability, toSparseRows } from '../covariance/sparse-rows';
import { propagationKernel } from '../covariance/compiled-propagation';
import type { ResolvedSegment } from '../mission/resolve-mission';
import type { InertialModel } from './inertial-model';
import type { NominalRow } from './inertial-trajectory';
import { inertialDynamics, noiseColumn, noiseColumnKey } from './inertial-dynamics';
import { addRankOneQd, seriesVectors } from './rank-one-series';

/**
 * Φ and per-source Q_d of the inertial model for every step, with F from the
 * nominal row at the step's start (the convention of the reference values in
 * docs/reference-scenarios.md).
 *
 * On a segment of constant speed with no turn, F changes only through the
 * latitude and height in the Earth-rate and transport-rate terms; those are
 * held at the segment's first step (docs/inertial-model.md §10 allows it), so
 * one discretisation serves every full step of the segment. The effect on the
 * reference scenarios is below 1e-4 relative (tested against recomputing
 * every step). Turns and speed ramps are discretised at every step.
 */
export class InertialDiscretisation implements DiscretisationProvider {
  private readonly held = new Map<number, StepDiscretisation>();

  constructor(
    private readonly model: InertialModel, private readonly rows: readonly NominalRow[],
    private readonly segments: readonly ResolvedSegment[], private readonly stepS: number,
    /** Test switch: recompute F at every step, never holding it over a segment. */
    private readonly everyStep = false,
  ) {}

  forStep(k: number): StepDiscretisation[] {
    const start = this.rows[k - 1];
    const lengthS = this.rows[k].tS - start.tS;
    const seg = this.segments[start.segmentIndex];
    const constant = seg.speedStartMps === seg.speedEndMps && seg.turnRateRadps === 0;
    if (this.everyStep || !constant || Math.abs(lengthS - this.stepS) > 1e-9 * this.stepS) {
      return [discretiseInertialStep(this.model, start, lengthS)];
    }
    let d = this.held.get(start.segmentIndex);
    if (!d) this.held.set(start.segmentIndex, (d = discretiseInertialStep(this.model, start, lengthS)));
    return [d];
  }
}

/**
 * Φ = e^{F h} (Higham's scaling and squaring, ../covariance/matrix-exponential.ts)
 * and each source's Q_d over a step of length hS with F held at `row`; each
 * distinct noise column is integrated once (unit PSD) and scaled by each
 * source's PSDs, since Q_d is linear in the PSD (docs/planar-model.md §4).
 */
export function discretiseInertialStep(model: InertialModel, row: NominalRow, hS: number): StepDiscretisation {
  const n = model.states.length;
  const f = inertialDynamics(model, row);
  const fh = f.map((x) => x * hS);
  const unit = new Map<string, Float64Array>();
  const unitQd = (noise: InertialModel['sources'][number]['noise'][number]): Float64Array => {
    const key = noiseColumnKey(noise);
    let q = unit.get(key);
    if (!q) {
      q = new Float64Array(n * n);
      addRankOneQd(seriesVectors(fh, n, noiseColumn(model, noise, row)), n, hS, 1, q);
      unit.set(key, q);
    }
    return q;
  };
  const qdTotal = new Float64Array(n * n);
  const qdBySource: SparseEntries[] = model.sources.map((src) => {
    if (src.noise.length === 0) return { index: new Int32Array(0), val: new Float64Array(0) };
    const qd = new Float64Array(n * n);
    for (const noise of src.noise) {
      const q = unitQd(noise);
      for (let e = 0; e < n * n; e++) qd[e] += noise.psdSI * q[e];
    }
    for (let e = 0; e < n * n; e++) qdTotal[e] += qd[e];
    return nonZeroEntries(qd);
  });
  const phi = toSparseRows(expm(fh, n), n, reachability(f, n));
  // The generated kernel of Φ's pattern, cut into blocks (../covariance/compiled-propagation.ts), cached by
  // pattern: the same numbers as the generic loop, bit for bit, and no slowdown at 21 to 31 states.
  return { phi, propagate: propagationKernel(phi), qdBySource, qdTotal };
}

function nonZeroEntries(dense: Float64Array): SparseEntries {
  const index: number[] = [];
  const val: number[] = [];
  for (let e = 0; e < dense.length; e++) if (dense[e] !== 0) { index.push(e); val.push(dense[e]); }
  return { index: Int32Array.from(index), val: Float64Array.from(val) };
}
