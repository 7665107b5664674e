/**
 * The size of a covariance run, estimated from the resolved inputs before
 * anything is allocated: steps, scalar measurements, states, dense source
 * covariances, memory and arithmetic. A budget over a limit is refused with
 * the field to change, so no document can hang the page or exhaust memory.
 *
 * The estimate reads the error model (states, sources, streams and their
 * rates and outages) and the mission's duration and step only; it does not
 * build the measurement schedule, so it stays valid however the run
 * generates its measurements.
 */
import { InputError } from '../errors';
import type { SensorInput } from '../inputs/budget-input';
import type { ErrorModel, MeasurementStream } from './error-model';
import { formatSignificant } from '../units';

/**
 * Limits of one analysis. Common practice, no source: they keep the worst
 * case near a minute of computing and two gigabytes of memory on a laptop,
 * which a browser tab's worker and Node's default heap (a few GB) both
 * hold with room for the result.
 */
export const WORK_LIMITS = {
  /** Steps of the run (a 2-hour mission at 0.01 s). */
  steps: 720_000,
  /** Scalar measurements processed over the mission (a GNSS fix is two, a landmark's range and bearing two). */
  measurements: 5_000_000,
  /** Bytes of the run's arrays and recorded series. */
  bytes: 2e9,
  /** Covariance entries updated over the run: (steps + measurements) x dense covariances x states². */
  entryUpdates: 2e9,
} as const;

/** Bytes one scheduled scalar measurement holds while the run needs it (object, H and R arrays), measured order of magnitude. */
const BYTES_PER_MEASUREMENT = 400;
/** Float64 series recorded per source and step: 5 covariance entries, 7 contributions. */
const SERIES_PER_SOURCE = 12;

/** One aiding stream's share of the measurements. */
export interface StreamWork {
  sensorId: string;
  /** Index of the sensor in the input's `sensors`. */
  sensorIndex: number;
  rateHz: number;
  /** Scalar measurements per update (an upper bound: every landmark in view). */
  rowsPerUpdate: number;
  measurements: number;
}

/** The estimated size of a run. */
export interface WorkEstimate {
  steps: number;
  states: number;
  sources: number;
  /** Covariances carried as dense n x n matrices, the total included. */
  denseCovariances: number;
  measurements: number;
  streams: StreamWork[];
  bytes: number;
  entryUpdates: number;
}

/** Time outside every outage within [0, durationS], s. */
function timeInView(stream: MeasurementStream, durationS: number): number {
  const out = stream.outages.reduce((sum, o) => sum + Math.max(0, Math.min(o.endS, durationS) - Math.max(o.startS, 0)), 0);
  return Math.max(0, durationS - out);
}

/** Scalar rows per update: every landmark's observables when the sensor has landmarks, else the rows at the start pose. */
function rowsPerUpdate(stream: MeasurementStream, sensor: SensorInput | undefined): number {
  if (sensor?.landmarks?.length) return sensor.landmarks.length * (sensor.observables === 'range' || sensor.observables === 'bearing' ? 1 : 2);
  try {
    return Math.max(1, stream.rowsAt({ northM: 0, eastM: 0, headingRad: 0 }).length);
  } catch {
    return 2;
  }
}

/**
 * Estimates the size of a run of `model` over `durationS` at `stepS`
 * (`contributions: false` carries the total alone). Throws nothing.
 */
export function estimateWork(
  model: ErrorModel, sensors: SensorInput[], durationS: number, stepS: number, options: { contributions?: boolean } = {},
): WorkEstimate {
  const steps = Math.ceil(durationS / stepS) + 1;
  const n = model.states.length;
  const contributions = options.contributions !== false;
  const dense = 1 + (contributions ? model.sources.filter((s) => s.noise.length > 0 || s.measurementNoise.length > 0).length : 0);
  const S = contributions ? model.sources.length : 0;
  const streams = model.streams.map((stream) => {
    const sensorIndex = sensors.findIndex((s) => s.id === stream.sensorId);
    const perUpdate = rowsPerUpdate(stream, sensors[sensorIndex]);
    const updates = Math.floor(timeInView(stream, durationS) * stream.rateHz) + 1;
    return { sensorId: stream.sensorId, sensorIndex, rateHz: stream.rateHz, rowsPerUpdate: perUpdate, measurements: updates * perUpdate };
  });
  const measurements = streams.reduce((a, s) => a + s.measurements, 0);
  const bytes = 8 * (dense * n * n + steps * ((S + 1) * SERIES_PER_SOURCE + n + 6)) + measurements * BYTES_PER_MEASUREMENT;
  return { steps, states: n, sources: model.sources.length, denseCovariances: dense, measurements, streams, bytes, entryUpdates: (steps + measurements) * dense * n * n };
}

