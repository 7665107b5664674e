/**
 * The 3-D error-state model (docs/inertial-model.md §3): its states, its
 * sources with every piece of P0, Q and R they own, and its aiding sensors.
 * The dynamics (inertial-dynamics.ts), the discretisation and the
 * measurement rows read these; the covariance run sees them through a
 * CovarianceProblem (inertial-problem.ts).
 */
import type { ConversionStep, MeasurementNoisePiece, StateInfo } from '../covariance/error-model';
import type { NominalRow } from './inertial-trajectory';
import type { EarthModel } from './earth';

/** Indices of the nine navigation states, always first: δr (0-2), δv (3-5), δψ (6-8), each N, E, D. */
export const POSITION = 0;
export const VELOCITY = 3;
export const ATTITUDE = 6;
export const NAV_STATES = 9;

/** A state of the model with how it evolves on its own (docs/planar-model.md §3: constant, Gauss-Markov, random walk). */
export interface InertialState extends StateInfo {
  /** 1/T for a Gauss-Markov state, 0 for random constants and random walks, 1/s. */
  decayPerS: number;
}

/** An IMU error state: which instrument and body axis it sits on, and how it enters. */
export interface ImuErrorState {
  state: number;
  instrument: 'gyro' | 'accelerometer';
  /** Body axis 0 = x, 1 = y, 2 = z. */
  axis: number;
  /** A bias adds to the instrument's output; a scale factor multiplies the true rate or specific force. */
  effect: 'bias' | 'scale-factor';
}

/**
 * White noise owned by a source: either driving one state directly (unit
 * column of G), or an IMU axis's white noise entering the attitude or
 * velocity block through C_b^n (docs/inertial-model.md §4).
 */
export type InertialNoise =
  | { on: 'state'; state: number; psdSI: number; derivation: string }
  | { on: 'body'; block: 'attitude' | 'velocity'; axis: number; psdSI: number; derivation: string };

/** One error source (a grid row, or one of the four initial-uncertainty sources). */
export interface InertialSource {
  /** `sensorId.rowId`, or `mission.initialPosition` (…Velocity, …Tilt, …Heading). */
  id: string;
  sensorId: string;
  kind: string;
  label: string;
  /** The axis the row names, when it names one. */
  axis?: 'x' | 'y' | 'z';
  initialVariance: { state: number; varianceSI: number }[];
  noise: InertialNoise[];
  measurementNoise: MeasurementNoisePiece[];
  conversions: ConversionStep[];
  assumptions: string[];
  provenance?: string;
  assumed: boolean;
}

/** A scalar measurement row at a boundary: sparse H on the states and the key of its R pieces. */
export interface InertialMeasurementRow {
  key: string;
  noiseKey: string;
  h: [number, number][];
}

/** An aiding sensor's schedule: rate, outages, and its rows at a nominal instant (empty when it does not measure there). */
export interface InertialStream {
  sensorId: string;
  rateHz: number;
  /** Half-open spans without measurements; `gap` marks a span outside the sensor's windows of use, not an outage. */
  outages: { id: string; startS: number; endS: number; gap?: true }[];
  rowsAt(row: NominalRow): InertialMeasurementRow[];
}

/** The whole 3-D model. */
export interface InertialModel {
  states: InertialState[];
  imuStates: ImuErrorState[];
  sources: InertialSource[];
  streams: InertialStream[];
  earth: EarthModel;
  /** The IMU's id, for labels. */
  imuId: string;
}
