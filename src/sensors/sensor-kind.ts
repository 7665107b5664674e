import { InputError } from '../errors';
import { positiveToSI, quantityToSI } from '../inputs/checks';
import type { SensorInput, SensorKind, SensorKindMap, SourceInput, SourceKind } from '../inputs/budget-input';
import type { DimensionName } from '../units';
import type { RowOptionSpec } from '../sources/source-kind';
import type { AllanSensorKind } from '../allan/sensor-term-units';
import type { ModelBuilder } from '../covariance/model-builder';
import { TIME_SLACK_S } from '../mission/nominal-trajectory';

/** What the placing of one sensor needs besides the builder. */
export interface SensorContext {
  /** Path of the sensor in the input, e.g. `sensors[2]`. */
  path: string;
  missionDurationS: number;
}

/**
 * The state handles each sensor kind's placement exposes to the other
 * sensors of the suite. Each kind's file adds its own entry by declaration
 * merging (`declare module '../inputs/budget-input'`, interface
 * `SensorKindMap`), so the kind's name and the type of its handles live in
 * its file; see {@link PlacedSuite.statesOf}.
 */
export type SensorStates<K extends SensorKind> = SensorKindMap[K];

/** The suite after phase 1: every sensor's states exist. */
export interface PlacedSuite {
  /** The handles of every sensor of `kind`, in input order (empty when the suite has none). Throws nothing. */
  statesOf<K extends SensorKind>(kind: K): readonly SensorStates<K>[];
}

/** What phase 1 of placing one sensor returns; `B` is the model's builder (the planar {@link ModelBuilder} by default). */
export interface Placement<K extends SensorKind, B = ModelBuilder> {
  /** Indices of this sensor's states that other sensors may reach (typed per kind). */
  states: SensorStates<K>;
  /**
   * Phase 2, run after every sensor's states exist: adds the sensor's
   * measurement streams, which may refer to another sensor's states through
   * `suite`. Must not create states or sources (their order is phase 1's).
   */
  measurements?(b: B, suite: PlacedSuite): void;
}

/** A scalar measurement a sensor produces: the suffix of its noise key (`gnss.north`) and the SI unit of what it measures. */
export interface MeasurementSpec {
  /** Suffix after the sensor id in the R entry's name (`north` in `gnss.north`). */
  key: string;
  /** SI unit of the measured quantity; R is in its square (`m` gives m²). */
  unitSI: string;
}

/** A setting of a sensor besides its rate, rows and outages, as the page shows it. */
export type SensorSetting =
  | { type: 'quantity'; field: 'maxRange' | 'fieldOfView'; label: string; dimensions: readonly DimensionName[]; optional: boolean }
  | { type: 'choice'; field: 'observables'; label: string; choices: readonly { value: string; label: string }[]; fallback: string }
  | { type: 'landmarks' };

/** How many sensors of a kind a suite takes, and what it gives to or needs from the others. */
export interface SuiteRule {
  /** Fewest and most sensors of this kind in one suite (default 0 and unlimited). */
  min?: number;
  max?: number;
  /** Inputs this kind gives the suite. */
  provides?: readonly SuiteInput[];
  /** An input this kind cannot work without, and why, for the message. */
  needs?: { input: SuiteInput; because: string };
}

/** What one sensor can give the rest of the suite. */
export type SuiteInput = 'heading-rate' | 'speed';

/**
 * Everything a sensor kind declares about itself; the engine, the schema,
 * the edits and the page read these fields instead of lists of their own.
 */
export interface SensorKindSpec<K extends SensorKind = SensorKind, B = ModelBuilder> {
  kind: K;
  /** In words, for messages and the page ("compass heading"). */
  label: string;
  /** Dead-reckoning inputs carry the state forward; aiding sensors measure it and may have outages. */
  role: 'dead-reckoning' | 'aiding';
  /** One sentence on what the sensor measures or drives in the error-state model, for reports. */
  model: string;
  /** What a new sensor of this kind gets: its id stem and its usual rate. */
  defaults: { id: string; rateHz: number };
  /**
   * The source kinds its rows may have, each with the dimensions its
   * magnitude may have on this sensor (a compass's turn-on bias is an angle,
   * a gyro's an angular rate); the order is the order the page lists them.
   */
  rows: Readonly<Partial<Record<SourceKind, readonly DimensionName[]>>>;
  /** Model options this sensor gives some of its rows, in place of the source kind's own option. */
  rowOptions?: Readonly<Partial<Record<SourceKind, RowOptionSpec>>>;
  /** The source kinds of `rows`, in order (derived by {@link defineSensorKind}). */
  sourceKinds: readonly SourceKind[];
  /**
   * Which sensor logs write into this kind (src/edits/log-targets.ts): the
   * Allan analysis of a log of this kind of instrument, and calibrations of
   * logs whose unit has one of these dimensions.
   */
  logs?: { allan?: AllanSensorKind; calibration?: readonly DimensionName[] };
  /** Its settings besides rate, rows and outages, in the order the page shows them. */
  settings?: readonly SensorSetting[];
  /** Its scalar measurements and their units (empty for dead-reckoning inputs). */
  measurements: readonly MeasurementSpec[];
  suite: SuiteRule;
  /**
   * Phase 1: adds the sensor's states, dynamics, noise and sources to the
   * model, and returns its state handles and its phase 2.
   * @throws InputError naming the field of a bad row or setting.
   */
  place(builder: B, sensor: SensorInput, ctx: SensorContext): Placement<K, B>;
}

/** A sensor kind's spec with `sourceKinds` filled in from `rows`. */
export function defineSensorKind<K extends SensorKind, B = ModelBuilder>(spec: Omit<SensorKindSpec<K, B>, 'sourceKinds'>): SensorKindSpec<K, B> {
  return { ...spec, sourceKinds: Object.keys(spec.rows) as SourceKind[] };
}

/** The sensor's output or measurement rate in Hz. @throws InputError when missing or not positive. */
export function sensorRateHz(sensor: SensorInput, path: string): number {
  return positiveToSI(sensor.rate, 'frequency', `${path}.rate`);
}

/** Throws unless the row's kind is one this sensor accepts. */
export function checkRowKind(spec: Pick<SensorKindSpec, 'label' | 'sourceKinds'>, row: SourceInput, path: string): void {
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
export function resolveOutages(
  sensor: SensorInput, ctx: Pick<SensorContext, 'path' | 'missionDurationS'>, key = 'outages',
): { id: string; startS: number; endS: number }[] {
  const list = (sensor as unknown as Record<string, SensorInput['outages']>)[key] ?? [];
  if (!Array.isArray(list)) throw new InputError(`${ctx.path}.${key}`, 'must be a list of { start, end }');
  return list.map((o, i) => {
    const p = `${ctx.path}.${key}[${i}]`;
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
    throw new InputError(`${path}.outages`, 'only aiding sensors have outages; this one is a dead-reckoning input');
  }
}

/** Iterates the rows with their paths, checking each kind against the sensor's list. */
export function eachRow(spec: Pick<SensorKindSpec, 'label' | 'sourceKinds'>, sensor: SensorInput, ctx: SensorContext, fn: (row: SourceInput, path: string) => void): void {
  const rows = sensor.sources;
  if (!Array.isArray(rows)) throw new InputError(`${ctx.path}.sources`, 'must be a list of error-source rows');
  rows.forEach((row, i) => {
    const path = `${ctx.path}.sources[${i}]`;
    if (!row || typeof row !== 'object') throw new InputError(path, 'must be an error-source row object');
    checkRowKind(spec, row, path);
    fn(row, path);
  });
}
