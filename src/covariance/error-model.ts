/**
 * The linearised error-state model assembled from the suite's rows
 * (docs/planar-model.md §3, §5): which states exist, how each source feeds P0, the
 * continuous process noise and R, and which measurements are made when.
 *
 * Position error states are kept in the path frame (along-track, cross-track)
 * where, on a segment of constant speed and turn rate, the dynamics are time
 * invariant (docs/planar-model.md §4); north/east come from a rotation by the heading.
 */

/** A unit-conversion step, kept so R and Q entries trace back to their rows. */
export interface ConversionStep {
  /** What was converted, e.g. "value" or "correlationTime". */
  field: string;
  text: string;
}

/** A noise input: white noise driving one state with a unit column of G. */
export interface NoiseChannel {
  name: string;
  stateIndex: number;
}

/** A piece of continuous process noise owned by a source. */
export interface NoisePiece {
  channel: number;
  /** Two-sided PSD in the state's SI unit squared per second (e.g. rad²/s³ for a rate, rad²/s for heading). */
  psdSI: number;
  /** True for speed-sensor noise: a parked wheel reads zero, so the piece is off where the speed is zero. */
  onlyWhileMoving: boolean;
  /** How the PSD was obtained, for the Q view. */
  derivation: string;
}

/** A piece of one scalar measurement's R owned by a source. */
export interface MeasurementNoisePiece {
  /** Key of the scalar measurement, e.g. "gnss.north", "reflectors.range". */
  measurement: string;
  varianceSI: number;
  derivation: string;
}

/** One error source with every piece of P0, Q and R it owns (docs/planar-model.md §7). */
export interface ModelSource {
  /** `sensorId.rowId`, or `mission.initialPosition` / `mission.initialHeading`. */
  id: string;
  sensorId: string;
  kind: string;
  label: string;
  initialVariance: { state: number; varianceSI: number }[];
  noise: NoisePiece[];
  measurementNoise: MeasurementNoisePiece[];
  /** Bounded heading error added to the heading output only (angle quantum), rad². */
  headingOutputVarianceSI: number;
  /** Per-sample white variance added to the speed output while moving, (m/s)². */
  speedOutputVarianceSI: number;
  conversions: ConversionStep[];
  /** Values flagged as assumptions (for example a pre-filled correlation time). */
  assumptions: string[];
  /** Where the row's numbers came from, as the user wrote it. */
  provenance?: string;
  /** True when the row is marked as an assumption (nobody measured it or read it from a datasheet). */
  assumed: boolean;
}

/** What a state is, for outputs (units in SI). */
export interface StateInfo {
  name: string;
  /** SI unit of the state, e.g. "m", "rad", "rad/s", "1". */
  unitSI: string;
  /** Calibration states are reported with their sigma over time. */
  calibration: boolean;
}

/** A scalar measurement row made at one boundary; h is given on (dN, dE) and the other states. */
export interface ScalarMeasurement {
  /** What is measured, for display, e.g. "reflectors.range.post-3". */
  key: string;
  /** Which R pieces apply (MeasurementNoisePiece.measurement), e.g. "reflectors.range". */
  noiseKey: string;
  /** Sensitivity to north and east position error. */
  hNorth: number;
  hEast: number;
  /** Sensitivity to other states, as (state index, coefficient). */
  hStates: [number, number][];
}

/** Geometry the measurement models see at a processing instant. */
export interface MeasurementGeometry {
  northM: number;
  eastM: number;
  headingRad: number;
}

/** An aiding sensor's measurement schedule. */
export interface MeasurementStream {
  sensorId: string;
  rateHz: number;
  /** Half-open [startS, endS) spans with no measurement. */
  outages: { id: string; startS: number; endS: number }[];
  /** Scalar rows at this geometry (empty when nothing is visible). */
  rowsAt(geometry: MeasurementGeometry): ScalarMeasurement[];
}

/** Indices of the states every model has, and the optional speed scale factor. */
export interface CoreStates {
  along: number;
  cross: number;
  heading: number;
  /** -1 when no speed sensor scale factor is modelled. */
  speedScale: number;
}

/** The full model: states, dynamics builder, sources, measurements. */
export interface ErrorModel {
  states: StateInfo[];
  core: CoreStates;
  channels: NoiseChannel[];
  sources: ModelSource[];
  streams: MeasurementStream[];
  /** Continuous dynamics F (row-major n x n) at speed v and turn rate w. */
  dynamics(speedMps: number, turnRateRadps: number): Float64Array;
  /** True when the suite has a speed input (speed outputs exist). */
  hasSpeedInput: boolean;
  /** SI unit of what each measurement measures, by noise key (`gnss.north` -> `m`), as the sensor kinds declare it. */
  measurementUnitsSI: Readonly<Record<string, string>>;
}
