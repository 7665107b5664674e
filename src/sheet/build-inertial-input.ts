/**
 * Evaluated cells of a 3-D document to the inertial model's input
 * (InertialBudgetInput). As for planar budgets, an item with a failed cell
 * (a row, an aiding sensor, an outage or window, a requirement, a
 * checkpoint) is left out and listed; the mission, the step and the IMU's
 * rate have no such fallback, so their failure means no input.
 */
import type { OutageEntry } from '../document/budget-document';
import {
  IMU_SENSOR_KIND, type InertialBudgetDocument, type InertialMissionEntry, type InertialRow, type InertialSensorEntry,
} from '../document/inertial-document';
import type {
  AidingInput, AidingKind, AidingRowInput, ImuRowInput, InertialBudgetInput, InertialMissionInput, InertialSegmentInput,
} from '../inertial/inertial-input';
import type { OutageInput, Quantity } from '../inputs/budget-input';
import { buildCheckpoints, buildRequirements } from './build-input';
import { keepBuilt, QuantityReader, type CellLookup, type OmittedItem } from './cell-reader';

/** For each list of the input, the document index of each entry kept (input index i came from document index map[i]). */
export interface InertialIndexMap {
  segments: number[];
  /** Document index of the IMU sensor (-1 when there is none). */
  imu: number;
  /** Document row index of each input IMU row. */
  imuRows: number[];
  /** Document sensor index of each input aiding sensor. */
  aiding: number[];
  /** Per input aiding sensor, the document index of each row, outage and window kept. */
  rows: number[][];
  outages: number[][];
  windows: number[][];
  requirements: number[];
  checkpoints: number[];
}

/** The 3-D input, or why there is none, with what was left out. */
export interface InertialBuiltInput {
  input?: InertialBudgetInput;
  blocked?: string;
  omitted: OmittedItem[];
  indexMap: InertialIndexMap;
}

/** Row fields copied as they are. */
const ROW_OPTIONS = ['biasForm', 'densitySides', 'quantum', 'multipathModel', 'provenance', 'assumed'] as const;

function rowOptions(row: InertialRow): Record<string, unknown> {
  return Object.fromEntries(ROW_OPTIONS.filter((k) => row[k] !== undefined).map((k) => [k, row[k]]));
}

function buildMission(r: QuantityReader, m: InertialMissionEntry, omitted: OmittedItem[], kept: number[]): InertialMissionInput | string {
  const start = r.fields(m.start, 'mission.start', ['north', 'east', 'heading', 'latitude', 'height']);
  const sigma = {
    horizontalPosition: r.quantity(m.initialPosition, 'mission.initialPosition'),
    verticalPosition: r.quantity(m.initialPosition.vertical, 'mission.initialPosition.vertical'),
    horizontalVelocity: r.quantity(m.initialVelocity, 'mission.initialVelocity'),
    verticalVelocity: r.quantity(m.initialVelocity.vertical, 'mission.initialVelocity.vertical'),
    tilt: r.quantity(m.initialTilt, 'mission.initialTilt'),
    heading: r.quantity(m.initialHeading, 'mission.initialHeading'),
  };
  const segments = keepBuilt(m.segments, 'mission.segments', (s, p) => {
    const fields = r.fields(s, p, ['duration', 'speed', 'speedEnd', 'turnRate', 'verticalSpeed']);
    return fields && ({ ...(s.id !== undefined && { id: s.id }), ...fields } as InertialSegmentInput);
  }, (s, i) => `segment ${s.id ?? i + 1}`, omitted, kept);
  if (start === undefined) return 'a cell of the start (mission.start) has an error';
  if (Object.values(sigma).some((q) => q === undefined)) {
    return 'a start uncertainty (mission.initialPosition, initialVelocity, initialTilt or initialHeading) has an error';
  }
  if (segments.length < m.segments.length) {
    const failed = m.segments.findIndex((_s, i) => !kept.includes(i));
    return `mission.segments[${failed}] has a cell error, and the mission's timeline cannot be built without it`;
  }
  return {
    start: start as InertialMissionInput['start'], attitudeRule: m.attitudeRule,
    initialSigma: sigma as InertialMissionInput['initialSigma'], segments,
  };
}

function buildImuRow(r: QuantityReader, row: InertialRow, path: string): ImuRowInput | undefined {
  const value = r.quantity(row, path);
  const times = r.fields(row, path, ['correlationTime', 'rate']);
  if (value === undefined || times === undefined) return undefined;
  return {
    id: row.id, kind: row.kind, instrument: row.instrument!, ...(row.axis !== undefined && { axis: row.axis }),
    value, ...times, ...rowOptions(row),
  } as ImuRowInput;
}

function buildAidingRow(r: QuantityReader, row: InertialRow, path: string): AidingRowInput | undefined {
  const value = r.quantity(row, path);
  const more = r.fields(row, path, ['vertical', 'correlationTime']);
  if (value === undefined || more === undefined) return undefined;
  return { id: row.id, kind: row.kind, value, ...more, ...rowOptions(row) } as AidingRowInput;
}

