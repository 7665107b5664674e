import { describe, expect, it } from 'vitest';
import type { BudgetDocument } from '../../src/document';
import { evaluateBudgetDocument, type CellError } from '../../src/sheet';
import { minimalDocument } from '../document/minimal-document';

/** The minimal document after `change`, evaluated. */
function evaluated(change: (doc: BudgetDocument) => void) {
  const doc = minimalDocument();
  change(doc);
  return evaluateBudgetDocument(doc);
}

/** The one error reported at `path`. */
function errorAt(errors: CellError[], path: string): CellError {
  const found = errors.filter((e) => e.location.path === path);
  expect(found, `errors at ${path}: ${JSON.stringify(errors)}`).toHaveLength(1);
  return found[0];
}

describe('a bad cell is reported for that cell while the rest evaluates', () => {
  it('reports division by zero at the row, leaves the row out and keeps the others', () => {
    const ev = evaluated((d) => { d.sensors[0].sources[1].value = '=1/0'; });
    const e = errorAt(ev.cellErrors, 'sensors[0].sources[1].value');
    expect(e.kind).toBe('division-by-zero');
    expect(e.location).toEqual({ path: 'sensors[0].sources[1].value', field: 'value', sensorId: 'gyro', rowId: 'bi', name: 'gyro.bi' });
    expect(ev.input!.sensors[0].sources.map((s) => s.id)).toEqual(['arw']);
    expect(ev.omitted).toEqual([{ path: 'sensors[0].sources[1]', what: 'row gyro.bi' }]);
    expect(ev.indexMap.sources[0]).toEqual([0]);
    expect(ev.cellValues.get('sensors[0].sources[0].value')).toBe(0.2);
  });

  it('reports an unknown name and says what names exist', () => {
    const ev = evaluated((d) => { d.sensors[1].sources[0].value = '=gyro.nope*2'; });
    const e = errorAt(ev.cellErrors, 'sensors[1].sources[0].value');
    expect(e.kind).toBe('unknown-name');
    expect(e.message).toContain('uses "gyro.nope", which is not a name in this budget');
    expect(ev.input!.sensors[1].sources).toEqual([]);
  });

  it('reports an unknown function', () => {
    const e = errorAt(evaluated((d) => { d.values!.x = { value: '=CONVERT(1, "m", "km")', unit: 'km' }; }).cellErrors, 'values.x.value');
    expect(e.kind).toBe('unknown-name');
    expect(e.message).toContain('the function CONVERT, which does not exist');
  });

  it('reports a circular reference at every cell of the loop, spelled out, and the cells that use it', () => {
    const ev = evaluated((d) => {
      d.sensors[0].sources[0].value = '=gyro.bi*2';
      d.sensors[0].sources[1].value = '=gyro.arw/2';
      d.sensors[1].sources[0].value = '=gyro.arw';
    });
    const arw = errorAt(ev.cellErrors, 'sensors[0].sources[0].value');
    expect(arw.kind).toBe('cycle');
    expect(arw.message).toContain('(gyro.arw → gyro.bi → gyro.arw)');
    expect(errorAt(ev.cellErrors, 'sensors[0].sources[1].value').kind).toBe('cycle');
    const user = errorAt(ev.cellErrors, 'sensors[1].sources[0].value');
    expect(user.kind).toBe('dependency');
    expect(user.message).toContain('uses gyro.arw, which has an error');
    expect(ev.input!.mission.segments).toHaveLength(1);
  });

  it('reports a cell that refers to itself', () => {
    const e = errorAt(evaluated((d) => { d.sensors[0].sources[0].value = '=gyro.arw*2'; }).cellErrors, 'sensors[0].sources[0].value');
    expect(e.kind).toBe('cycle');
    expect(e.message).toContain('(gyro.arw → gyro.arw)');
  });

  it('follows a long chain of references to its root cause without running out of stack', () => {
    const ev = evaluated((d) => {
      d.values = { v0: { value: '=1/0', unit: 'm' } };
      for (let i = 1; i < 500; i++) d.values[`v${i}`] = { value: `=v${i - 1}+1`, unit: 'm' };
      d.mission.segments[0].speed.value = 2;
    });
    const last = errorAt(ev.cellErrors, 'values.v499.value');
    expect(last.message).toBe('uses v498, which has an error (values.v0.value: divides by zero)');
    expect(ev.input).toBeDefined();
  });

  it('reports text where a number is needed', () => {
    const ev = evaluated((d) => { d.sensors[1].sources[0].value = '="abc"+1'; d.values!.word = { value: '="abc"', unit: 'm' }; });
    expect(errorAt(ev.cellErrors, 'sensors[1].sources[0].value').kind).toBe('not-a-number');
    const word = errorAt(ev.cellErrors, 'values.word.value');
    expect(word.kind).toBe('not-a-number');
    expect(word.message).toContain('gives the text "abc", but a number is needed');
  });

  it('reports a formula that cannot be read', () => {
    const e = errorAt(evaluated((d) => { d.sensors[1].sources[0].value = '=1+*2'; }).cellErrors, 'sensors[1].sources[0].value');
    expect(e.kind).toBe('syntax');
  });

  it('reports a grid position such as A1, which is not the user\'s to use', () => {
    const e = errorAt(evaluated((d) => { d.sensors[1].sources[0].value = '=A1*2'; }).cellErrors, 'sensors[1].sources[0].value');
    expect(e.kind).toBe('position');
    expect(e.message).toContain('refers to the grid position A1');
  });

  it('reports content that is neither a number nor a formula, and cells using it fail rather than read 0', () => {
    const ev = evaluated((d) => {
      (d.values!.cruiseSpeed as { value: unknown }).value = 'fast';
    });
    expect(errorAt(ev.cellErrors, 'values.cruiseSpeed.value').kind).toBe('content');
    const speed = errorAt(ev.cellErrors, 'mission.segments[0].speed.value');
    expect(speed.kind).toBe('dependency');
    expect(speed.message).toContain('(values.cruiseSpeed.value: must be a number');
  });

  it('names the root cause through a chain of references', () => {
    const ev = evaluated((d) => {
      d.values!.a = { value: '=1/0', unit: 'm' };
      d.values!.b = { value: '=a+1', unit: 'm' };
      d.sensors[1].sources[0].value = '=b*2';
    });
    const e = errorAt(ev.cellErrors, 'sensors[1].sources[0].value');
    expect(e.message).toBe('uses b, which has an error (values.a.value: divides by zero)');
  });

  it('reports incompatible units in CONVERTUNIT with the units named', () => {
    const e = errorAt(evaluated((d) => { d.values!.x = { value: '=CONVERTUNIT(1, "deg/h", "m/s")', unit: 'm/s' }; }).cellErrors, 'values.x.value');
    expect(e.kind).toBe('unit');
    expect(e.message).toBe("CONVERTUNIT: 'deg/h' is an angular rate; expected a speed such as m/s, km/h, kn");
  });

  it('reports a misspelt unit at the unit and leaves the item out', () => {
    const ev = evaluated((d) => { d.sensors[0].sources[1].correlationTime!.unit = 'sek'; d.requirements![0].limit.unit = 'degs'; });
    const e = errorAt(ev.cellErrors, 'sensors[0].sources[1].correlationTime.unit');
    expect(e.kind).toBe('unit');
    expect(e.location.field).toBe('correlationTime');
    expect(errorAt(ev.cellErrors, 'requirements[0].limit.unit').kind).toBe('unit');
    expect(ev.input!.sensors[0].sources.map((s) => s.id)).toEqual(['arw']);
    expect(ev.input!.requirements).toEqual([]);
  });

  it('reports a unit of the wrong dimension where the field fixes it', () => {
    const e = errorAt(evaluated((d) => { d.mission.segments[0].duration.unit = 'm'; }).cellErrors, 'mission.segments[0].duration.unit');
    expect(e.message).toContain('expected a time');
  });
});

