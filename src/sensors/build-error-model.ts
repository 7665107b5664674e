import { InputError } from '../errors';
import { requireArray, requireId, requireOneOf } from '../inputs/checks';
import type { MissionInput, SensorInput } from '../inputs/budget-input';
import { emptySource, ModelBuilder } from '../covariance/model-builder';
import type { ErrorModel } from '../covariance/error-model';
import type { ResolvedMission } from '../mission/resolve-mission';
import { SENSOR_KIND_NAMES, SENSOR_KINDS } from './registry';
import { refuseUnreadFields } from './field-applicability';

/** Ids of the two sources the mission owns (ENGINE.md §7). */
export const INITIAL_POSITION_ID = 'mission.initialPosition';
export const INITIAL_HEADING_ID = 'mission.initialHeading';

/**
 * Assembles the error-state model of a suite: the mission's initial-pose
 * sources, then each sensor's states, noise and measurements, in input order.
 * @throws InputError for a suite the planar model cannot run (no yaw gyro,
 *   two speed inputs, position aiding without a speed input, duplicate ids).
 */
export function buildErrorModel(sensors: SensorInput[], mission: ResolvedMission, missionNotes?: MissionInput['initialSigmaNotes']): ErrorModel {
  const list = requireArray(sensors, 'sensors');
  checkSuite(list);
  const b = new ModelBuilder();
  const notes = missionNotes ?? {};
  const pos = emptySource(INITIAL_POSITION_ID, 'mission', 'initial-position', 'initial position', notes.position);
  pos.initialVariance.push(
    { state: b.core.along, varianceSI: mission.initialPositionSigmaM ** 2 },
    { state: b.core.cross, varianceSI: mission.initialPositionSigmaM ** 2 },
  );
  const head = emptySource(INITIAL_HEADING_ID, 'mission', 'initial-heading', 'initial heading', notes.heading);
  head.initialVariance.push({ state: b.core.heading, varianceSI: mission.initialHeadingSigmaRad ** 2 });
  b.sources.push(pos, head);
  list.forEach((sensor, i) => {
    refuseUnreadFields(sensor, `sensors[${i}]`);
    SENSOR_KINDS[sensor.kind].place(b, sensor, { path: `sensors[${i}]`, missionDurationS: mission.durationS });
  });
  return b.build();
}

function checkSuite(list: SensorInput[]): void {
  const ids = new Set<string>();
  const count: Record<string, number> = {};
  list.forEach((s, i) => {
    const p = `sensors[${i}]`;
    if (!s || typeof s !== 'object') throw new InputError(p, 'must be a sensor object');
    const id = requireId(s.id, `${p}.id`);
    if (id === 'mission') throw new InputError(`${p}.id`, '"mission" is reserved for the initial-pose sources');
    if (ids.has(id)) throw new InputError(`${p}.id`, `"${id}" is used by another sensor; sensor ids must be unique`);
    ids.add(id);
    requireOneOf(s.kind, SENSOR_KIND_NAMES, `${p}.kind`);
    count[s.kind] = (count[s.kind] ?? 0) + 1;
    checkRowIds(s, p);
  });
  if ((count['yaw-gyro'] ?? 0) !== 1) {
    throw new InputError('sensors', `the planar model needs exactly one yaw-gyro (found ${count['yaw-gyro'] ?? 0})`);
  }
  if ((count['wheel-speed'] ?? 0) > 1) throw new InputError('sensors', 'the planar model takes one speed input (wheel-speed); found more');
  const positionAiding = (count['gnss-position'] ?? 0) + (count['range-bearing'] ?? 0);
  if (positionAiding > 0 && !count['wheel-speed']) {
    throw new InputError('sensors', 'GNSS and range-bearing sensors observe position, which needs a speed input (add a wheel-speed sensor)');
  }
}

function checkRowIds(s: SensorInput, p: string): void {
  if (!Array.isArray(s.sources)) throw new InputError(`${p}.sources`, 'must be a list of error-source rows');
  const seen = new Set<string>();
  s.sources.forEach((row, j) => {
    const id = requireId(row?.id, `${p}.sources[${j}].id`);
    if (seen.has(id)) throw new InputError(`${p}.sources[${j}].id`, `"${id}" is used twice in sensor "${s.id}"; row ids must be unique`);
    seen.add(id);
  });
}
