import { expect } from '@open-wc/testing';
import type { SensorKind } from '../../../src/inputs/budget-input';
import { SENSOR_KINDS } from '../../../src/sensors/registry';
import { SOURCE_KINDS } from '../../../src/sources/registry';
import { readCellText } from '../../../src/edits/cell-text';
import { convertCell, convertFormula } from '../../../src/edits/change-unit';
import { moveInGrid } from '../../../web/grid/grid-navigation';
import { idProblem, sensorIdProblem, uniqueId, valueNameProblem } from '../../../src/edits/ids';
import { parsePastedRows, rowsAsText } from '../../../web/grid/paste-rows';
import { collapseConversions, rewriteNames } from '../../../src/edits/references';
import { rowDimensions, unitGroups } from '../../../src/edits/unit-choices';

describe('the grid helpers', () => {
  it('reading typed text gives numbers, formulas, empty cells, or a reason', () => {
    expect(readCellText(' 2e-3 ')).to.deep.equal({ ok: true, content: 0.002 });
    expect(readCellText('0,5')).to.deep.equal({ ok: true, content: 0.5 });
    expect(readCellText('=a*2')).to.deep.equal({ ok: true, content: '=a*2' });
    expect(readCellText('')).to.deep.equal({ ok: true, content: undefined });
    expect(readCellText('=').ok).to.equal(false);
    expect(readCellText('0x10').ok).to.equal(false);
    expect(readCellText('twelve').ok).to.equal(false);
  });

  it('name rewriting leaves string literals, function names and longer names alone', () => {
    const upper = (n: string) => (n.toLowerCase() === 'gyro.arw' ? 'imu.arw' : undefined);
    expect(rewriteNames('=SQRT(gyro.arw)+LEN("gyro.arw")+gyro.arwx+1e-3', upper)).to.equal('=SQRT(imu.arw)+LEN("gyro.arw")+gyro.arwx+1e-3');
    expect(rewriteNames('=GYRO.ARW', upper)).to.equal('=imu.arw');
  });

  it('nested conversions of one name fold into one, or vanish when they cancel', () => {
    expect(collapseConversions('CONVERTUNIT(CONVERTUNIT(x, "a", "b"), "b", "c")')).to.equal('CONVERTUNIT(x, "a", "c")');
    expect(collapseConversions('CONVERTUNIT(CONVERTUNIT(x, "a", "b"), "b", "a")*2')).to.equal('x*2');
    expect(collapseConversions('CONVERTUNIT(CONVERTUNIT(x, "a", "b"), "c", "d")')).to.equal('CONVERTUNIT(CONVERTUNIT(x, "a", "b"), "c", "d")');
  });

  it('a formula is wrapped for a unit change unless it already converts to the old unit', () => {
    expect(convertFormula('=a+b', 'm', 'km')).to.equal('=CONVERTUNIT(a+b, "m", "km")');
    expect(convertFormula('=CONVERTUNIT(x, "mm", "m")', 'm', 'km')).to.equal('=CONVERTUNIT(x, "mm", "km")');
    expect(convertFormula('=CONVERTUNIT(x, "mm", "m")', 'm', 'mm')).to.equal('=x');
    expect(convertFormula('=CONVERTUNIT(x, "mm", "m")+CONVERTUNIT(y, "s", "m")', 'm', 'km'))
      .to.equal('=CONVERTUNIT(CONVERTUNIT(x, "mm", "m")+CONVERTUNIT(y, "s", "m"), "m", "km")');
  });

  it('a number converts between units of one dimension and is kept across dimensions', () => {
    expect(convertCell(1500, 'ppm', '%')).to.deep.equal({ content: 0.15, converted: true });
    expect(convertCell(0.1, 'deg/√h', 'deg/s')).to.deep.equal({ content: 0.1, converted: false });
    expect(convertCell(3, 'furlong', 'm')).to.deep.equal({ content: 3, converted: false });
  });

  it('each sensor narrows row units to dimensions the registry allows for kinds the sensor takes', () => {
    for (const [sensor, spec] of Object.entries(SENSOR_KINDS)) {
      for (const [kind, dims] of Object.entries(spec.rows)) {
        expect(SENSOR_KINDS[sensor as SensorKind].sourceKinds, `${sensor} ${kind}`).to.include(kind);
        const allowed = SOURCE_KINDS[kind as keyof typeof SOURCE_KINDS].parameters.find((p) => p.field === 'value')!.dimensions;
        for (const d of dims) expect(allowed, `${sensor} ${kind}`).to.include(d);
      }
    }
    expect(rowDimensions('compass', 'turn-on-bias')).to.deep.equal(['angle']);
    expect(rowDimensions('yaw-gyro', 'scale-factor')).to.deep.equal(['ratio']);
    expect(rowDimensions('yaw-gyro', 'bias-instability', 'correlationTime')).to.deep.equal(['time']);
  });

  it('the unit list keeps a current unit that no group offers', () => {
    expect(unitGroups(['length'], 'furlong')[0]).to.deep.equal({ label: 'as written (not a unit this field takes)', units: ['furlong'] });
    expect(unitGroups(['length'], 'km')).to.have.length(1);
  });

  it('ids follow the schema rule, ignore case for uniqueness, and new ones are unique', () => {
    expect(idProblem('imu_2', ['gyro'], 'row id')).to.equal(undefined);
    expect(idProblem('2imu', [], 'row id')).to.contain('starts with a letter');
    expect(idProblem('GYRO', ['gyro'], 'row id')).to.contain('already used');
    expect(sensorIdProblem('Mission', [])).to.contain('reserved');
    expect(valueNameProblem('ARW1', [])).to.contain('cell reference');
    expect(uniqueId('bi', ['bi', 'BI2'])).to.equal('bi3');
    expect(uniqueId('9 lives!', [])).to.equal('lives');
  });

  it('arrow moves skip missing cells and Tab wraps between rows and leaves at the ends', () => {
    const present = [[true, true, false, true], [true, false, false, true]];
    expect(moveInGrid(present, { row: 0, col: 1 }, 'right')).to.deep.equal({ row: 0, col: 3 });
    expect(moveInGrid(present, { row: 0, col: 1 }, 'down')).to.deep.equal({ row: 1, col: 0 });
    expect(moveInGrid(present, { row: 0, col: 3 }, 'next')).to.deep.equal({ row: 1, col: 0 });
    expect(moveInGrid(present, { row: 1, col: 3 }, 'next')).to.equal(undefined);
    expect(moveInGrid(present, { row: 0, col: 0 }, 'previous')).to.equal(undefined);
    expect(moveInGrid(present, { row: 1, col: 3 }, 'down')).to.deep.equal({ row: 1, col: 3 });
  });

  it('pasted text skips a header and blank lines, reads kind labels, and reports the rest', () => {
    const { rows, problems } = parsePastedRows('Id\tKind\n\nq\tQuantization\t0.01\tdeg/s\r\nx\tscale factor\t\tppm\ny\twhite noise\t1\tdeg\tmore\tcolumns\there\ttoo', 'yaw-gyro');
    expect(rows).to.deep.equal([{ id: 'q', kind: 'quantisation', value: 0.01, unit: 'deg/s' }]);
    expect(problems.map((p) => [p.line, p.message])).to.deep.equal([
      [4, 'has no value'],
      [5, 'has 8 columns; expected at most 7 (id, kind, value, unit, correlation time, correlation time unit, provenance)'],
    ]);
  });

  it('copied rows read back as the same rows', () => {
    const row = { id: 'bi', kind: 'bias-instability' as const, value: '=a*2', unit: 'deg/h', correlationTime: { value: 300, unit: 's' }, provenance: 'plot\tfig 3', assumed: false };
    const { rows } = parsePastedRows(rowsAsText([row]), 'yaw-gyro');
    expect(rows[0]).to.deep.equal({ id: 'bi', kind: 'bias-instability', value: '=a*2', unit: 'deg/h', correlationTime: { value: 300, unit: 's' }, provenance: 'plot fig 3' });
  });
});
