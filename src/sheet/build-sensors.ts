/**
 * Evaluated sensors for the engine's input: a sensor whose own cells (rate,
 * range, field of view) fail is left out whole; otherwise only its failed
 * rows, outages and landmarks are.
 */
import type { LandmarkEntry, OutageEntry, RowTuning, SensorEntry, SourceRow } from '../document/budget-document';
import type { LandmarkInput, OutageInput, SensorInput, SourceInput, TuningInput } from '../inputs/budget-input';
import { keepBuilt, type OmittedItem, type QuantityReader } from './cell-reader';

/** Per input sensor, the document index of each row, outage and landmark kept. */
export interface SensorIndexMap {
  sensors: number[];
  sources: number[][];
  outages: number[][];
  landmarks: number[][];
}

/** Row fields copied as they are: the form options and the annotations the engine reads. */
const ROW_OPTIONS = ['biasForm', 'densitySides', 'quantum', 'multipathModel', 'component', 'provenance', 'assumed'] as const;

function buildRow(r: QuantityReader, row: SourceRow, path: string): SourceInput | undefined {
  const value = r.quantity(row, path);
  const times = r.fields(row, path, ['correlationTime', 'rate']);
  const tuning = row.tuning && buildTuning(r, row.tuning, `${path}.tuning`);
  if (value === undefined || times === undefined || tuning === null) return undefined;
  const options = ROW_OPTIONS.filter((k) => row[k] !== undefined).map((k) => [k, row[k]]);
  return { id: row.id, kind: row.kind, value, ...times, ...Object.fromEntries(options), ...(tuning && { tuning }) };
}

/** The filter's design of a row, or null when one of its cells failed (the row is then left out, truth and filter alike). */
function buildTuning(r: QuantityReader, t: RowTuning, path: string): TuningInput | null {
  const cells = r.fields(t, path, ['value', 'correlationTime']);
  if (cells === undefined) return null;
  const flags = (['inflation', 'leftOut', 'model'] as const).filter((k) => t[k] !== undefined).map((k) => [k, t[k]]);
  return { ...cells, ...Object.fromEntries(flags) };
}

function buildOutage(r: QuantityReader, o: OutageEntry, path: string): OutageInput | undefined {
  const span = r.fields(o, path, ['start', 'end']);
  return span && ({ ...(o.id !== undefined && { id: o.id }), ...span } as OutageInput);
}

function buildLandmark(r: QuantityReader, lm: LandmarkEntry, path: string): LandmarkInput | undefined {
  const place = r.fields(lm, path, ['north', 'east']);
  return place && ({ id: lm.id, ...place } as LandmarkInput);
}

/** One sensor, or undefined when one of its own cells failed; records the kept indices of its lists. */
function buildSensor(r: QuantityReader, s: SensorEntry, path: string, omitted: OmittedItem[], map: SensorIndexMap): SensorInput | undefined {
  const own = r.fields(s, path, ['rate', 'maxRange', 'fieldOfView']);
  if (own === undefined) return undefined;
  const kept = { sources: [] as number[], outages: [] as number[], landmarks: [] as number[] };
  const sensor = { id: s.id, kind: s.kind, ...own } as SensorInput;
  if (s.observables !== undefined) sensor.observables = s.observables;
  if (s.landmarks !== undefined) {
    sensor.landmarks = keepBuilt(s.landmarks, `${path}.landmarks`, (lm, p) => buildLandmark(r, lm, p), (lm) => `landmark ${lm.id} of ${s.id}`, omitted, kept.landmarks);
  }
  if (s.outages !== undefined) {
    sensor.outages = keepBuilt(s.outages, `${path}.outages`, (o, p) => buildOutage(r, o, p), (o, i) => `outage ${o.id ?? i + 1} of ${s.id}`, omitted, kept.outages);
  }
  sensor.sources = keepBuilt(s.sources, `${path}.sources`, (row, p) => buildRow(r, row, p), (row) => `row ${s.id}.${row.id}`, omitted, kept.sources);
  map.sources.push(kept.sources);
  map.outages.push(kept.outages);
  map.landmarks.push(kept.landmarks);
  return sensor;
}

/**
 * The sensors of the input, with what was left out and where each kept
 * entry came from. Throws nothing.
 */
export function buildSensors(r: QuantityReader, sensors: SensorEntry[], omitted: OmittedItem[]): { sensors: SensorInput[]; map: SensorIndexMap } {
  const map: SensorIndexMap = { sensors: [], sources: [], outages: [], landmarks: [] };
  const built = keepBuilt(sensors, 'sensors', (s, p) => buildSensor(r, s, p, omitted, map), (s) => `sensor ${s.id}`, omitted, map.sensors);
  return { sensors: built, map };
}
