import { InputError } from '../errors';
import { nonNegativeToSI, quantityToSI, requireOneOf } from '../inputs/checks';
import { resolveMission, type ResolvedMission } from '../mission/resolve-mission';
import type { AttitudeRule, InertialMissionInput } from './inertial-input';

/** The 3-D mission in SI (docs/inertial-model.md §2, §3). */
export interface ResolvedInertialMission extends ResolvedMission {
  /** Vertical speed of each segment, m/s, up positive. */
  verticalSpeedMps: number[];
  attitudeRule: AttitudeRule;
  startLatitudeRad: number;
  startHeightM: number;
  /** Initial 1σ in the navigation frame. */
  sigma: {
    horizontalPositionM: number; verticalPositionM: number;
    horizontalVelocityMps: number; verticalVelocityMps: number;
    tiltRad: number; headingRad: number;
  };
}

/**
 * Validates the 3-D mission and converts it to SI; the horizontal part goes
 * through the planar resolver (same segments, same messages).
 * @throws InputError naming the field: anything the planar resolver refuses,
 *   a latitude beyond ±90°, a negative sigma, an unknown attitude rule.
 */
export function resolveInertialMission(m: InertialMissionInput | undefined, path = 'mission'): ResolvedInertialMission {
  if (!m || typeof m !== 'object') throw new InputError(path, 'is missing');
  if (!m.start || typeof m.start !== 'object') throw new InputError(`${path}.start`, 'is missing; expected north, east, heading, latitude and height');
  const sig = m.initialSigma ?? ({} as InertialMissionInput['initialSigma']);
  const planar = resolveMission({
    start: { north: m.start.north, east: m.start.east, heading: m.start.heading },
    initialSigma: { position: sig.horizontalPosition, heading: sig.heading },
    segments: m.segments,
  } as Parameters<typeof resolveMission>[0], path);
  const startLatitudeRad = quantityToSI(m.start.latitude, 'angle', `${path}.start.latitude`);
  if (Math.abs(startLatitudeRad) >= Math.PI / 2) {
    throw new InputError(`${path}.start.latitude`, 'must lie strictly between -90° and 90° (the north/east frame is undefined at a pole)');
  }
  const p = `${path}.initialSigma`;
  return {
    ...planar,
    verticalSpeedMps: m.segments.map((s, i) => (s.verticalSpeed === undefined ? 0 : quantityToSI(s.verticalSpeed, 'speed', `${path}.segments[${i}].verticalSpeed`))),
    attitudeRule: requireOneOf(m.attitudeRule, ['level', 'banked', 'ground'] as const, `${path}.attitudeRule`),
    startLatitudeRad,
    startHeightM: quantityToSI(m.start.height, 'length', `${path}.start.height`),
    sigma: {
      horizontalPositionM: nonNegativeToSI(sig.horizontalPosition, 'length', `${p}.horizontalPosition`),
      verticalPositionM: nonNegativeToSI(sig.verticalPosition, 'length', `${p}.verticalPosition`),
      horizontalVelocityMps: nonNegativeToSI(sig.horizontalVelocity, 'speed', `${p}.horizontalVelocity`),
      verticalVelocityMps: nonNegativeToSI(sig.verticalVelocity, 'speed', `${p}.verticalVelocity`),
      tiltRad: nonNegativeToSI(sig.tilt, 'angle', `${p}.tilt`),
      headingRad: nonNegativeToSI(sig.heading, 'angle', `${p}.heading`),
    },
  };
}