describe('what is left out when a cell fails', () => {
  it('leaves out a requirement and a checkpoint whose cells fail', () => {
    const ev = evaluated((d) => {
      d.requirements![0].limit.value = '=nothing';
      d.checkpoints![0].time.value = '=1/0';
    });
    expect(ev.input!.requirements).toEqual([]);
    expect(ev.input!.checkpoints).toEqual([]);
    expect(ev.omitted.map((o) => o.what)).toEqual(['requirement heading', 'checkpoint end']);
  });

  it('makes no input when one segment fails, because later times would shift', () => {
    const ev = evaluated((d) => {
      d.mission.segments.push({ ...d.mission.segments[0], id: 'second', duration: { value: '=1/0', unit: 's' } });
    });
    expect(ev.input).toBeUndefined();
    expect(ev.blocked).toContain('mission.segments[1]');
  });

  it('leaves out a whole sensor whose rate fails', () => {
    const ev = evaluated((d) => { d.sensors[1].rate.value = '=1/0'; });
    expect(ev.input!.sensors.map((s) => s.id)).toEqual(['gyro']);
    expect(ev.indexMap.sensors).toEqual([0]);
    expect(ev.omitted).toEqual([{ path: 'sensors[1]', what: 'sensor odo' }]);
  });

  it('makes no input when a start-pose cell fails, and says why instead of throwing', () => {
    const ev = evaluated((d) => { d.mission.start.heading.value = '=1/0'; });
    expect(ev.input).toBeUndefined();
    expect(ev.blocked).toContain('start pose');
    expect(errorAt(ev.cellErrors, 'mission.start.heading.value').location.field).toBe('start.heading');
  });

  it('makes no input when the step fails', () => {
    const ev = evaluated((d) => { d.settings.step.value = '=0/0'; });
    expect(ev.input).toBeUndefined();
    expect(ev.blocked).toContain('settings.step');
  });

  it('makes no input when every segment fails', () => {
    expect(evaluated((d) => { d.mission.segments[0].speed.value = '=nothing'; }).blocked).toContain('mission.segments[0]');
  });
});

describe('names HyperFormula would refuse', () => {
  it('gets our message, and a formula using one is read as a grid position', () => {
    // parseBudgetDocument refuses such a name; a document built in code can still carry one.
    const ev = evaluated((d) => {
      d.values!.ARW1 = { value: 0.3, unit: 'deg/√h' };
      d.sensors[0].sources[0].value = '=ARW1';
    });
    const e = errorAt(ev.cellErrors, 'values.ARW1');
    expect(e.kind).toBe('name');
    expect(e.message).toContain('looks like a cell reference (column ARW, row 1)');
    expect(ev.cellValues.get('values.ARW1.value')).toBe(0.3);
    expect(errorAt(ev.cellErrors, 'sensors[0].sources[0].value').kind).toBe('position');
  });

  it('reports a second name that differs only in case instead of failing the whole workbook', () => {
    const ev = evaluated((d) => { d.values!.CruiseSpeed = { value: 3, unit: 'm/s' }; });
    expect(errorAt(ev.cellErrors, 'values.CruiseSpeed').message).toContain('used by another cell');
    expect(ev.input!.mission.segments[0].speed.value).toBe(2);
  });
});
