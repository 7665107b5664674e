/**
 * The rules of the two models that the schema leaves to code: the schema
 * describes every key of both models (so editors complete both), and this
 * check refuses a key, a sensor kind or a requirement quantity of the other
 * model, and a key the 3-D model needs but the file lacks, each with its
 * path (docs/document-format.md, "Two models").
 */
import { QUANTITY_NAMES } from '../inputs/quantities';
import { SENSOR_KIND_NAMES } from '../sensors/registry';
import { AIDING_KIND_NAMES, LEVER_ARM_KINDS, VERTICAL_SIGMA_KINDS, WINDOW_KINDS } from '../inertial/inertial-input';
import { INERTIAL_REQUIREMENT_QUANTITIES } from '../inertial/inertial-quantities';
import { BudgetFileError } from './budget-file-error';
import { IMU_SENSOR_KIND, INERTIAL_SENSOR_KINDS } from './inertial-document';

type Json = Record<string, unknown>;

const TO_INERTIAL = 'set "model": "inertial" at the top to use the 3-D model';
const PLANAR_SENSOR_KEYS = ['observables', 'maxRange', 'fieldOfView', 'landmarks'];
const PLANAR_ROW_KEYS = ['component', 'tuning'];
const IMU_ROW_KEYS = ['instrument', 'axis'];

const list = (values: readonly string[]) => values.map((v) => `"${v}"`).join(', ');
const objects = (value: unknown): Json[] => (Array.isArray(value) ? (value as Json[]) : []);

/** Throws at `path.key` when `owner` has the key. */
function refuseKeys(owner: Json | undefined, path: string, keys: readonly string[], why: string, fileName: string): void {
  for (const key of keys) {
    if (owner?.[key] !== undefined) throw new BudgetFileError(fileName, `${path}.${key}`, why);
  }
}

/** Throws at `path.key` when `owner` lacks the key. */
function requireKeys(owner: Json | undefined, path: string, keys: readonly string[], why: string, fileName: string): void {
  for (const key of keys) {
    if (owner?.[key] === undefined) throw new BudgetFileError(fileName, `${path}.${key}`, `is missing; ${why}`);
  }
}

function checkRequirements(raw: Json, allowed: readonly string[], model: string, fileName: string): void {
  objects(raw.requirements).forEach((r, i) => {
    if (typeof r.quantity === 'string' && !allowed.includes(r.quantity)) {
      throw new BudgetFileError(fileName, `requirements[${i}].quantity`, `"${r.quantity}" is not a quantity of ${model} budgets; use one of ${list(allowed)}`);
    }
  });
}

function checkPlanar(raw: Json, fileName: string): void {
  const why = `is a key of 3-D (inertial) budgets and this budget is planar; ${TO_INERTIAL}`;
  const mission = raw.mission as Json;
  refuseKeys(mission.start as Json, 'mission.start', ['latitude', 'height'], why, fileName);
  refuseKeys(mission, 'mission', ['attitudeRule', 'initialVelocity', 'initialTilt'], why, fileName);
  for (const key of ['initialPosition', 'initialHeading']) refuseKeys(mission[key] as Json, `mission.${key}`, ['vertical'], why, fileName);
  objects(mission.segments).forEach((s, i) => refuseKeys(s, `mission.segments[${i}]`, ['verticalSpeed'], why, fileName));
  objects(raw.sensors).forEach((s, i) => {
    const p = `sensors[${i}]`;
    if (!(SENSOR_KIND_NAMES as readonly unknown[]).includes(s.kind)) {
      throw new BudgetFileError(fileName, `${p}.kind`, `"${String(s.kind)}" is a sensor of 3-D (inertial) budgets; a planar budget takes ${list(SENSOR_KIND_NAMES)}, or ${TO_INERTIAL}`);
    }
    refuseKeys(s, p, ['leverArm', 'windows'], why, fileName);
    objects(s.sources).forEach((row, j) => refuseKeys(row, `${p}.sources[${j}]`, [...IMU_ROW_KEYS, 'vertical'], why, fileName));
  });
  checkRequirements(raw, QUANTITY_NAMES, 'planar', fileName);
}

