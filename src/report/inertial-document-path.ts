/**
 * Paths of the inertial engine's input (`imu.rows[2].value`,
 * `aiding[1].leverArm.x`, `mission.initialSigma.verticalPosition`) turned
 * back into document paths (`sensors[0].sources[2].value`,
 * `sensors[1].leverArm.x.value`, `mission.initialPosition.vertical.value`),
 * so the page can show an engine refusal at the cell the user typed into.
 */
import type { InertialIndexMap } from '../sheet/build-inertial-input';

/** Input names of the start uncertainties, by the document key they come from. */
const SIGMA_KEYS: Record<string, string> = {
  horizontalPosition: 'initialPosition', verticalPosition: 'initialPosition.vertical',
  horizontalVelocity: 'initialVelocity', verticalVelocity: 'initialVelocity.vertical',
  tilt: 'initialTilt', heading: 'initialHeading',
};

/** Input fields that are `{ value, unit }` cells in the document (their path gains `.value`). */
const CELL_FIELDS = /\.(rate|correlationTime|vertical|x|y|z|start|end|duration|speed|speedEnd|turnRate|verticalSpeed|limit|time|north|east|heading|latitude|height)$/;

function at(list: number[] | undefined, i: string): string {
  return String(list?.[Number(i)] ?? i);
}

/** A row's magnitude sits flat in the document row: `...sources[2].value` already names the cell. */
function asCell(path: string): string {
  return CELL_FIELDS.test(path) ? `${path}.value` : path;
}

/**
 * The document path of an engine input path, with `.value` added where the
 * input field is a cell; a path it does not know comes back unchanged.
 * Throws nothing.
 */
export function inertialDocumentPath(path: string, map: InertialIndexMap): string {
  let m = /^imu\.rows\[(\d+)\](.*)$/.exec(path);
  if (m) return asCell(`sensors[${map.imu}].sources[${at(map.imuRows, m[1])}]${m[2]}`);
  m = /^imu(\..*)?$/.exec(path);
  if (m) return asCell(`sensors[${map.imu}]${m[1] ?? ''}`);
  m = /^aiding\[(\d+)\](.*)$/.exec(path);
  if (m) {
    const i = Number(m[1]);
    const rest = m[2].replace(/^\.(rows|outages|windows)\[(\d+)\]/, (_s, list: 'rows' | 'outages' | 'windows', j: string) =>
      `.${list === 'rows' ? 'sources' : list}[${at(map[list][i], j)}]`);
    return asCell(`sensors[${at(map.aiding, m[1])}]${rest}`);
  }
  m = /^mission\.initialSigma\.(\w+)(.*)$/.exec(path);
  if (m && SIGMA_KEYS[m[1]]) return `mission.${SIGMA_KEYS[m[1]]}${m[2]}${m[2] ? '' : '.value'}`;
  m = /^mission\.segments\[(\d+)\](.*)$/.exec(path);
  if (m) return asCell(`mission.segments[${at(map.segments, m[1])}]${m[2]}`);
  m = /^(requirements|checkpoints)\[(\d+)\](.*)$/.exec(path);
  if (m) return asCell(`${m[1]}[${at(map[m[1] as 'requirements' | 'checkpoints'], m[2])}]${m[3]}`);
  if (path === 'step') return 'settings.step.value';
  return asCell(path);
}
