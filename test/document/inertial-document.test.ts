import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseAnyBudgetDocument, parseBudgetDocument, type InertialBudgetDocument } from '../../src/document';
import { evaluateInertialDocument } from '../../src/sheet/inertial-workbook';

const DRONE = 'budgets/survey-drone.json';
const text = () => readFileSync(DRONE, 'utf8');
const drone = () => parseAnyBudgetDocument(text(), DRONE).document as InertialBudgetDocument;

describe('a 3-D budget document (budgets/survey-drone.json)', () => {
  it('parses as an inertial document with no notes', () => {
    const { document, notes } = parseAnyBudgetDocument(text(), DRONE);
    expect(document.model).toBe('inertial');
    expect(notes).toEqual([]);
  });

  it('is refused by the planar-only parser, naming model', () => {
    expect(() => parseBudgetDocument(text(), DRONE)).toThrow(/model: this is a 3-D \(inertial\) budget/);
  });

  it('evaluates every cell, formulas included, into the inertial input', () => {
    const ev = evaluateInertialDocument(drone());
    expect(ev.cellErrors).toEqual([]);
    expect(ev.omitted).toEqual([]);
    const input = ev.input!;
    expect(input.imu.rows.map((r) => r.id)).toEqual(['gArw', 'gBi', 'gBiz', 'gBias', 'gSf', 'aVrw', 'aBi', 'aBias', 'aSf']);
    expect(input.imu.rows[2]).toMatchObject({ instrument: 'gyro', axis: 'z' });
    expect(input.aiding.map((a) => a.kind)).toEqual(['gnss-position', 'gnss-velocity', 'barometer']);
    // =outageStart+outageLength with 150 s and 40 s.
    expect(input.aiding[0].outages![0].end).toEqual({ value: 190, unit: 's' });
    expect(input.aiding[0].rows[0].vertical).toEqual({ value: 2.5, unit: 'm' });
    expect(input.mission.initialSigma.verticalPosition).toEqual({ value: 4, unit: 'm' });
    expect(input.mission.segments[2].speed).toEqual({ value: 6, unit: 'm/s' });
  });

  it('leaves out a row whose cell fails and names it', () => {
    const doc = drone();
    doc.sensors[0].sources[1].value = '=noSuchName';
    const ev = evaluateInertialDocument(doc);
    expect(ev.cellErrors[0].location.path).toBe('sensors[0].sources[1].value');
    expect(ev.omitted).toEqual([{ path: 'sensors[0].sources[1]', what: 'row imu.gBi' }]);
    expect(ev.input!.imu.rows).toHaveLength(8);
  });

  it('names a vertical cell in formulas', () => {
    const doc = drone();
    doc.sensors[2].sources[0].vertical = { value: '=gnss.white.vertical/2', unit: 'm/s' };
    expect(evaluateInertialDocument(doc).input!.aiding[1].rows[0].vertical).toEqual({ value: 1.25, unit: 'm/s' });
  });
});