function checkInertialMission(mission: Json, fileName: string): void {
  const needs = 'a 3-D budget states it (see budgets/FORMAT.md, "3-D budgets")';
  requireKeys(mission.start as Json, 'mission.start', ['latitude', 'height'], needs, fileName);
  requireKeys(mission, 'mission', ['attitudeRule', 'initialVelocity', 'initialTilt'], needs, fileName);
  for (const key of ['initialPosition', 'initialVelocity']) {
    requireKeys(mission[key] as Json, `mission.${key}`, ['vertical'], 'a 3-D start uncertainty gives its vertical 1-sigma beside the horizontal one', fileName);
  }
  for (const key of ['initialTilt', 'initialHeading']) {
    refuseKeys(mission[key] as Json, `mission.${key}`, ['vertical'], 'only the initial position and velocity have a vertical part', fileName);
  }
}

function checkInertialSensor(s: Json, p: string, fileName: string): void {
  const kind = s.kind as string;
  if (!(INERTIAL_SENSOR_KINDS as readonly string[]).includes(kind)) {
    throw new BudgetFileError(fileName, `${p}.kind`, `"${kind}" is a sensor of planar budgets; a 3-D budget takes ${list(INERTIAL_SENSOR_KINDS)}`);
  }
  refuseKeys(s, p, PLANAR_SENSOR_KEYS, 'is a key of planar budgets (range-bearing sensors); a 3-D budget has none', fileName);
  if (!LEVER_ARM_KINDS.includes(kind as never)) refuseKeys(s, p, ['leverArm'], `only ${list(LEVER_ARM_KINDS)} sensors have an antenna lever arm`, fileName);
  if (!WINDOW_KINDS.includes(kind as never)) refuseKeys(s, p, ['windows'], `only ${list(WINDOW_KINDS)} sensors have windows of use`, fileName);
  if (kind === IMU_SENSOR_KIND) refuseKeys(s, p, ['outages'], 'the IMU has no outages: it is the dead-reckoning sensor; outages belong to aiding sensors', fileName);
  objects(s.sources).forEach((row, j) => {
    const rp = `${p}.sources[${j}]`;
    refuseKeys(row, rp, PLANAR_ROW_KEYS, 'is a key of planar budgets; 3-D rows have no range/bearing component and no filter tuning yet', fileName);
    if (kind === IMU_SENSOR_KIND) {
      requireKeys(row, rp, ['instrument'], 'an IMU row says whether it is a "gyro" or an "accelerometer" row', fileName);
      refuseKeys(row, rp, ['vertical'], 'IMU rows have no vertical sigma; give a z-axis row (`"axis": "z"`) instead', fileName);
      return;
    }
    refuseKeys(row, rp, IMU_ROW_KEYS, `only rows of the "${IMU_SENSOR_KIND}" sensor name an instrument and an axis`, fileName);
    if (!VERTICAL_SIGMA_KINDS.includes(kind as never)) refuseKeys(row, rp, ['vertical'], `only ${list(VERTICAL_SIGMA_KINDS)} rows have a vertical sigma`, fileName);
  });
}

function checkInertial(raw: Json, fileName: string): void {
  checkInertialMission(raw.mission as Json, fileName);
  const sensors = objects(raw.sensors);
  sensors.forEach((s, i) => checkInertialSensor(s, `sensors[${i}]`, fileName));
  const imus = sensors.flatMap((s, i) => (s.kind === IMU_SENSOR_KIND ? [i] : []));
  if (imus.length === 0) {
    throw new BudgetFileError(fileName, 'sensors', `a 3-D budget needs one sensor of kind "${IMU_SENSOR_KIND}" (its gyros and accelerometers); aiding sensors are ${list(AIDING_KIND_NAMES)}`);
  }
  if (imus.length > 1) {
    throw new BudgetFileError(fileName, `sensors[${imus[1]}].kind`, `a 3-D budget has one IMU; sensors[${imus[0]}] is already one`);
  }
  checkRequirements(raw, INERTIAL_REQUIREMENT_QUANTITIES, '3-D (inertial)', fileName);
}

/**
 * Checks a document whose shape the schema accepted against the rules of its
 * model (`model`, absent meaning planar).
 * @throws BudgetFileError naming the first key, kind or quantity of the other
 *   model, a key the 3-D model needs, or a missing or second IMU.
 */
export function checkModelKeys(raw: Json, fileName: string): void {
  if (raw.model === 'inertial') checkInertial(raw, fileName);
  else checkPlanar(raw, fileName);
}
