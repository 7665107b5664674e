import { InputError } from '../errors';
import { positiveToSI, quantityToSI } from '../inputs/checks';
import type { SensorInput, SensorKind, SourceInput, SourceKind } from '../inputs/budget-input';
import type { ModelBuilder } from '../covariance/model-builder';
import { TIME_SLACK_S } from '../mission/nominal-trajectory';

/** What the placing of one sensor needs besides the builder. */
export interface SensorContext {
  /** Path of the sensor in the input, e.g. `sensors[2]`. */
  path: string;
  missionDurationS: number;
}

/** What every sensor model file exports. */
export interface SensorKindSpec {
  kind: SensorKind;
  label: string;
  role: 'dead-reckoning' | 'aiding';
  /** One sentence on what the sensor measures or drives in the error-state model, for reports. */
  model: string;
  /** Source kinds its rows may have. */
  sourceKinds: SourceKind[];
  /** Adds the sensor's states, noise and measurements to the model. */
  place(builder: ModelBuilder, sensor: SensorInput, ctx: SensorContext): void;
}

/** The sensor's output or measurement rate in Hz. @throws InputError when missing or not positive. */
export function sensorRateHz(sensor: SensorInput, path: string): number {
  return positiveToSI(sensor.rate, 'frequency', `${path}.rate`);
}

/** Throws unless the row's kind is one this sensor accepts. */
export function checkRowKind(spec: SensorKindSpec, row: SourceInput, path: string): void {
  if (!spec.sourceKinds.includes(row.kind)) {
    throw new InputError(
      `${path}.kind`,
      `a ${spec.label} has no "${String(row.kind)}" source; use one of ${spec.sourceKinds.map((k) => `"${k}"`).join(', ')}`,
    );
  }
}

/**
 * The sensor's outages in seconds, each inside the mission with start < end.
 * @throws InputError naming the outage for one outside the mission or empty.
 */
export function resolveOutages(sensor: SensorInput, ctx: SensorContext): { id: string; startS: number; endS: number }[] {
  const list = sensor.outages ?? [];
  if (!Array.isArray(list)) throw new InputError(`${ctx.path}.outages`, 'must be a list of { start, end }');
  return list.map((o, i) => {
    const p = `${ctx.path}.outages[${i}]`;
    const startS = quantityToSI(o?.start, 'time', `${p}.start`);
    const endS = quantityToSI(o.end, 'time', `${p}.end`);
    if (startS < -TIME_SLACK_S || endS > ctx.missionDurationS + TIME_SLACK_S) {
      throw new InputError(p, `must lie within the mission, 0 to ${ctx.missionDurationS} s; got ${startS} to ${endS} s`);
    }
    if (!(endS > startS)) throw new InputError(p, `end (${endS} s) must be after start (${startS} s)`);
    return { id: o.id ?? `outage ${i + 1}`, startS, endS };
  });
}

/** Throws for a sensor kind that takes no outages but was given some. */
export function refuseOutages(sensor: SensorInput, path: string): void {
  if (sensor.outages !== undefined && sensor.outages.length > 0) {
    throw new InputError(`${path}.outages`, 'only aiding sensors (GNSS, compass, range-bearing) have outages');
  }
}

/** Iterates the rows with their paths, checking each kind against the sensor's list. */
export function eachRow(spec: SensorKindSpec, sensor: SensorInput, ctx: SensorContext, fn: (row: SourceInput, path: string) => void): void {
  const rows = sensor.sources;
  if (!Array.isArray(rows)) throw new InputError(`${ctx.path}.sources`, 'must be a list of error-source rows');
  rows.forEach((row, i) => {
    const path = `${ctx.path}.sources[${i}]`;
    if (!row || typeof row !== 'object') throw new InputError(path, 'must be an error-source row object');
    checkRowKind(spec, row, path);
    fn(row, path);
  });
}
