/**
 * How the sheet reports a bad cell: as a value with its location, never by
 * throwing. Everything that does not depend on the cell still computes.
 */

/** Where a cell is, in the document and in the user's terms. */
export interface CellLocation {
  /** Path of the cell in the document: `sensors[2].sources[1].value`, `values.cruiseSpeed.value`. */
  path: string;
  /** The cell's field within its owner: `value`, `correlationTime`, `start.north`, `segments[1].duration`, `limit`, `window.start`. */
  field: string;
  /** The sensor the cell belongs to (`mission` for the start-pose sources). */
  sensorId?: string;
  /** The row the cell belongs to (`initialPosition` or `initialHeading` for the start-pose sources). */
  rowId?: string;
  /** Id of the segment, outage, landmark, requirement or checkpoint the cell belongs to, when it has one. */
  itemId?: string;
  /** The formula name of the cell, when formulas can refer to it (`gyro.arw`, `cruiseSpeed`). */
  name?: string;
}

/** What went wrong, for icons and filters; the message says it in words. */
export type CellErrorKind =
  | 'content' // neither a number nor a formula
  | 'syntax' // the formula cannot be read
  | 'unknown-name' // a name or function that does not exist
  | 'position' // a grid position such as A1 instead of a name
  | 'name' // the cell's own name cannot be used in formulas
  | 'cycle' // the formula depends on itself
  | 'division-by-zero'
  | 'not-a-number' // text or true/false where a number is needed
  | 'out-of-range' // a square root of a negative number, an overflow
  | 'unit' // an unknown unit, or units of different dimensions
  | 'dependency' // uses a cell that has an error
  | 'other';

/** One bad cell. */
export interface CellError {
  location: CellLocation;
  kind: CellErrorKind;
  /** A sentence that says what is wrong and how to fix it. */
  message: string;
}
