import { ATTITUDE, POSITION, VELOCITY } from './inertial-model';
import type { NominalRow } from './inertial-trajectory';

/** The entries of P the inertial outputs read: the upper triangles of the position, velocity and attitude blocks. */
export const RECORDED_BLOCKS = [POSITION, VELOCITY, ATTITUDE];

/** The recorded pairs, in the order the covariance run records them. */
export const RECORDED_PAIRS: [number, number][] = RECORDED_BLOCKS.flatMap((b) =>
  [[0, 0], [1, 1], [2, 2], [0, 1], [0, 2], [1, 2]].map(([i, j]): [number, number] => [b + i, b + j]));

/** Reads recorded entry P[i][j] (i, j in one recorded block, either order) of one matrix at one step. */
export type EntryReader = (i: number, j: number) => number;

/** An output quantity whose variance is linear in P, so each source's share is the same form of its P_s. */
export interface InertialQuantity {
  id: string;
  label: string;
  /** SI unit of the 1σ value. */
  unitSI: string;
  variance(p: EntryReader, row: NominalRow): number;
}

/** a P aᵀ for a vector a on one block. */
function form(p: EntryReader, block: number, a: readonly number[]): number {
  let s = 0;
  for (let i = 0; i < 3; i++) for (let j = 0; j < 3; j++) if (a[i] && a[j]) s += a[i] * a[j] * p(block + i, block + j);
  return s;
}

const along = (row: NominalRow) => [Math.cos(row.yawRad), Math.sin(row.yawRad), 0];
const cross = (row: NominalRow) => [-Math.sin(row.yawRad), Math.cos(row.yawRad), 0];

/**
 * The variance outputs of the inertial model (docs/inertial-model.md §6),
 * each a quadratic form of P: adding a quantity is one entry here. Attitude
 * errors use the small-angle relations of the attitude convention of §1:
 * yaw δψ_D + tan θ (cos ψ δψ_N + sin ψ δψ_E), pitch −sin ψ δψ_N + cos ψ δψ_E,
 * roll (cos ψ δψ_N + sin ψ δψ_E) / cos θ.
 */
export const INERTIAL_QUANTITIES: readonly InertialQuantity[] = [
  { id: 'north', label: 'north position', unitSI: 'm', variance: (p) => p(POSITION, POSITION) },
  { id: 'east', label: 'east position', unitSI: 'm', variance: (p) => p(POSITION + 1, POSITION + 1) },
  { id: 'down', label: 'down position', unitSI: 'm', variance: (p) => p(POSITION + 2, POSITION + 2) },
  { id: 'height', label: 'height', unitSI: 'm', variance: (p) => p(POSITION + 2, POSITION + 2) },
  { id: 'drms', label: 'horizontal DRMS', unitSI: 'm', variance: (p) => p(POSITION, POSITION) + p(POSITION + 1, POSITION + 1) },
  { id: 'mrse', label: 'MRSE (3-D)', unitSI: 'm', variance: (p) => p(POSITION, POSITION) + p(POSITION + 1, POSITION + 1) + p(POSITION + 2, POSITION + 2) },
  { id: 'along', label: 'along-track', unitSI: 'm', variance: (p, r) => form(p, POSITION, along(r)) },
  { id: 'cross', label: 'cross-track', unitSI: 'm', variance: (p, r) => form(p, POSITION, cross(r)) },
  { id: 'velocityNorth', label: 'north velocity', unitSI: 'm/s', variance: (p) => p(VELOCITY, VELOCITY) },
  { id: 'velocityEast', label: 'east velocity', unitSI: 'm/s', variance: (p) => p(VELOCITY + 1, VELOCITY + 1) },
  { id: 'velocityDown', label: 'down velocity', unitSI: 'm/s', variance: (p) => p(VELOCITY + 2, VELOCITY + 2) },
  { id: 'speed', label: 'speed (along-track velocity)', unitSI: 'm/s', variance: (p, r) => form(p, VELOCITY, along(r)) },
  {
    id: 'roll', label: 'roll', unitSI: 'rad',
    variance: (p, r) => form(p, ATTITUDE, [Math.cos(r.yawRad) / Math.cos(r.pitchRad), Math.sin(r.yawRad) / Math.cos(r.pitchRad), 0]),
  },
  { id: 'pitch', label: 'pitch', unitSI: 'rad', variance: (p, r) => form(p, ATTITUDE, [-Math.sin(r.yawRad), Math.cos(r.yawRad), 0]) },
  {
    id: 'yaw', label: 'yaw', unitSI: 'rad',
    variance: (p, r) => form(p, ATTITUDE, [Math.tan(r.pitchRad) * Math.cos(r.yawRad), Math.tan(r.pitchRad) * Math.sin(r.yawRad), 1]),
  },
];

/**
 * What a requirement of a 3-D budget may constrain: every quantity above by
 * its id, and `horizontal` (DRMS, 2DRMS, R95 or CEP by the requirement's
 * level, as in planar budgets). A new quantity above is a new choice here.
 */
export const INERTIAL_REQUIREMENT_QUANTITIES: readonly string[] = [...INERTIAL_QUANTITIES.map((q) => q.id), 'horizontal'];
