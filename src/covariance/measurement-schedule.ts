import type { ErrorModel, MeasurementNoisePiece, MeasurementStream } from './error-model';
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
 * The scalar measurements of the mission, generated step by step as the run
 * asks for them (nothing is stored ahead: 64 visible landmarks at 10 Hz
 * would be about a gigabyte): a sensor at rate f measures at t = j/f and is
 * processed at the first boundary at or after t, in sensor order (docs/planar-model.md
 * §5). A geometry error (a landmark on the path) is thrown as the
 * InputError the stream raises, when the run reaches that measurement.
 */
export class MeasurementSchedule {
  private readonly last: number;
  private readonly endS: number;
  private readonly next: number[];
  private readonly rByKey: Map<string, NoiseOwners>;
  private readonly h: Float64Array;
  private readonly due: ScheduledMeasurement[] = [];
  /** cos and sin of the heading at boundary `trigK`: computed once per step, whatever the number of sensors. */
  private trigK = -1;
  private cosPsi = 1;
  private sinPsi = 0;
  /** The last h of each measurement key: an unchanged h (a straight segment) reuses its arrays instead of allocating. */
  private readonly lastH = new Map<string, { hIdx: Int32Array; hVal: Float64Array }>();

  constructor(private readonly model: ErrorModel, private readonly traj: NominalTrajectory) {
    this.last = traj.tS.length - 1;
    this.endS = traj.tS[this.last];
    this.next = model.streams.map(() => 0);
    this.rByKey = noiseByKey(model);
    this.h = new Float64Array(model.states.length);
  }

  /**
   * The measurements processed at boundary k, in order; boundaries must be
   * asked for in increasing k. The returned list is reused by the next call.
   */
  at(k: number): readonly ScheduledMeasurement[] {
    this.due.length = 0;
    this.model.streams.forEach((stream, i) => {
      for (let j = this.next[i]; ; j++) {
        const tS = j / stream.rateHz;
        if (tS > this.endS + TIME_SLACK_S || this.boundaryOf(tS) > k) {
          this.next[i] = j;
          return;
        }
        if (!inOutage(stream.outages, tS)) this.emit(stream, tS, k);
      }
    });
    return this.due;
  }

  private boundaryOf(tS: number): number {
    return Math.min(this.last, Math.max(0, Math.ceil(tS / this.traj.stepS - 1e-9)));
  }

  private emit(stream: MeasurementStream, tS: number, k: number): void {
    const { traj, h } = this;
    const n = h.length;
    const { along, cross } = this.model.core;
    const psi = traj.headingRad[k];
    if (this.trigK !== k) {
      this.trigK = k;
      this.cosPsi = Math.cos(psi);
      this.sinPsi = Math.sin(psi);
    }
    const c = this.cosPsi, s = this.sinPsi;
    for (const row of stream.rowsAt({ northM: traj.northM[k], eastM: traj.eastM[k], headingRad: psi })) {
      h.fill(0);
      // dN = c pA - s pC, dE = s pA + c pC (path frame to north/east).
      h[along] += row.hNorth * c + row.hEast * s;
      h[cross] += -row.hNorth * s + row.hEast * c;
      for (const [idx, coeff] of row.hStates) h[idx] += coeff;
      const r = this.rByKey.get(row.noiseKey) ?? NO_NOISE;
      let count = 0;
      for (let i = 0; i < n; i++) if (h[i] !== 0) count++;
      const { hIdx, hVal } = this.sparseH(row.key, count);
      this.due.push({
        key: row.key, sensorId: stream.sensorId, tS, hIdx, hVal,
        rSources: r.rSources, rVariances: r.rVariances, rTotal: r.rTotal,
      });
    }
  }

  /** The non-zeros of this.h (`count` of them), as the arrays last given for `key` when they are equal. */
  private sparseH(key: string, count: number): { hIdx: Int32Array; hVal: Float64Array } {
    const h = this.h;
    const last = this.lastH.get(key);
    if (last && last.hIdx.length === count) {
      let same = true;
      for (let e = 0; e < count && same; e++) same = h[last.hIdx[e]] === last.hVal[e];
      if (same) return last;
    }
    const hIdx = new Int32Array(count), hVal = new Float64Array(count);
    for (let i = 0, e = 0; i < h.length; i++) if (h[i] !== 0) { hIdx[e] = i; hVal[e++] = h[i]; }
    const made = { hIdx, hVal };
    this.lastH.set(key, made);
    return made;
  }
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

/**
 * Every boundary's measurements at once, for analyses that pair two models'
 * schedules step by step (the suboptimal-filter run); the covariance run itself
 * asks {@link MeasurementSchedule} as it goes and stores nothing ahead.
 */
export function scheduleMeasurements(model: ErrorModel, traj: NominalTrajectory): ScheduledMeasurement[][] {
  const schedule = new MeasurementSchedule(model, traj);
  return Array.from({ length: traj.tS.length }, (_, k) => [...schedule.at(k)]);
}
