import type { ErrorModel, MeasurementNoisePiece } from './error-model';
import { TIME_SLACK_S, type NominalTrajectory } from '../mission/nominal-trajectory';

/** One scalar measurement to process at a step boundary, with h in the model's states. */
export interface ScheduledMeasurement {
  key: string;
  sensorId: string;
  /** Measurement time, s (it is processed at the boundary at or after it). */
  tS: number;
  hIdx: Int32Array;
  hVal: Float64Array;
  /** R owned by each source: (source index, variance) pairs. */
  rSources: Int32Array;
  rVariances: Float64Array;
  rTotal: number;
}

/** Whether a measurement at tS falls in a half-open outage [start, end) (docs/planar-model.md §5, 1e-9 s slack). */
export function inOutage(outages: { startS: number; endS: number }[], tS: number): boolean {
  return outages.some((o) => tS >= o.startS - TIME_SLACK_S && tS < o.endS - TIME_SLACK_S);
}

/**
 * Every scalar measurement of the mission, grouped by the step boundary it is
 * processed at: a sensor at rate f measures at t = j/f and is processed at
 * the first boundary at or after t, in sensor order (docs/planar-model.md §5).
 * Built before propagation so that geometry errors (a landmark on the path)
 * are reported as input errors, not from inside the loop.
 */
export function scheduleMeasurements(model: ErrorModel, traj: NominalTrajectory): ScheduledMeasurement[][] {
  const last = traj.tS.length - 1;
  const endS = traj.tS[last];
  const byBoundary: ScheduledMeasurement[][] = Array.from({ length: last + 1 }, () => []);
  const rByKey = noiseByKey(model);
  const n = model.states.length;
  const { along, cross } = model.core;
  const h = new Float64Array(n);
  for (const stream of model.streams) {
    for (let j = 0; ; j++) {
      const tS = j / stream.rateHz;
      if (tS > endS + TIME_SLACK_S) break;
      if (inOutage(stream.outages, tS)) continue;
      const k = Math.min(last, Math.max(0, Math.ceil(tS / traj.stepS - 1e-9)));
      const psi = traj.headingRad[k];
      const c = Math.cos(psi), s = Math.sin(psi);
      const rows = stream.rowsAt({ northM: traj.northM[k], eastM: traj.eastM[k], headingRad: psi });
      for (const row of rows) {
        h.fill(0);
        // dN = c pA - s pC, dE = s pA + c pC (path frame to north/east).
        h[along] += row.hNorth * c + row.hEast * s;
        h[cross] += -row.hNorth * s + row.hEast * c;
        for (const [idx, coeff] of row.hStates) h[idx] += coeff;
        const r = rByKey.get(row.noiseKey) ?? NO_NOISE;
        let count = 0;
        for (let i = 0; i < n; i++) if (h[i] !== 0) count++;
        const hIdx = new Int32Array(count), hVal = new Float64Array(count);
        for (let i = 0, c = 0; i < n; i++) if (h[i] !== 0) { hIdx[c] = i; hVal[c++] = h[i]; }
        byBoundary[k].push({ key: row.key, sensorId: stream.sensorId, tS, hIdx, hVal, ...r });
      }
    }
  }
  return byBoundary;
}

/** R of one measurement key: its owners and their variances (shared by every event of that key). */
export type NoiseOwners = Pick<ScheduledMeasurement, 'rSources' | 'rVariances' | 'rTotal'>;

export const NO_NOISE: NoiseOwners = { rSources: new Int32Array(0), rVariances: new Float64Array(0), rTotal: 0 };

/** Each measurement key's R owners, from every source's R pieces (any model whose sources carry them). */
export function noiseByKey(model: { sources: readonly { measurementNoise: readonly MeasurementNoisePiece[] }[] }): Map<string, NoiseOwners> {
  const lists = new Map<string, { sources: number[]; variances: number[] }>();
  model.sources.forEach((src, s) => {
    for (const piece of src.measurementNoise) {
      const entry = lists.get(piece.measurement) ?? { sources: [], variances: [] };
      entry.sources.push(s);
      entry.variances.push(piece.varianceSI);
      lists.set(piece.measurement, entry);
    }
  });
  const map = new Map<string, NoiseOwners>();
  for (const [key, { sources, variances }] of lists) {
    map.set(key, {
      rSources: Int32Array.from(sources),
      rVariances: Float64Array.from(variances),
      rTotal: variances.reduce((a, b) => a + b, 0),
    });
  }
  return map;
}
