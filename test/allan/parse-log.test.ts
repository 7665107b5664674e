import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { MAX_LINE_CHARS, parseSensorLog, SensorLogReader, type LogParseOptions } from '../../src/allan/parse-log';
import { InputError } from '../../src/errors';

const LOG = ['# bench log, invented', '', 'time_s,gyro_z_dps,temp_c', '0.00,0.10,20', '0.01,0.20,20', '0.02,0.15,21', '0.03,0.12,21', '0.04,0.11,21', ''].join('\n');
const OPTIONS: LogParseOptions = { valueColumns: ['gyro_z_dps'], timeColumn: 'time_s', sourceName: 'bench.csv' };

/** The message of the InputError that `run` throws (fails the test when it throws nothing or something else). */
function messageOf(run: () => unknown): string {
  try {
    run();
  } catch (e) {
    expect(e).toBeInstanceOf(InputError);
    return (e as Error).message;
  }
  throw new Error('expected an InputError');
}

function readInChunks(text: string, cuts: number[], options: LogParseOptions) {
  const reader = new SensorLogReader(options);
  let at = 0;
  for (const cut of [...cuts].sort((a, b) => a - b)) {
    reader.push(text.slice(at, cut));
    at = cut;
  }
  reader.push(text.slice(at));
  return reader.finish();
}

describe('reading a sensor log', () => {
  it('reads the chosen columns after comment and blank lines, and takes the rate from the time column', () => {
    const t = parseSensorLog(LOG, OPTIONS);
    expect(Array.from(t.values[0])).toEqual([0.1, 0.2, 0.15, 0.12, 0.11]);
    expect(Array.from(t.timeS!)).toEqual([0, 0.01, 0.02, 0.03, 0.04]);
    expect(t.rateHz).toBeCloseTo(100, 9);
    expect(t.columnsFound).toEqual(['time_s', 'gyro_z_dps', 'temp_c']);
    expect(t.headerLine).toBe(3);
  });

  it('reads tab, semicolon and CRLF logs, a byte-order mark, quoted names and names in another case', () => {
    const tsv = parseSensorLog(LOG.replace(/,/g, '\t'), OPTIONS);
    expect(tsv.rowCount).toBe(5);
    const semicolons = parseSensorLog('\uFEFF' + LOG.replace(/,/g, ';').replace(/\n/g, '\r\n'), { ...OPTIONS, valueColumns: ['GYRO_Z_DPS'] });
    expect(Array.from(semicolons.values[0])).toEqual([0.1, 0.2, 0.15, 0.12, 0.11]);
    const quoted = parseSensorLog('"t, s","rate, deg/s"\n1,2\n2,3\n3,4\n4,"5"\n', { valueColumns: ['rate, deg/s'], timeColumn: 't, s' });
    expect(Array.from(quoted.values[0])).toEqual([2, 3, 4, 5]);
  });

  it('converts the time column from its unit to seconds', () => {
    const t = parseSensorLog(LOG.replace('time_s', 'time_ms').replace(/^0\.0(\d),/gm, '$10,'), { ...OPTIONS, timeColumn: 'time_ms', timeUnit: 'ms' });
    expect(Array.from(t.timeS!)).toEqual([0, 0.01, 0.02, 0.03, 0.04]);
    expect(t.rateHz).toBeCloseTo(100, 9);
  });

  it('gives the same table however the text is cut into chunks', () => {
    // Property (fast-check): chunk boundaries anywhere, CRLF or LF, a quoted cell holding a line end.
    const text = LOG.replace('temp_c', '"temp, c"').replace('0.02,0.15,21', '0.02,0.15,"21\nnote"');
    const whole = parseSensorLog(text, OPTIONS);
    fc.assert(
      fc.property(fc.boolean(), fc.array(fc.nat({ max: text.length * 2 }), { maxLength: 12 }), (crlf, raw) => {
        const source = crlf ? text.replace(/\n/g, '\r\n') : text;
        const t = readInChunks(source, raw.map((c) => c % (source.length + 1)), OPTIONS);
        expect(Array.from(t.values[0])).toEqual(Array.from(whole.values[0]));
        expect(Array.from(t.timeS!)).toEqual(Array.from(whole.timeS!));
      }),
    );
  });

  it('names the same line in an error however the text is cut into chunks', () => {
    const bad = LOG.replace('0.12', 'n/a');
    fc.assert(
      fc.property(fc.array(fc.nat({ max: bad.length }), { maxLength: 8 }), (cuts) => {
        expect(messageOf(() => readInChunks(bad, cuts, OPTIONS))).toMatch(/^bench\.csv line 7, column "gyro_z_dps": "n\/a" is not a number/);
      }),
    );
  });
});

