/**
 * The 3-D (inertial) budget document, format version 2 with `"model":
 * "inertial"` (docs/document-format.md, "Two models"). It shares the
 * planar document's parts (cells, named values, outages, requirements,
 * checkpoints, sizing) and adds the IMU with per-instrument, per-axis rows,
 * the aiding sensors of docs/inertial-model.md §5 and the 3-D mission. The
 * published schema describes both models' keys; `checkModelKeys` refuses a
 * key of the other model with its path.
 */
import type { ConfidenceLevel } from '../inputs/budget-input';
import { AIDING_KIND_NAMES, type AidingKind, type AttitudeRule, type ImuAxis } from '../inertial/inertial-input';
import type {
  BudgetDocument, CheckpointEntry, FORMAT_NAME, FORMAT_VERSION, InitialPoseSource, NamedValue, OutageEntry, QuantityCell,
  SegmentEntry, SizingRunEntry, SourceRow,
} from './budget-document';

/** Which error model a document uses (`model`; absent means planar). */
export type BudgetModel = 'planar' | 'inertial';

/** The sensor kind of the IMU in an inertial document. */
export const IMU_SENSOR_KIND = 'imu';

/** Every sensor kind an inertial document may hold: the IMU, then the aiding kinds. */
export const INERTIAL_SENSOR_KINDS = [IMU_SENSOR_KIND, ...AIDING_KIND_NAMES] as const;

/** A sensor kind of an inertial document. */
export type InertialSensorKind = typeof IMU_SENSOR_KIND | AidingKind;

/** A start uncertainty with a vertical part (initial position, initial velocity): horizontal per axis, then vertical. */
export interface InitialSigmaSource extends InitialPoseSource {
  vertical: QuantityCell;
}

/** A leg of the 3-D path: the planar leg plus a vertical speed (up positive; omitted: level). */
export interface InertialSegmentEntry extends SegmentEntry {
  verticalSpeed?: QuantityCell;
}

/** The 3-D mission: start pose and place on the Earth, attitude rule, four start uncertainties, legs. */
export interface InertialMissionEntry {
  note?: string;
  start: { north: QuantityCell; east: QuantityCell; heading: QuantityCell; latitude: QuantityCell; height: QuantityCell };
  attitudeRule: AttitudeRule;
  initialPosition: InitialSigmaSource;
  initialVelocity: InitialSigmaSource;
  /** On δψ_N and δψ_E each (docs/inertial-model.md §3). */
  initialTilt: InitialPoseSource;
  /** On δψ_D. */
  initialHeading: InitialPoseSource;
  segments: InertialSegmentEntry[];
}

/**
 * One row of an inertial sensor. IMU rows name their `instrument` and may
 * name an `axis`; GNSS rows may give a `vertical` sigma beside the
 * horizontal one.
 */
export interface InertialRow extends Omit<SourceRow, 'component' | 'tuning'> {
  instrument?: 'gyro' | 'accelerometer';
  axis?: ImuAxis;
  vertical?: QuantityCell;
}

/** One sensor of an inertial document: the IMU or an aiding sensor. */
export interface InertialSensorEntry {
  id: string;
  kind: InertialSensorKind;
  note?: string;
  rate: QuantityCell;
  /** GNSS position only: antenna position in the body frame (x forward, y right, z down). */
  leverArm?: { x: QuantityCell; y: QuantityCell; z: QuantityCell };
  outages?: OutageEntry[];
  /** Zero-velocity sensors only: the spans (half-open) in which the update is used; each must lie in a stop of the path. */
  windows?: OutageEntry[];
  sources: InertialRow[];
}

/** A limit on an inertial quantity (an id of INERTIAL_QUANTITIES, or `horizontal`). */
export interface InertialRequirementEntry {
  id: string;
  quantity: string;
  level: ConfidenceLevel;
  limit: QuantityCell;
  window?: { start: QuantityCell; end: QuantityCell };
  note?: string;
}

/** A whole 3-D budget document. */
export interface InertialBudgetDocument {
  $schema?: string;
  format: typeof FORMAT_NAME;
  formatVersion: typeof FORMAT_VERSION;
  model: 'inertial';
  title: string;
  description?: string;
  settings: { step: QuantityCell; level?: ConfidenceLevel };
  values?: Record<string, NamedValue>;
  mission: InertialMissionEntry;
  sensors: InertialSensorEntry[];
  requirements?: InertialRequirementEntry[];
  checkpoints?: CheckpointEntry[];
  sizing?: SizingRunEntry[];
}

/** A document of either model. */
export type AnyBudgetDocument = BudgetDocument | InertialBudgetDocument;

/** True for a 3-D budget (`"model": "inertial"`). Throws nothing. */
export function isInertialDocument(doc: AnyBudgetDocument): doc is InertialBudgetDocument {
  return doc.model === 'inertial';
}
