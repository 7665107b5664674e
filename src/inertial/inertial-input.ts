/**
 * The inertial model's input (docs/inertial-model.md §2-§5): an evaluated
 * 3-D budget, every number with the unit it was written in. Plain JSON-safe
 * data, like the planar BudgetInput.
 */
import type { CheckpointInput, ConfidenceLevel, OutageInput, Quantity, RequirementInput, SegmentInput, SourceInput } from '../inputs/budget-input';

/** How the vehicle's attitude follows the path (docs/inertial-model.md §2). */
export type AttitudeRule = 'level' | 'banked' | 'ground';

/** A segment of the 3-D path: the planar segment plus a vertical speed (up positive, default 0). */
export interface InertialSegmentInput extends SegmentInput {
  verticalSpeed?: Quantity;
}

/** The 3-D mission: start pose and place on the Earth, attitude rule, initial uncertainty, segments. */
export interface InertialMissionInput {
  start: { north: Quantity; east: Quantity; heading: Quantity; latitude: Quantity; height: Quantity };
  attitudeRule: AttitudeRule;
  /** 1σ, diagonal in the navigation frame: four sources (position, velocity, tilt, heading). */
  initialSigma: {
    horizontalPosition: Quantity;
    verticalPosition: Quantity;
    horizontalVelocity: Quantity;
    verticalVelocity: Quantity;
    /** On δψ_N and δψ_E each. */
    tilt: Quantity;
    /** On δψ_D. */
    heading: Quantity;
  };
  segments: InertialSegmentInput[];
}

/** An IMU body axis (x forward, y right, z down). */
export type ImuAxis = 'x' | 'y' | 'z';

/** One IMU datasheet row: a planar source row, for the gyros or the accelerometers, on all axes or one. */
export interface ImuRowInput extends SourceInput {
  instrument: 'gyro' | 'accelerometer';
  /** Absent: the row applies to x, y and z; present: it replaces the all-axes row of its kind on that axis. */
  axis?: ImuAxis;
}

/** The IMU: one output rate (for per-sample forms and quantisation) and its rows. */
export interface ImuInput {
  id: string;
  rate: Quantity;
  rows: ImuRowInput[];
}

/** Aiding sensors of the inertial model (docs/inertial-model.md §5), in the order documents and the page list them. */
export const AIDING_KIND_NAMES = [
  'gnss-position', 'gnss-velocity', 'barometer', 'heading-aid', 'zero-velocity', 'motion-constraint', 'odometer',
] as const;

/** An aiding sensor kind of the inertial model. */
export type AidingKind = (typeof AIDING_KIND_NAMES)[number];

/** The aiding kinds that take an antenna lever arm (docs/inertial-model.md §5). */
export const LEVER_ARM_KINDS: readonly AidingKind[] = ['gnss-position'];

/**
 * The aiding kinds that may list `windows`, the spans in which they are used
 * (a zero-velocity update at declared stops only); without windows they are
 * used wherever their motion condition holds (docs/inertial-model.md §5).
 */
export const WINDOW_KINDS: readonly AidingKind[] = ['zero-velocity'];

/** The aiding kinds whose rows give a horizontal sigma and a vertical one. */
export const VERTICAL_SIGMA_KINDS: readonly AidingKind[] = ['gnss-position', 'gnss-velocity'];

/** One aiding row: white noise, a bias (random constant), multipath or a scale factor. */
export interface AidingRowInput {
  id: string;
  kind: 'white-noise' | 'turn-on-bias' | 'multipath' | 'scale-factor';
  /** Sigma (horizontal axes for GNSS rows). */
  value: Quantity;
  /** GNSS rows: the vertical sigma (default: `value`). */
  vertical?: Quantity;
  correlationTime?: Quantity;
  multipathModel?: 'states' | 'folded';
  provenance?: string;
  assumed?: boolean;
}

/** An aiding sensor with its rows, outages and (GNSS position) antenna lever arm. */
export interface AidingInput {
  id: string;
  kind: AidingKind;
  rate: Quantity;
  rows: AidingRowInput[];
  outages?: OutageInput[];
  /** Zero-velocity sensors: the spans (half-open) in which the update is used; each must lie inside a stop. Omitted: every stop. */
  windows?: OutageInput[];
  /** Antenna position in the body frame (x forward, y right, z down), a known setting. */
  leverArm?: { x: Quantity; y: Quantity; z: Quantity };
}

/** A limit on a 3-D quantity: an id of INERTIAL_REQUIREMENT_QUANTITIES (src/inertial/inertial-quantities.ts). */
export interface InertialRequirementInput extends Omit<RequirementInput, 'quantity'> {
  quantity: string;
}

/** The whole evaluated 3-D budget. */
export interface InertialBudgetInput {
  mission: InertialMissionInput;
  imu: ImuInput;
  aiding: AidingInput[];
  step: Quantity;
  /** Read by the requirement code after the run (src/budget/), not by runInertialBudget. */
  requirements?: InertialRequirementInput[];
  checkpoints?: CheckpointInput[];
  /** Level of the budget tables (default 1sigma). */
  reportLevel?: ConfidenceLevel;
}