describe('bad logs', () => {
  it('a missing column: lists the columns found', () => {
    const m = messageOf(() => parseSensorLog(LOG, { ...OPTIONS, valueColumns: ['rate'], optionNames: { rate: '--column' } }));
    expect(m).toBe('bench.csv line 3 (header): there is no column "rate" (named by --column); the columns found are "time_s", "gyro_z_dps", "temp_c"');
  });

  it('two columns of the same name: names both positions', () => {
    expect(messageOf(() => parseSensorLog('t,v,v\n1,2,3\n', { valueColumns: ['v'] }))).toMatch(/line 1 \(header\): 2 columns are called "v" \(fields 2 and 3\)/);
  });

  it('a non-numeric or blank cell: names its line and column', () => {
    expect(messageOf(() => parseSensorLog(LOG.replace('0.15', 'abc'), OPTIONS))).toMatch(/^bench\.csv line 6, column "gyro_z_dps": "abc" is not a number/);
    expect(messageOf(() => parseSensorLog(LOG.replace('0.15', ' '), OPTIONS))).toMatch(/^bench\.csv line 6, column "gyro_z_dps": "" is not a number/);
    expect(messageOf(() => parseSensorLog(LOG.replace('0.15', '0x1f'), OPTIONS))).toMatch(/line 6, column "gyro_z_dps": "0x1f"/);
    expect(messageOf(() => parseSensorLog(LOG.replace('0.15', 'NaN'), OPTIONS))).toMatch(/line 6/);
  });

  it('a short row: names the line and the missing field', () => {
    expect(messageOf(() => parseSensorLog(LOG.replace('0.02,0.15,21', '0.02'), OPTIONS))).toMatch(/^bench\.csv line 6: the row has 1 field but column "gyro_z_dps" is field 2/);
  });

  it('time that stands still or runs back: names the line', () => {
    const m = messageOf(() => parseSensorLog(LOG.replace('0.03,', '0.02,'), OPTIONS));
    expect(m).toMatch(/^bench\.csv line 7, column "time_s": time 0\.02 s does not increase from 0\.02 s on line 6/);
  });

  it('a gap: names its line and counts the uneven steps, unless the tolerance allows them', () => {
    const rows = ['time_s,v', ...Array.from({ length: 40 }, (_, k) => `${(k < 20 ? k : k + 3) * 0.1},${k}`)];
    const text = rows.join('\n');
    const m = messageOf(() => parseSensorLog(text, { valueColumns: ['v'], timeColumn: 'time_s' }));
    expect(m).toMatch(/^log line 22, column "time_s": time steps from 1\.9 s to 2\.3 s \(a step of 0\.4 s, against the usual 0\.1 s\); 1 uneven step in all, ending on line 22/);
    expect(parseSensorLog(text, { valueColumns: ['v'], timeColumn: 'time_s', gapTolerance: 3.5 }).rowCount).toBe(40);
    const twoGaps = text.replace('\n3.5,32', '');
    expect(messageOf(() => parseSensorLog(twoGaps, { valueColumns: ['v'], timeColumn: 'time_s' }))).toMatch(/2 uneven steps in all, ending on lines 22, 34\./);
  });

  it('an empty log, a log of comments, a header without rows, too few rows: say what is missing', () => {
    expect(messageOf(() => parseSensorLog('', OPTIONS))).toMatch(/^bench\.csv line 1: the log is empty/);
    expect(messageOf(() => parseSensorLog('# nothing\n\n', OPTIONS))).toMatch(/the log is empty/);
    expect(messageOf(() => parseSensorLog('time_s,gyro_z_dps\n', OPTIONS))).toMatch(/^bench\.csv line 1: the log has 0 data rows; at least 4 are needed/);
    expect(messageOf(() => parseSensorLog('time_s,gyro_z_dps\n0,1\n1,2\n', OPTIONS))).toMatch(/^bench\.csv line 3: the log has 2 data rows/);
  });

  it('an unclosed quote: names the line, or refuses a line that never ends before it eats the memory', () => {
    expect(messageOf(() => parseSensorLog('t,v\n1,2\n2,"3\n3,4\n4,5\n', { valueColumns: ['v'] }))).toMatch(/^log line 3: .*check the quotes on this line/);
    const reader = new SensorLogReader({ valueColumns: ['v'] });
    reader.push('t,v\n1,"');
    const filler = 'x'.repeat(1 << 16);
    expect(() => {
      for (let i = 0; i * filler.length <= MAX_LINE_CHARS; i++) reader.push(filler);
    }).toThrow(/line 2: a line runs over .* characters without ending; look for an unclosed quote/);
  });
});