const fmt = (x: number) => formatSignificant(x, 2);
const gigabytes = (bytes: number) => `${fmt(bytes / 1e9)} GB`;

/** The stream with most measurements, with the path of its rate. */
function busiest(est: WorkEstimate): StreamWork | undefined {
  return [...est.streams].sort((a, b) => b.measurements - a.measurements)[0];
}

/** The sensor whose rows own most states (through their initial variance or noise), for a model too large. */
function largestSensorPath(model: ErrorModel, sensors: SensorInput[]): string {
  const owned = new Map<string, Set<number>>();
  for (const src of model.sources) {
    const set = owned.get(src.sensorId) ?? new Set<number>();
    for (const p of src.initialVariance) set.add(p.state);
    for (const p of src.noise) set.add(model.channels[p.channel].stateIndex);
    owned.set(src.sensorId, set);
  }
  const [id] = [...owned.entries()].filter(([k]) => k !== 'mission').sort((a, b) => b[1].size - a[1].size)[0] ?? [];
  const index = sensors.findIndex((s) => s.id === id);
  return index >= 0 ? `sensors[${index}].sources` : 'sensors';
}

/**
 * Refuses a run over {@link WORK_LIMITS}.
 * @throws InputError naming the field to change: `step` for too many steps,
 *   the busiest aiding sensor's `rate` for too many measurements, the
 *   sensor with most states' `sources` for a model too large to hold.
 */
export function refuseExcessiveWork(est: WorkEstimate, model: ErrorModel, sensors: SensorInput[]): void {
  const L = WORK_LIMITS;
  if (est.steps > L.steps) {
    throw new InputError('step.value', `${fmt(est.steps)} steps over the mission is more than the limit of ${L.steps}; use a longer step`);
  }
  const top = busiest(est);
  const streamText = (s: StreamWork) => `${fmt(s.rateHz)} Hz` + (s.rowsPerUpdate > 2 ? ` with ${s.rowsPerUpdate} scalar measurements per update` : '');
  if (top && est.measurements > L.measurements) {
    throw new InputError(`sensors[${top.sensorIndex}].rate`, `${streamText(top)} gives ${fmt(top.measurements)} scalar measurements over the mission${est.measurements > top.measurements ? ` (${fmt(est.measurements)} in all)` : ''}; the limit is ${fmt(L.measurements)}: lower the rate (a filter rarely needs more than 10 Hz of aiding)`);
  }
  const stateBytes = 8 * est.denseCovariances * est.states * est.states;
  if (est.bytes > L.bytes) {
    if (stateBytes > est.bytes / 2) {
      throw new InputError(largestSensorPath(model, sensors), `${est.states} states with ${est.denseCovariances} noise sources would need ${gigabytes(est.bytes)} of memory; the limit is ${gigabytes(L.bytes)}: fewer state rows (multipath or bias rows as "folded"), fewer sensors`);
    }
    if (top && top.measurements * BYTES_PER_MEASUREMENT > est.bytes / 2) {
      throw new InputError(`sensors[${top.sensorIndex}].rate`, `${streamText(top)} gives ${fmt(top.measurements)} scalar measurements, ${gigabytes(est.bytes)} of memory; the limit is ${gigabytes(L.bytes)}: lower the rate`);
    }
    throw new InputError('step.value', `${fmt(est.steps)} steps with ${est.sources} sources would need ${gigabytes(est.bytes)} of memory; the limit is ${gigabytes(L.bytes)}: use a longer step`);
  }
  if (est.entryUpdates > L.entryUpdates) {
    const field = top && top.measurements > est.steps ? `sensors[${top.sensorIndex}].rate` : largestSensorPath(model, sensors);
    throw new InputError(field, `${est.states} states, ${est.denseCovariances} noise sources, ${fmt(est.steps)} steps and ${fmt(est.measurements)} scalar measurements are about ${fmt(est.entryUpdates)} covariance-entry updates (many minutes of computing); the limit is ${fmt(L.entryUpdates)}: lower the rate, use a longer step or fewer state rows`);
  }
}
