/**
 * The document edits shared by the page and the command line (src/edits),
 * under Node: unit changes that keep the physical value, renames that follow
 * formula references, the id rules, and reading typed cell text.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseBudgetDocument, type BudgetDocument } from '../../src/document';
import { changeUnit, convertFormula } from '../../src/edits/change-unit';
import { renameValueReferences, rewriteNames } from '../../src/edits/references';
import { idProblem, sensorIdProblem, uniqueId, valueNameProblem } from '../../src/edits/ids';
import { readCellText } from '../../src/edits/cell-text';
import { evaluateBudgetDocument } from '../../src/sheet';

function orchard(): BudgetDocument {
  return parseBudgetDocument(readFileSync('budgets/orchard-rover.json', 'utf8'), 'orchard-rover.json').document;
}

describe('changing a unit', () => {
  it('converts a number so the physical value stays: 0.004 deg/s/√Hz is 0.24 deg/√h', () => {
    // 1 deg/s/√Hz = 1 deg/√s = 60 deg/√h, since √h = √3600 √s = 60 √s (IEEE Std 952 units of angle random walk).
    const doc = orchard();
    const message = changeUnit(doc, 'sensors[0].sources[0]', 'deg/√h');
    expect(doc.sensors[0].sources[0]).toMatchObject({ value: 0.24, unit: 'deg/√h' });
    expect(message).toBe('Converted from deg/s/√Hz to deg/√h.');
  });

  it('wraps a formula in the unit conversion, and unwraps it when converted back', () => {
    expect(convertFormula('=rowLength/rowSpeed', 's', 'min')).toBe('=CONVERTUNIT(rowLength/rowSpeed, "s", "min")');
    expect(convertFormula('=CONVERTUNIT(rowLength/rowSpeed, "s", "min")', 'min', 's')).toBe('=rowLength/rowSpeed');
  });

  it('leaves the sheet\'s numbers unchanged when a named value changes unit (1 m = 100 cm, SI definition)', () => {
    const doc = orchard();
    const before = evaluateBudgetDocument(doc).cellValues.get('mission.segments[0].duration.value');
    changeUnit(doc, 'values.rowLength', 'cm');
    expect(doc.values!.rowLength).toMatchObject({ value: 12000, unit: 'cm' });
    const after = evaluateBudgetDocument(doc).cellValues.get('mission.segments[0].duration.value');
    expect(before).toBe(100); // 120 m at 1.2 m/s
    expect(after).toBeCloseTo(100, 9);
  });

  it('keeps the value as written, and says so, when the units do not convert', () => {
    const doc = orchard();
    expect(changeUnit(doc, 'values.rowLength', 's')).toContain('the value was kept as written');
    expect(doc.values!.rowLength).toMatchObject({ value: 120, unit: 's' });
  });
});

describe('renaming', () => {
  it('rewrites every formula that uses a named value, ignoring letter case, but not text in strings', () => {
    const doc = orchard();
    const changed = renameValueReferences(doc, 'rowSpeed', 'alleySpeed');
    expect(changed).toBeGreaterThan(0);
    expect(doc.mission.segments[0].duration.value).toBe('=rowLength/alleySpeed');
    expect(rewriteNames('=ROWSPEED*2&"rowSpeed"', (n) => (n.toLowerCase() === 'rowspeed' ? 'v' : undefined))).toBe('=v*2&"rowSpeed"');
  });

  it('leaves function names alone', () => {
    expect(rewriteNames('=PI()*pi', (n) => (n.toLowerCase() === 'pi' ? 'x' : undefined))).toBe('=PI()*x');
  });
});

describe('ids and names (the budget schema\'s id and valueName patterns)', () => {
  it('accepts a letter then letters, digits or "_", and refuses others with the rule', () => {
    expect(idProblem('imu_2', [], 'row id')).toBeUndefined();
    expect(idProblem('2imu', [], 'row id')).toContain('starts with a letter');
    expect(idProblem('a'.repeat(65), [], 'row id')).toContain('at most 64');
  });

  it('refuses an id already taken in another letter case, and the reserved sensor id "mission"', () => {
    expect(idProblem('GYRO', ['gyro'], 'sensor id')).toContain('already used');
    expect(sensorIdProblem('Mission', [])).toContain('reserved');
  });

  it('refuses names the formula engine would read as a cell reference', () => {
    // HyperFormula reads ARW1 as column ARW, row 1 (spreadsheet A1 references).
    expect(valueNameProblem('ARW1', [])).toBeDefined();
    expect(valueNameProblem('gyro_arw', [])).toBeUndefined();
  });

  it('makes a unique id by dropping unusable characters and counting up', () => {
    expect(uniqueId('gyro', ['gyro', 'gyro2'])).toBe('gyro3');
    expect(uniqueId('2 wheel-speed', [])).toBe('wheelspeed');
    expect(uniqueId('mission', [])).toBe('itemmission');
  });
});

describe('typed cell text', () => {
  it('reads numbers in any JavaScript notation and keeps a formula as text', () => {
    expect(readCellText(' 2e-3 ')).toEqual({ ok: true, content: 0.002 });
    expect(readCellText('=rowLength/2')).toEqual({ ok: true, content: '=rowLength/2' });
  });
});
