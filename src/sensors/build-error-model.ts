import { InputError } from '../errors';
import { requireArray, requireId, requireOneOf } from '../inputs/checks';
import type { MissionInput, SensorInput, SensorKind } from '../inputs/budget-input';
import { emptySource, ModelBuilder } from '../covariance/model-builder';
import type { ErrorModel } from '../covariance/error-model';
import type { ResolvedMission } from '../mission/resolve-mission';
import { SENSOR_KIND_NAMES, SENSOR_KINDS } from './registry';
import type { Placement, PlacedSuite, SensorStates } from './sensor-kind';
import { checkSuite } from './suite-rules';

/** Ids of the two sources the mission owns (docs/planar-model.md §7). */
export const INITIAL_POSITION_ID = 'mission.initialPosition';
export const INITIAL_HEADING_ID = 'mission.initialHeading';

/**
 * Assembles the error-state model of a suite in two phases: the mission's
 * initial-pose sources, then every sensor's states, noise and sources in
 * input order (phase 1), then every sensor's measurements (phase 2), which
 * may use any sensor's states through {@link PlacedSuite.statesOf}.
 * @throws InputError for a suite the planar model cannot run (the kinds'
 *   own suite rules: one yaw gyro, one speed input, position aiding needs a
 *   speed input) or duplicate ids.
 */
export function buildErrorModel(sensors: SensorInput[], mission: ResolvedMission, missionNotes?: MissionInput['initialSigmaNotes']): ErrorModel {
  const list = requireArray(sensors, 'sensors');
  list.forEach(checkSensorIds(new Set<string>()));
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
  const placed = list.map((sensor, i) => {
    const spec = SENSOR_KINDS[sensor.kind];
    for (const m of spec.measurements) b.measurementUnit(`${sensor.id}.${m.key}`, m.unitSI);
    return { kind: sensor.kind, placement: spec.place(b, sensor, { path: `sensors[${i}]`, missionDurationS: mission.durationS }) as Placement<SensorKind> };
  });
  const suite: PlacedSuite = {
    statesOf: <K extends SensorKind>(kind: K) => placed.filter((p) => p.kind === kind).map((p) => p.placement.states as SensorStates<K>),
  };
  for (const { placement } of placed) placement.measurements?.(b, suite);
  return b.build();
}

function checkSensorIds(ids: Set<string>): (s: SensorInput, i: number) => void {
  return (s, i) => {
    const p = `sensors[${i}]`;
    if (!s || typeof s !== 'object') throw new InputError(p, 'must be a sensor object');
    const id = requireId(s.id, `${p}.id`);
    if (id === 'mission') throw new InputError(`${p}.id`, '"mission" is reserved for the initial-pose sources');
    if (ids.has(id)) throw new InputError(`${p}.id`, `"${id}" is used by another sensor; sensor ids must be unique`);
    ids.add(id);
    requireOneOf(s.kind, SENSOR_KIND_NAMES, `${p}.kind`);
    checkRowIds(s, p);
  };
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
