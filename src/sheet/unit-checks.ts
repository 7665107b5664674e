/**
 * Unit texts checked per cell, so a misspelt unit is reported in place and
 * leaves the rest of the budget computable. Where a field fixes the
 * dimension (a duration is a time) it is checked too; a row's magnitude and
 * a requirement's limit need only be readable here, because which
 * dimensions they accept depends on the row's form and the quantity, which
 * the engine checks.
 */
import { SigmaLedgerError } from '../errors';
import { readUnit, unitFor, unitProblemMessage, type DimensionName } from '../units';

/**
 * Why `unit` will not do for a cell expecting `expected` (any dimension when
 * undefined), or undefined when it will. Throws nothing.
 */
export function unitProblem(unit: string, expected: DimensionName | undefined): string | undefined {
  if (expected === undefined) {
    const reading = readUnit(unit);
    return reading.ok ? undefined : unitProblemMessage(unit, reading);
  }
  try {
    unitFor(unit, expected, '');
    return undefined;
  } catch (e) {
    if (e instanceof SigmaLedgerError) return e.message;
    throw e;
  }
}
