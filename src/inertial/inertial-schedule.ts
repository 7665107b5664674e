import { TIME_SLACK_S } from '../mission/nominal-trajectory';
import { inOutage, noiseByKey, NO_NOISE, type ScheduledMeasurement } from '../covariance/measurement-schedule';
import type { InertialModel } from './inertial-model';
import type { NominalRow } from './inertial-trajectory';

/**
 * Every scalar measurement of a 3-D mission, grouped by the step boundary it
 * is processed at: a sensor at rate f measures at t = j/f and is processed at
 * the first boundary at or after t, in sensor order (docs/planar-model.md §5).
 * Availability (half-open outages), the motion state (ZUPT while v = 0 and
 * v_up = 0; constraints and odometer while v > 0) and H are taken at that
 * boundary (docs/reference-scenarios.md conventions).
 */
export function scheduleInertialMeasurements(model: InertialModel, rows: readonly NominalRow[], stepS: number): ScheduledMeasurement[][] {
  const last = rows.length - 1;
  const endS = rows[last].tS;
  const byBoundary: ScheduledMeasurement[][] = rows.map(() => []);
  const rByKey = noiseByKey(model);
  // An h equal to the last one of its key (a straight segment) shares that key's arrays instead of new ones.
  const lastH = new Map<string, { hIdx: Int32Array; hVal: Float64Array }>();
  for (const stream of model.streams) {
    for (let j = 0; ; j++) {
      const tS = j / stream.rateHz;
      if (tS > endS + TIME_SLACK_S) break;
      const k = Math.min(last, Math.max(0, Math.ceil(tS / stepS - 1e-9)));
      if (inOutage(stream.outages, rows[k].tS)) continue;
      for (const row of stream.rowsAt(rows[k])) {
        const { hIdx, hVal } = sparseRow(row.key, row.h, lastH);
        const r = rByKey.get(row.noiseKey) ?? NO_NOISE;
        byBoundary[k].push({
          key: row.key, sensorId: stream.sensorId, tS, hIdx, hVal,
          rSources: r.rSources, rVariances: r.rVariances, rTotal: r.rTotal,
        });
      }
    }
  }
  return byBoundary;
}

/** The non-zeros of h by increasing state, as the arrays last made for `key` when they hold the same values. */
function sparseRow(
  key: string, h: readonly (readonly [number, number])[], lastH: Map<string, { hIdx: Int32Array; hVal: Float64Array }>,
): { hIdx: Int32Array; hVal: Float64Array } {
  const kept = h.filter(([, x]) => x !== 0).sort((a, b) => a[0] - b[0]);
  const last = lastH.get(key);
  if (last && last.hIdx.length === kept.length && kept.every(([i, x], e) => last.hIdx[e] === i && last.hVal[e] === x)) return last;
  const made = { hIdx: Int32Array.from(kept, ([i]) => i), hVal: Float64Array.from(kept, ([, x]) => x) };
  lastH.set(key, made);
  return made;
}
