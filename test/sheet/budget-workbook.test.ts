import { afterEach, describe, expect, it } from 'vitest';
import { parseBudgetDocument, serializeBudgetDocument } from '../../src/document';
import { InputError } from '../../src/errors';
import { BudgetWorkbook } from '../../src/sheet';
import { minimalDocument } from '../document/minimal-document';

let workbook: BudgetWorkbook | undefined;
afterEach(() => workbook?.destroy());

/** A workbook on the minimal document, released after the test. */
function open(): BudgetWorkbook {
  workbook = new BudgetWorkbook(minimalDocument());
  return workbook;
}

describe('BudgetWorkbook', () => {
  it('lists its value cells in document order', () => {
    const paths = open().cellPaths;
    expect(paths[0]).toBe('settings.step.value');
    expect(paths[1]).toBe('values.cruiseSpeed.value');
    expect(paths.indexOf('mission.start.north.value')).toBeLessThan(paths.indexOf('sensors[0].rate.value'));
    expect(paths.at(-1)).toBe('checkpoints[0].time.value');
  });

  it('recomputes the cells that use a cell when it is set', () => {
    const wb = open();
    wb.setCell('values.cruiseSpeed.value', '=3*1.5');
    expect(wb.evaluate().input!.mission.segments[0].speed).toEqual({ value: 4.5, unit: 'm/s' });
  });

  it('reports bad content set into a cell instead of throwing, and clears it when fixed', () => {
    const wb = open();
    wb.setCell('sensors[0].sources[1].value', '=1/');
    expect(wb.evaluate().cellErrors.map((e) => e.location.path)).toEqual(['sensors[0].sources[1].value']);
    wb.setCell('sensors[0].sources[1].value', 7);
    const ev = wb.evaluate();
    expect(ev.cellErrors).toEqual([]);
    expect(ev.input!.sensors[0].sources[1].value).toEqual({ value: 7, unit: 'deg/h' });
  });

  it('changes a unit without touching the numbers that refer to the cell', () => {
    const wb = open();
    wb.setCell('sensors[1].sources[0].value', '=gyro.arw');
    wb.setUnit('sensors[0].sources[0].unit', 'deg/s/√Hz');
    const ev = wb.evaluate();
    expect(ev.input!.sensors[0].sources[0].value).toEqual({ value: 0.2, unit: 'deg/s/√Hz' });
    expect(ev.cellValues.get('sensors[1].sources[0].value')).toBe(0.2);
  });

  it('throws an InputError for a path that is not a value cell', () => {
    const wb = open();
    expect(() => wb.setCell('sensors[0].sources[9].value', 1)).toThrow(InputError);
    expect(() => wb.setCell('sensors[0].sources[0].unit', 1)).toThrow(/is not the value of a value cell/);
    expect(() => wb.setUnit('sensors[0].sources[0].value', 'm')).toThrow(/is not the unit of a value cell/);
  });

  it('gives back the edited document, ready to save, and leaves the original alone', () => {
    const original = minimalDocument();
    workbook = new BudgetWorkbook(original);
    workbook.setCell('mission.segments[0].duration.value', 90);
    const saved = serializeBudgetDocument(workbook.document);
    expect(parseBudgetDocument(saved, 'saved.json').document.mission.segments[0].duration.value).toBe(90);
    expect(original.mission.segments[0].duration.value).toBe(60);
  });
});