function buildSpan(r: QuantityReader, o: OutageEntry, path: string): OutageInput | undefined {
  const span = r.fields(o, path, ['start', 'end']);
  return span && ({ ...(o.id !== undefined && { id: o.id }), ...span } as OutageInput);
}

/** One aiding sensor, or undefined when its rate or lever arm failed; records the kept indices of its lists. */
function buildAiding(r: QuantityReader, s: InertialSensorEntry, path: string, omitted: OmittedItem[], map: InertialIndexMap): AidingInput | undefined {
  const rate = r.quantity(s.rate, `${path}.rate`);
  const arm = s.leverArm && r.fields(s.leverArm, `${path}.leverArm`, ['x', 'y', 'z']);
  if (rate === undefined || (s.leverArm && arm === undefined)) return undefined;
  const kept = { rows: [] as number[], outages: [] as number[], windows: [] as number[] };
  const sensor: AidingInput = { id: s.id, kind: s.kind as AidingKind, rate, rows: [] };
  if (arm) sensor.leverArm = arm as { x: Quantity; y: Quantity; z: Quantity };
  for (const key of ['outages', 'windows'] as const) {
    const spans = s[key];
    if (spans === undefined) continue;
    const word = key === 'outages' ? 'outage' : 'window';
    sensor[key] = keepBuilt(spans, `${path}.${key}`, (o, p) => buildSpan(r, o, p), (o, i) => `${word} ${o.id ?? i + 1} of ${s.id}`, omitted, kept[key]);
  }
  sensor.rows = keepBuilt(s.sources, `${path}.sources`, (row, p) => buildAidingRow(r, row, p), (row) => `row ${s.id}.${row.id}`, omitted, kept.rows);
  map.rows.push(kept.rows);
  map.outages.push(kept.outages);
  map.windows.push(kept.windows);
  return sensor;
}

/**
 * The inertial model's input from a 3-D document and its evaluated cells.
 * @param lookup the number of a value cell by path, undefined when the cell or its unit failed.
 * Throws nothing: a failure that leaves no input comes back as `blocked`.
 */
export function buildInertialInput(doc: InertialBudgetDocument, lookup: CellLookup): InertialBuiltInput {
  const r = new QuantityReader(lookup);
  const omitted: OmittedItem[] = [];
  const map: InertialIndexMap = {
    segments: [], imu: doc.sensors.findIndex((s) => s.kind === IMU_SENSOR_KIND), imuRows: [],
    aiding: [], rows: [], outages: [], windows: [], requirements: [], checkpoints: [],
  };
  const mission = buildMission(r, doc.mission, omitted, map.segments);
  const step = r.quantity(doc.settings.step, 'settings.step');
  const imuEntry = doc.sensors[map.imu];
  const imuPath = `sensors[${map.imu}]`;
  const imuRate = imuEntry && r.quantity(imuEntry.rate, `${imuPath}.rate`);
  const imuRows = imuEntry
    ? keepBuilt(imuEntry.sources, `${imuPath}.sources`, (row, p) => buildImuRow(r, row, p), (row) => `row ${imuEntry.id}.${row.id}`, omitted, map.imuRows)
    : [];
  const aidingDoc = doc.sensors.map((s, i) => ({ s, i })).filter(({ s }) => s.kind !== IMU_SENSOR_KIND);
  const aidingKept: number[] = [];
  const before = omitted.length;
  const aiding = keepBuilt(aidingDoc, 'sensors', ({ s, i }) => buildAiding(r, s, `sensors[${i}]`, omitted, map), ({ s }) => `sensor ${s.id}`, omitted, aidingKept);
  map.aiding = aidingKept.map((k) => aidingDoc[k].i);
  // keepBuilt numbered the paths of aiding sensors left out by their place among aiding sensors; use the document's.
  for (const o of omitted.slice(before)) {
    const m = /^sensors\[(\d+)\]$/.exec(o.path);
    if (m) o.path = `sensors[${aidingDoc[Number(m[1])].i}]`;
  }
  const requirements = buildRequirements(r, doc, omitted, map.requirements);
  const checkpoints = buildCheckpoints(r, doc, omitted, map.checkpoints);
  if (typeof mission === 'string') return { blocked: mission, omitted, indexMap: map };
  if (step === undefined) return { blocked: 'the step (settings.step) has an error', omitted, indexMap: map };
  if (!imuEntry || imuRate === undefined) return { blocked: `the IMU's rate (${imuPath}.rate) has an error`, omitted, indexMap: map };
  const input: InertialBudgetInput = { mission, imu: { id: imuEntry.id, rate: imuRate, rows: imuRows }, aiding, step };
  if (doc.settings.level !== undefined) input.reportLevel = doc.settings.level;
  if (doc.requirements !== undefined) input.requirements = requirements;
  if (doc.checkpoints !== undefined) input.checkpoints = checkpoints;
  return { input, omitted, indexMap: map };
}
