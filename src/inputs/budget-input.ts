/**
 * The engine's input: an evaluated budget. Every number is final (formulas
 * already evaluated) and carries the unit it was written in; the engine
 * converts to SI once, in {@link resolveBudget}, and records each conversion
 * so R and Q entries can be traced back to their rows.
 *
 * This is plain data (JSON-safe), so the browser worker, the CLI and the
 * tests hand the same object to the engine.
 */

import type { QuantityName } from './quantities';

/** A number as the user wrote it, with its unit text (`{ value: 0.2, unit: 'deg/√h' }`). */
export interface Quantity {
  value: number;
  unit: string;
}

/** Where a number came from, and whether nobody measured or read it from a datasheet. */
export interface SourceNote {
  provenance?: string;
  assumed?: boolean;
}

/** One leg of the nominal path: constant turn rate, constant speed or a linear speed ramp. */
export interface SegmentInput {
  /** Optional label shown in outputs. */
  id?: string;
  duration: Quantity;
  /** Speed at the start of the segment (>= 0: no reversing in this model). */
  speed: Quantity;
  /** Speed at the end of the segment; omitted means constant speed. */
  speedEnd?: Quantity;
  /** Turn rate; positive increases heading (clockwise seen from above). */
  turnRate: Quantity;
}

/** Start pose, its uncertainty and the segments that follow. */
export interface MissionInput {
  start: { north: Quantity; east: Quantity; heading: Quantity };
  /** 1-sigma uncertainty of the start pose; position is per axis (north and east alike). */
  initialSigma: { position: Quantity; heading: Quantity };
  /** Where the start-pose sigmas came from, and whether they are assumptions. */
  initialSigmaNotes?: { position?: SourceNote; heading?: SourceNote };
  segments: SegmentInput[];
}

/** A half-open span of mission time [start, end) in which an aiding sensor gives nothing. */
export interface OutageInput {
  id?: string;
  start: Quantity;
  end: Quantity;
}

/**
 * The error-source kinds, by name: each file in src/sources/ adds its kind
 * here by declaration merging (the value is unused: `true`). A new kind needs
 * no edit here.
 */
export interface SourceKindMap {}

/** Kinds of error source a row can hold (the names of {@link SourceKindMap}). */
export type SourceKind = keyof SourceKindMap & string;

/** One grid row: one error source of one sensor. */
export interface SourceInput {
  /** Unique in its sensor; the full id is `sensorId.rowId`. */
  id: string;
  kind: SourceKind;
  /** The magnitude (sigma, coefficient, density, LSB ...). Its unit decides its form; see each source model. */
  value: Quantity;
  /** Correlation time (bias instability, multipath). */
  correlationTime?: Quantity;
  /** Output rate that a per-sample sigma or an LSB refers to; defaults to the sensor's rate. */
  rate?: Quantity;
  /** Bias instability: the value is the Allan floor (default) or the flicker coefficient B. */
  biasForm?: 'floor' | 'flicker-coefficient';
  /** Noise density rows: one- or two-sided PSD convention (default two-sided, IEEE Std 952). */
  densitySides?: 'one' | 'two';
  /** Quantisation rows: an LSB of the reported rate (default) or of an output angle increment. */
  quantum?: 'rate' | 'angle';
  /** Multipath: Gauss-Markov states (default) or folded into R. */
  multipathModel?: 'states' | 'folded';
  /** Range-bearing sensors: which observable the row belongs to. */
  component?: 'range' | 'bearing';
  /** Where the number came from ("datasheet rev C, table 4"). */
  provenance?: string;
  /** True when nobody measured it or read it from a datasheet. */
  assumed?: boolean;
}

/**
 * The sensor kinds, by name: each file in src/sensors/ adds its kind here by
 * declaration merging, with the state handles it exposes to other sensors
 * as the value (src/sensors/sensor-kind.ts). A new kind needs no edit here.
 */
export interface SensorKindMap {}

/** Kinds of sensor the engine knows (the names of {@link SensorKindMap}). */
export type SensorKind = keyof SensorKindMap & string;

/** A known landmark for range-bearing sensors, in the mission's north/east frame. */
export interface LandmarkInput {
  id: string;
  north: Quantity;
  east: Quantity;
}

/** One sensor of the suite and its rows. */
export interface SensorInput {
  id: string;
  kind: SensorKind;
  /** Output or measurement rate. */
  rate: Quantity;
  sources: SourceInput[];
  /** Aiding sensors only. */
  outages?: OutageInput[];
  /** Range-bearing only. */
  landmarks?: LandmarkInput[];
  maxRange?: Quantity;
  /** Full field of view, centred on the heading. */
  fieldOfView?: Quantity;
  /** Range-bearing only: which observables it reports (default both). */
  observables?: 'range' | 'bearing' | 'range-bearing';
}

/** Quantities requirements can constrain: the ids of src/inputs/quantities.ts. */
export type { QuantityName };

/** Confidence levels; for 'horizontal', 1sigma is DRMS, 2sigma is 2DRMS, 95% is R95 and 50% is CEP. */
export type ConfidenceLevel = '1sigma' | '2sigma' | '95%' | '50%';

/** A requirement: the quantity at the level must stay at or below the limit over the window. */
export interface RequirementInput {
  id: string;
  quantity: QuantityName;
  level: ConfidenceLevel;
  limit: Quantity;
  /** Omitted: the whole mission. */
  window?: { start: Quantity; end: Quantity };
}

/** A named time at which the budget table is reported. */
export interface CheckpointInput {
  id: string;
  time: Quantity;
}

/** The whole evaluated budget. */
export interface BudgetInput {
  mission: MissionInput;
  sensors: SensorInput[];
  requirements?: RequirementInput[];
  checkpoints?: CheckpointInput[];
  /** Time step of the covariance analysis and the output series. */
  step: Quantity;
  /** Level at which reports show values in budget tables (default 1sigma); series stay 1 sigma. */
  reportLevel?: ConfidenceLevel;
}
