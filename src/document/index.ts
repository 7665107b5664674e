/**
 * The budget document: its types, the published schema, parsing with
 * validation and migration, and canonical writing. Text in, data out: no
 * file access here.
 */
export {
  FORMAT_NAME,
  FORMAT_VERSION,
  type BudgetDocument,
  type Cell,
  type CheckpointEntry,
  type InitialPoseSource,
  type LandmarkEntry,
  type MissionEntry,
  type NamedValue,
  type OutageEntry,
  type QuantityCell,
  type RequirementEntry,
  type RowTuning,
  type SegmentEntry,
  type SensorEntry,
  type SourceRow,
  type TuningModel,
} from './budget-document';
export { BudgetFileError } from './budget-file-error';
export { BUDGET_SCHEMA, budgetValidator } from './budget-schema';
export { MIGRATIONS, migrateToCurrent, type MigratedJson, type Migration, type MigrationRegistry } from './format-version';
export { formulaNameProblem, INERTIAL_START_NAMES, INITIAL_POSE_NAMES, nameKey, RESERVED_SENSOR_ID, rowCellName } from './names';
export { parseAnyBudgetDocument, parseBudgetDocument, type ParseOptions, type ParsedBudget } from './parse-budget-document';
export { MAX_DEPTH, MAX_TEXT_CHARS, readJson } from './read-json';
export { serializeBudgetDocument } from './serialize-budget-document';
export {
  IMU_SENSOR_KIND,
  INERTIAL_SENSOR_KINDS,
  isInertialDocument,
  type AnyBudgetDocument,
  type BudgetModel,
  type InertialBudgetDocument,
  type InertialMissionEntry,
  type InertialRequirementEntry,
  type InertialRow,
  type InertialSegmentEntry,
  type InertialSensorEntry,
  type InertialSensorKind,
  type InitialSigmaSource,
} from './inertial-document';
export { checkModelKeys } from './model-keys';
