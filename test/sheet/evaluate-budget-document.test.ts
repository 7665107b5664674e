import { describe, expect, it } from 'vitest';
import type { BudgetDocument } from '../../src/document';
import { evaluateBudgetDocument } from '../../src/sheet';
import { convert } from '../../src/units';
import { expectRelative } from '../units/expect-relative';
import { minimalDocument } from '../document/minimal-document';

/** The minimal document after `change`, evaluated. */
function evaluated(change: (doc: BudgetDocument) => void = () => {}) {
  const doc = minimalDocument();
  change(doc);
  return evaluateBudgetDocument(doc);
}

describe('evaluateBudgetDocument with good cells', () => {
  it('passes numbers through with their units into the engine input', () => {
    const { input, cellErrors, omitted } = evaluated();
    expect(cellErrors).toEqual([]);
    expect(omitted).toEqual([]);
    expect(input!.step).toEqual({ value: 1, unit: 's' });
    expect(input!.sensors[0].sources[1]).toEqual({
      id: 'bi', kind: 'bias-instability', value: { value: 5, unit: 'deg/h' }, correlationTime: { value: 150, unit: 's' },
      provenance: 'invented datasheet', assumed: false,
    });
    expect(input!.mission.initialSigma).toEqual({ position: { value: 1, unit: 'm' }, heading: { value: 1, unit: 'deg' } });
  });

  it('evaluates a reference to a named value as the number written there', () => {
    expect(evaluated().input!.mission.segments[0].speed).toEqual({ value: 2, unit: 'm/s' });
  });

  it('evaluates arithmetic and functions such as SQRT', () => {
    const { cellValues } = evaluated((d) => { d.sensors[0].sources[0].value = '=SQRT(2)*0.1+1e-3'; });
    expect(cellValues.get('sensors[0].sources[0].value')).toBe(Math.SQRT2 * 0.1 + 1e-3);
  });

  it('lets a row refer to another row by its full id, and to its correlation time', () => {
    const { cellValues } = evaluated((d) => {
      d.sensors[1].sources[0].value = '=gyro.bi*2';
      d.checkpoints![0].time = { value: '=gyro.bi.correlationTime/3', unit: 's' };
    });
    expect(cellValues.get('sensors[1].sources[0].value')).toBe(10);
    expect(cellValues.get('checkpoints[0].time.value')).toBe(50);
  });

  it('reads names regardless of letter case, as spreadsheets do', () => {
    expect(evaluated((d) => { d.sensors[1].sources[0].value = '=GYRO.BI+CRUISESPEED'; }).cellValues.get('sensors[1].sources[0].value')).toBe(7);
  });

  it('lets formulas use the start-pose sources by their source ids', () => {
    const { cellValues } = evaluated((d) => { d.mission.initialHeading.value = '=mission.initialPosition*3'; });
    expect(cellValues.get('mission.initialHeading.value')).toBe(3);
  });

  it('keeps full double precision (=1.0000000000001-1 is not 0)', () => {
    const { cellValues } = evaluated((d) => { d.values!.tiny = { value: '=1.0000000000001-1', unit: 'm' }; });
    const tiny = cellValues.get('values.tiny.value')!;
    expect(tiny).not.toBe(0);
    expect(tiny).toBe(1.0000000000001 - 1);
  });

  it('converts with CONVERTUNIT exactly as src/units does', () => {
    const { cellValues } = evaluated((d) => {
      d.values!.rate = { value: '=CONVERTUNIT(1, "deg/h", "rad/s")', unit: 'rad/s' };
      d.values!.arw = { value: '=CONVERTUNIT(0.01, "deg/s/√Hz", "deg/√h")', unit: 'deg/√h' };
    });
    // docs/checks.md §2 (computed, pure arithmetic): 1 °/h = 4.84813681109536e-06 rad/s; 0.01 °/s/√Hz = 0.6 °/√h.
    expectRelative(cellValues.get('values.rate.value')!, 4.84813681109536e-6, 1e-15);
    expect(cellValues.get('values.rate.value')).toBe(convert(1, 'deg/h', 'rad/s', ''));
    expectRelative(cellValues.get('values.arw.value')!, 0.6, 1e-15);
  });

  it('does not change the document it was given', () => {
    const doc = minimalDocument();
    evaluateBudgetDocument(doc);
    expect(doc).toEqual(minimalDocument());
  });

  it('copies form options and annotations of a row and leaves absent ones out', () => {
    const { input } = evaluated((d) => { d.sensors[0].sources[0].densitySides = 'one'; });
    expect(input!.sensors[0].sources[0]).toEqual({
      id: 'arw', kind: 'white-noise', value: { value: 0.2, unit: 'deg/√h' }, densitySides: 'one', provenance: 'invented datasheet', assumed: false,
    });
  });
});
