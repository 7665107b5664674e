/**
 * Inertial engine paths to document paths: the engine names a bad field of
 * its input (`imu.rows[3].value.unit`, `aiding[1].leverArm`,
 * `mission.initialSigma.verticalPosition`); the user edits the document,
 * where the IMU and the aiding sensors are entries of `sensors`, a row is
 * itself a quantity (`sensors[0].sources[3].unit`), and items left out
 * because of a failed cell shift the indices.
 */
import type { InertialIndexMap } from './build-inertial-input';

/** The document index of input index `text`; the index itself when the map does not know it. */
function documentIndex(list: number[] | undefined, text: string): number {
  const i = Number(text);
  return list?.[i] ?? i;
}

/** Input start-uncertainty names to document paths. */
const START_SIGMA: Record<string, string> = {
  horizontalPosition: 'mission.initialPosition',
  verticalPosition: 'mission.initialPosition.vertical',
  horizontalVelocity: 'mission.initialVelocity',
  verticalVelocity: 'mission.initialVelocity.vertical',
  tilt: 'mission.initialTilt',
  heading: 'mission.initialHeading',
};

/** A row is a quantity in the document: input `value.unit` is the row's `unit`. */
const rowField = (tail: string) => tail.replace(/^\.value\.(value|unit)(?![A-Za-z])/, '.$1');

/** The path of a part of the IMU (`imu...`). */
function imuPath(rest: string, map: InertialIndexMap): string {
  const base = `sensors[${map.imu}]`;
  const m = /^\.rows\[(\d+)\](.*)$/.exec(rest);
  if (m) return `${base}.sources[${documentIndex(map.imuRows, m[1])}]${rowField(m[2])}`;
  return base + (rest.startsWith('.id') ? '.id' : rest);
}

/** The path of a part of aiding sensor `index` (`aiding[i]...`). */
function aidingPath(index: string, rest: string, map: InertialIndexMap): string {
  const i = Number(index);
  const base = `sensors[${documentIndex(map.aiding, index)}]`;
  const m = /^\.(rows|outages|windows)\[(\d+)\](.*)$/.exec(rest);
  if (!m) return base + rest;
  const [, list, item, tail] = m;
  if (list === 'rows') return `${base}.sources[${documentIndex(map.rows[i], item)}]${rowField(tail)}`;
  return `${base}.${list}[${documentIndex(map[list as 'outages' | 'windows'][i], item)}]${tail}`;
}

/**
 * The document path of an inertial engine input path (an InputError's
 * `path` from runInertialBudget or the 3-D requirement code). Anything
 * unknown comes back unchanged. Throws nothing.
 */
export function inertialDocumentPathOf(inputPath: string, map: InertialIndexMap): string {
  let m: RegExpExecArray | null;
  if ((m = /^step(?![A-Za-z])(.*)$/.exec(inputPath))) return `settings.step${m[1]}`;
  if ((m = /^mission\.initialSigma\.([A-Za-z]+)(.*)$/.exec(inputPath)) && START_SIGMA[m[1]]) return START_SIGMA[m[1]] + m[2];
  if ((m = /^mission\.segments\[(\d+)\](.*)$/.exec(inputPath))) return `mission.segments[${documentIndex(map.segments, m[1])}]${m[2]}`;
  if ((m = /^(requirements|checkpoints)\[(\d+)\](.*)$/.exec(inputPath))) {
    return `${m[1]}[${documentIndex(map[m[1] as 'requirements' | 'checkpoints'], m[2])}]${m[3]}`;
  }
  if ((m = /^imu(?![A-Za-z])(.*)$/.exec(inputPath))) return imuPath(m[1], map);
  if ((m = /^aiding\[(\d+)\](.*)$/.exec(inputPath))) return aidingPath(m[1], m[2], map);
  return inputPath;
}
