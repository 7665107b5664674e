/**
 * What one cell came to: a number, or an error in words. HyperFormula's
 * values and error codes are translated here, so no library wording reaches
 * the user.
 */
import { DetailedCellError, ErrorType, type CellValue } from 'hyperformula';
import type { CellErrorKind } from './cell-error';
import { CONVERT_FUNCTION, UNIT_ERROR_PREFIX } from './unit-functions';

/** A cell's number (in the cell's own unit), or why it has none. */
export type CellOutcome = { value: number } | { kind: CellErrorKind; message: string };

/** True for an outcome that carries an error. */
export function isFailure(o: CellOutcome): o is { kind: CellErrorKind; message: string } {
  return !('value' in o);
}

const NAMES_HELP =
  'names are the keys of "values", rows as sensorId.rowId (and sensorId.rowId.correlationTime or .rate), ' +
  'and mission.initialPosition / mission.initialHeading';

/** #NAME?: an unknown name or an unknown function. */
function unknownName(detail: string): CellOutcome {
  const name = /Named expression (.+) not recognized/.exec(detail);
  if (name) return { kind: 'unknown-name', message: `uses "${name[1]}", which is not a name in this budget; ${NAMES_HELP}` };
  const fn = /Function name (.+) not recognized/.exec(detail);
  const which = fn ? `the function ${fn[1]}, which does not exist` : 'an unknown name or function';
  return { kind: 'unknown-name', message: `uses ${which}; units are converted with ${CONVERT_FUNCTION}(value, "from unit", "to unit")` };
}

/** A formula error, by HyperFormula's error type. */
function fromFormulaError(e: DetailedCellError): CellOutcome {
  switch (e.type) {
    case ErrorType.DIV_BY_ZERO: return { kind: 'division-by-zero', message: 'divides by zero' };
    case ErrorType.NAME: return unknownName(e.message);
    case ErrorType.CYCLE: return { kind: 'cycle', message: 'is part of a circular reference; replace one formula in the loop with a number' };
    case ErrorType.NUM: return { kind: 'out-of-range', message: 'gives no finite number (a square root of a negative number, or an overflow)' };
    case ErrorType.REF: return { kind: 'other', message: 'refers to a cell that does not exist' };
    case ErrorType.NA: return { kind: 'other', message: 'gives no value (#N/A)' };
    case ErrorType.VALUE:
      if (e.message.startsWith(UNIT_ERROR_PREFIX)) return { kind: 'unit', message: `${CONVERT_FUNCTION}: ${e.message.slice(UNIT_ERROR_PREFIX.length)}` };
      return { kind: 'not-a-number', message: 'uses text or true/false where a number is needed' };
    default:
      if (e.message.startsWith('Parsing error')) {
        return { kind: 'syntax', message: 'the formula cannot be read; check brackets, operators and commas, and put text in double quotes' };
      }
      return { kind: 'other', message: `gives the error ${e.value}` };
  }
}

/**
 * The outcome of a cell from the value HyperFormula computed for it.
 * Throws nothing.
 */
export function outcomeOf(value: CellValue): CellOutcome {
  if (typeof value === 'number') return { value };
  if (value instanceof DetailedCellError) return fromFormulaError(value);
  if (typeof value === 'string') return { kind: 'not-a-number', message: `gives the text ${JSON.stringify(value)}, but a number is needed` };
  if (typeof value === 'boolean') return { kind: 'not-a-number', message: `gives ${value ? 'TRUE' : 'FALSE'}, but a number is needed` };
  return { kind: 'content', message: 'is empty; write a number or a formula starting with "="' };
}
