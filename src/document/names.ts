/**
 * The formula names of a budget document: which cells formulas can refer
 * to, by what name, and which names the formula engine (HyperFormula) would
 * refuse.
 *
 * The scheme (every name is case-insensitive, as in spreadsheets):
 * - a named value is its key in `values`: `cruiseSpeed`;
 * - a row's magnitude is its full id: `gyro.arw`;
 * - a row's other cells add the field: `gyro.bi.correlationTime`, `gyro.lsb.rate`,
 *   and the filter's tuned values `gyro.bi.tuning.value`, `gyro.bi.tuning.correlationTime`;
 * - the start-pose sources are `mission.initialPosition` and `mission.initialHeading`;
 *   3-D budgets add `mission.initialVelocity`, `mission.initialTilt`, and the vertical
 *   parts `mission.initialPosition.vertical`, `mission.initialVelocity.vertical`;
 * - a 3-D GNSS row's vertical sigma is `gnss.white.vertical`.
 * Named values have no dots and sensor ids cannot be "mission", so these
 * never collide. Other cells (segments, requirements, ...) have no names.
 */

/** A row's cells that formulas can name; `tuning.*` are the filter's values (`gyro.bi.tuning.value`). */
export type RowCellField = 'value' | 'correlationTime' | 'rate' | 'tuning.value' | 'tuning.correlationTime' | 'vertical';

/** Name of a row cell: its full id for the magnitude, plus the field for the others. */
export function rowCellName(sensorId: string, rowId: string, field: RowCellField): string {
  return field === 'value' ? `${sensorId}.${rowId}` : `${sensorId}.${rowId}.${field}`;
}

/** Names of the two start-pose sources, which are also their source ids. */
export const INITIAL_POSE_NAMES = {
  initialPosition: 'mission.initialPosition',
  initialHeading: 'mission.initialHeading',
} as const;

/** Names of the 3-D budget's start sources (docs/inertial-model.md §3), which are also their source ids. */
export const INERTIAL_START_NAMES = {
  initialPosition: 'mission.initialPosition',
  initialVelocity: 'mission.initialVelocity',
  initialTilt: 'mission.initialTilt',
  initialHeading: 'mission.initialHeading',
} as const;

/** The sensor id reserved for the start-pose sources. */
export const RESERVED_SENSOR_ID = 'mission';

// The rules of HyperFormula 3.5 (NamedExpressions.isNameValid, parser-consts):
// letters include U+00C0-U+02AF; a name must not read as an A1 or R1C1 reference.
const LETTER = 'A-Za-z\\u00C0-\\u02AF';
const NAME_SHAPE = new RegExp(`^[${LETTER}_][${LETTER}0-9_.]*$`);
const A1_REFERENCE = /^\$?([A-Za-z]+)\$?([0-9]+)$/;
const R1C1_REFERENCE = /^[rR][0-9]*[cC][0-9]*$/;

/**
 * Why formulas could not use `name`, with a fix, or undefined when it is
 * usable. Mirrors HyperFormula's rules so users get this message rather than
 * the library's. Throws nothing.
 */
export function formulaNameProblem(name: string): string | undefined {
  const a1 = A1_REFERENCE.exec(name);
  if (a1) {
    return `"${name}" looks like a cell reference (column ${a1[1].toUpperCase()}, row ${a1[2]}), so formulas could not tell it apart; rename it, e.g. "${a1[1]}_${a1[2]}"`;
  }
  if (R1C1_REFERENCE.test(name)) {
    return `"${name}" looks like a cell reference in R1C1 style, so formulas could not tell it apart; rename it, e.g. "${name}_value"`;
  }
  if (!NAME_SHAPE.test(name)) {
    return `"${name}" is not a usable name: start with a letter or "_", then use letters, digits, "_" or "."`;
  }
  return undefined;
}

/** The key under which names are compared: formulas ignore letter case. Throws nothing. */
export function nameKey(name: string): string {
  return name.toLowerCase();
}
