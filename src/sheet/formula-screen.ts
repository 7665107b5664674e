/**
 * Formula texts refused before HyperFormula sees them, each with a reason
 * the user can act on: a formula nested so deep that parsing it could
 * exhaust the call stack, an array literal (`={1,2}` would silently read as
 * 1), and functions whose value depends on where a cell sits in the hidden
 * sheet (`=ROW()/10000` changes when a named value is inserted) or that give
 * another number on every run. The sheet's layout is not the user's, and a
 * budget must be reproducible.
 */
import { withoutStrings } from './formula-names';

/**
 * Deepest bracket nesting a formula may have. Hand-written budget formulas
 * need a handful of levels; HyperFormula's recursive parser overflowed the
 * stack at 150 in our tests, so the limit keeps a wide margin below that.
 */
export const MAX_FORMULA_NESTING = 32;

/** Functions that read the hidden sheet's layout (row or column numbers, sheet counts, references built from text). */
const LAYOUT_FUNCTIONS = ['ROW', 'ROWS', 'COLUMN', 'COLUMNS', 'SHEET', 'SHEETS', 'ADDRESS', 'OFFSET', 'INDIRECT', 'CELL', 'FORMULATEXT', 'ISFORMULA'];

/** Spreadsheet functions whose result changes from run to run (HyperFormula's volatile functions). */
const VOLATILE_FUNCTIONS = ['RAND', 'RANDBETWEEN', 'NOW', 'TODAY'];

const CALL = /(?<![A-Za-z0-9_.$\u00C0-\u02AF])([A-Za-z][A-Za-z0-9_.]*)\s*\(/g;

/** Deepest nesting of ( ) and { } in a text whose strings are blanked; scans iteratively. */
function nestingDepth(text: string): number {
  let depth = 0, deepest = 0;
  for (const ch of text) {
    if (ch === '(' || ch === '{') deepest = Math.max(deepest, ++depth);
    else if (ch === ')' || ch === '}') depth--;
  }
  return deepest;
}

/**
 * Why a formula (text starting with '=') may not be evaluated, or
 * undefined when it may. Throws nothing.
 */
export function formulaProblem(formula: string): string | undefined {
  const body = withoutStrings(formula.slice(1));
  const depth = nestingDepth(body);
  if (depth > MAX_FORMULA_NESTING) {
    return `nests brackets ${depth} deep; at most ${MAX_FORMULA_NESTING} are allowed: split the formula using named values`;
  }
  if (body.includes('{')) return 'holds an array literal ({...}); a cell holds one number: write the number, or a formula giving one';
  for (const m of body.matchAll(CALL)) {
    const name = m[1].toUpperCase();
    if (LAYOUT_FUNCTIONS.includes(name)) {
      return `uses ${name}(), which depends on where the cell sits in the hidden sheet and changes when cells are added; refer to names instead`;
    }
    if (VOLATILE_FUNCTIONS.includes(name)) {
      return `uses ${name}(), which gives another number on every run; a budget must be reproducible, so write a number`;
    }
  }
  return undefined;
}
