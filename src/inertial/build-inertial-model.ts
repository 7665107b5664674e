import { InputError } from '../errors';
import { requireArray } from '../inputs/checks';
import { EARTH, type EarthModel } from './earth';
import type { InertialBudgetInput } from './inertial-input';
import type { ResolvedInertialMission } from './inertial-mission';
import { ATTITUDE, NAV_STATES, POSITION, VELOCITY, type InertialModel, type InertialSource, type InertialState } from './inertial-model';
import { resolveImuErrors } from './imu-errors';
import { aidingContext } from './aiding/aiding-context';
import { AIDING_KINDS } from './aiding/aiding-kinds';
import { windowGaps } from './aiding/use-windows';

const NAV_NAMES = ['position.north', 'position.east', 'position.down', 'velocity.north', 'velocity.east', 'velocity.down',
  'attitude.north', 'attitude.east', 'attitude.down'];
const NAV_UNITS = ['m', 'm', 'm', 'm/s', 'm/s', 'm/s', 'rad', 'rad', 'rad'];

/**
 * Assembles the 3-D model from a resolved mission and the budget's IMU and
 * aiding sensors (docs/inertial-model.md §3-§5): nine navigation states,
 * then the IMU's error states, then the aiding states; the four
 * initial-uncertainty sources first, then one source per row.
 * @param earth the Earth constants; tests override the radius or rotation.
 * @throws InputError naming the field of a bad row or sensor.
 */
export function buildInertialModel(
  input: InertialBudgetInput, mission: ResolvedInertialMission, earth: EarthModel = EARTH,
): InertialModel {
  const states: InertialState[] = NAV_NAMES.map((name, i) => ({ name, unitSI: NAV_UNITS[i], calibration: false, decayPerS: 0 }));
  const sources = initialSources(mission);
  const imu = resolveImuErrors(input.imu, NAV_STATES);
  states.push(...imu.states);
  sources.push(...imu.sources);
  const streams = requireArray(input.aiding, 'aiding', true).map((sensor, i) => {
    const path = `aiding[${i}]`;
    const resolver = AIDING_KINDS[sensor?.kind];
    if (!resolver) throw new InputError(`${path}.kind`, `is not an aiding kind of the inertial model: ${Object.keys(AIDING_KINDS).join(', ')}`);
    const added: InertialState[] = [];
    const ctx = aidingContext(sensor, path, mission.durationS, added, states.length, sources);
    ctx.outages.push(...windowGaps(sensor, path, mission));
    const rowsAt = resolver(ctx);
    states.push(...added);
    return { sensorId: sensor.id, rateHz: ctx.rateHz, outages: ctx.outages, rowsAt };
  });
  return { states, imuStates: imu.imuStates, sources, streams, earth, imuId: input.imu.id };
}

/** The four mission sources, each owning its P0 block, diagonal in the navigation frame (docs/inertial-model.md §3). */
function initialSources(m: ResolvedInertialMission): InertialSource[] {
  const s = m.sigma;
  const make = (id: string, label: string, entries: [number, number][]): InertialSource => ({
    id: `mission.${id}`, sensorId: 'mission', kind: 'initial', label,
    initialVariance: entries.filter(([, sigma]) => sigma > 0).map(([state, sigma]) => ({ state, varianceSI: sigma * sigma })),
    noise: [], measurementNoise: [], conversions: [], assumptions: [], assumed: false,
  });
  return [
    make('initialPosition', 'initial position', [[POSITION, s.horizontalPositionM], [POSITION + 1, s.horizontalPositionM], [POSITION + 2, s.verticalPositionM]]),
    make('initialVelocity', 'initial velocity', [[VELOCITY, s.horizontalVelocityMps], [VELOCITY + 1, s.horizontalVelocityMps], [VELOCITY + 2, s.verticalVelocityMps]]),
    make('initialTilt', 'initial tilt', [[ATTITUDE, s.tiltRad], [ATTITUDE + 1, s.tiltRad]]),
    make('initialHeading', 'initial heading', [[ATTITUDE + 2, s.headingRad]]),
  ];
}
