/**
 * The budget document: the JSON workbook an engineer keeps in git. These
 * types mirror `budgets/budget.schema.json` (the published schema, which is
 * the one authority on shape and key order) and, where they can, the field
 * names of the engine's {@link BudgetInput}, so the mapping is one to one.
 *
 * A cell holds a number or a formula text starting with "="; units sit
 * beside every value. Nothing derived is stored.
 */
import type { ConfidenceLevel, QuantityName, SensorKind, SourceKind } from '../inputs/budget-input';

/** The value of `format` in every budget document. */
export const FORMAT_NAME = 'sigma-ledger-budget';

/**
 * The newest format version this code reads and writes. Version 2 added the
 * model choice (`model`: planar or inertial) and the 3-D parts; a version 1
 * file is a planar budget and migrates unchanged (src/document/format-version.ts).
 */
export const FORMAT_VERSION = 2;

/** A value cell: a number, or a formula text starting with "=". */
export type Cell = number | string;

/** A value cell with the unit it is written in (`{ value: "=cruiseSpeed", unit: "m/s" }`). */
export interface QuantityCell {
  value: Cell;
  unit: string;
}

/** A value formulas use by name; not an error source. */
export interface NamedValue extends QuantityCell {
  note?: string;
}

/** The start-pose uncertainty: an error source of its own (`mission.initialPosition`). */
export interface InitialPoseSource extends QuantityCell {
  provenance: string;
  assumed: boolean;
  note?: string;
}

/** One leg of the nominal path. */
export interface SegmentEntry {
  id?: string;
  duration: QuantityCell;
  speed: QuantityCell;
  speedEnd?: QuantityCell;
  turnRate: QuantityCell;
  note?: string;
}

/** Start pose, its uncertainty and the legs that follow. */
export interface MissionEntry {
  note?: string;
  start: { north: QuantityCell; east: QuantityCell; heading: QuantityCell };
  initialPosition: InitialPoseSource;
  initialHeading: InitialPoseSource;
  segments: SegmentEntry[];
}

/** A known landmark (range-bearing sensors). */
export interface LandmarkEntry {
  id: string;
  north: QuantityCell;
  east: QuantityCell;
  note?: string;
}

/** A span of mission time in which an aiding sensor gives nothing. */
export interface OutageEntry {
  id?: string;
  start: QuantityCell;
  end: QuantityCell;
  note?: string;
}

/**
 * How the filter is tuned for one row when its design differs from the truth
 * (the row itself stays the truth). Every field is optional; a row without
 * `tuning` is modelled by the filter exactly as written.
 */
export interface RowTuning {
  /** The magnitude the filter is tuned with, in any unit of the row's kind; a formula is allowed. */
  value?: QuantityCell;
  /** The correlation time the filter assumes (bias instability, multipath as states). */
  correlationTime?: QuantityCell;
  /** Filter-only factor (> 0) on every variance and PSD the row gives the filter (P0, Q and R). */
  inflation?: number;
  /** True: the filter leaves the row out altogether. */
  leftOut?: boolean;
  /**
   * A state the filter does not carry as the truth has it: bias instability
   * modelled as a random walk, or multipath folded into R (or carried as states).
   */
  model?: TuningModel;
  note?: string;
}

/** How the filter models a row whose truth is a Gauss-Markov state (or folded noise). */
export type TuningModel = 'random-walk' | 'gauss-markov' | 'folded' | 'states';

/** One row: one error source. The row's own `value` and `unit` are its magnitude. */
export interface SourceRow extends QuantityCell {
  id: string;
  kind: SourceKind;
  correlationTime?: QuantityCell;
  rate?: QuantityCell;
  biasForm?: 'floor' | 'flicker-coefficient';
  densitySides?: 'one' | 'two';
  quantum?: 'rate' | 'angle';
  multipathModel?: 'states' | 'folded';
  component?: 'range' | 'bearing';
  provenance: string;
  assumed: boolean;
  /** The filter's design for this row, when it differs from the truth. */
  tuning?: RowTuning;
  note?: string;
}

/** One sensor and its rows. */
export interface SensorEntry {
  id: string;
  kind: SensorKind;
  note?: string;
  rate: QuantityCell;
  observables?: 'range' | 'bearing' | 'range-bearing';
  maxRange?: QuantityCell;
  fieldOfView?: QuantityCell;
  landmarks?: LandmarkEntry[];
  outages?: OutageEntry[];
  sources: SourceRow[];
}

/** A limit on a reported quantity. */
export interface RequirementEntry {
  id: string;
  quantity: QuantityName;
  level: ConfidenceLevel;
  limit: QuantityCell;
  window?: { start: QuantityCell; end: QuantityCell };
  note?: string;
}

/** A named mission time. */
export interface CheckpointEntry {
  id: string;
  time: QuantityCell;
  note?: string;
}

/** A sizing run the review report includes: row `vary` (sensorId.rowId) against requirement `requirement`. */
export interface SizingRunEntry {
  requirement: string;
  vary: string;
  note?: string;
}

/** A whole planar budget document of the current format version (3-D budgets: InertialBudgetDocument). */
export interface BudgetDocument {
  $schema?: string;
  format: typeof FORMAT_NAME;
  formatVersion: typeof FORMAT_VERSION;
  /** The error model; absent means planar. */
  model?: 'planar';
  title: string;
  description?: string;
  settings: { step: QuantityCell; level?: ConfidenceLevel };
  values?: Record<string, NamedValue>;
  mission: MissionEntry;
  sensors: SensorEntry[];
  requirements?: RequirementEntry[];
  checkpoints?: CheckpointEntry[];
  sizing?: SizingRunEntry[];
}
