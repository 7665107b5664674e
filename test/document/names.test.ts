import { HyperFormula } from 'hyperformula';
import { afterAll, describe, expect, it } from 'vitest';
import { formulaNameProblem, rowCellName } from '../../src/document';

// The outside world here is HyperFormula 3.5 itself: NamedExpressions.isNameValid, reached through
// the public isItPossibleToAddNamedExpression.
const engine = HyperFormula.buildEmpty({ licenseKey: 'gpl-v3' });
afterAll(() => engine.destroy());

const NAMES = ['ARW1', 'arw1', 'A1', 'XFD1048576', 'rc', 'R1C1', 'r2c', 'R', 'C', 'gyro.arw', 'gyro1.arw', 'cruiseSpeed',
  '_private', 'TyreCircumference', 'imu.arw', 'x-y', '1abc', 'a b', 'ÀB1', 'gyro_arw', 'mission.initialPosition', 'A1.b', 'A.1'];

describe('formulaNameProblem', () => {
  it.each(NAMES)('agrees with HyperFormula on %s', (name) => {
    expect(formulaNameProblem(name) === undefined).toBe(engine.isItPossibleToAddNamedExpression(name, '=1'));
  });

  it('says a name such as ARW1 looks like a cell reference and suggests a fix that works', () => {
    const problem = formulaNameProblem('ARW1')!;
    expect(problem).toContain('column ARW, row 1');
    expect(formulaNameProblem('ARW_1')).toBeUndefined();
  });

  it('suggests a usable name for R1C1-like names', () => {
    expect(formulaNameProblem('rc')).toContain('"rc_value"');
    expect(formulaNameProblem('rc_value')).toBeUndefined();
  });

  it('accepts every row cell name, because the dot keeps it from reading as a cell', () => {
    for (const field of ['value', 'correlationTime', 'rate'] as const) expect(formulaNameProblem(rowCellName('A1', 'B2', field))).toBeUndefined();
    expect(rowCellName('gyro', 'bi', 'correlationTime')).toBe('gyro.bi.correlationTime');
    expect(rowCellName('gyro', 'arw', 'value')).toBe('gyro.arw');
  });
});
