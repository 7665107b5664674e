import { describe, expect, it } from 'vitest';
import { parseSensorLog } from '../../src/allan/parse-log';

/**
 * The quote-free fast path and papaparse (RFC 4180) read the same rows: the
 * same log is parsed once as written and once with a quoted header cell,
 * which sends the text to papaparse.
 */
describe('the quote-free line reader', () => {
  const body = ['# comment', '', '0.00;1.5;x', '  0.01 ; 2.5e-1;y', '# another', '0.02;-3;z', '', '0.03;4;w'];
  const read = (header: string, newline: string) =>
    parseSensorLog([header, ...body].join(newline) + newline, { valueColumns: ['rate'], timeColumn: 'time' });

  it.each(['\n', '\r\n'])('gives papaparse\'s rows, times and line numbers (line end %j)', (newline) => {
    const plain = read('time;rate;note', newline);
    const quoted = read('time;"rate";note', newline);
    expect(Array.from(plain.values[0])).toEqual([1.5, 0.25, -3, 4]);
    expect(Array.from(plain.values[0])).toEqual(Array.from(quoted.values[0]));
    expect(Array.from(plain.timeS!)).toEqual(Array.from(quoted.timeS!));
  });

  it('names the same line and field count for a short row either way', () => {
    const short = ['time;rate', '0;1', '0.01;2', '0.02', '0.03;4', '0.04;5'];
    const message = (header: string) => {
      try {
        parseSensorLog([header, ...short.slice(1)].join('\n'), { valueColumns: ['rate'], timeColumn: 'time' });
      } catch (e) {
        return (e as Error).message;
      }
      return '';
    };
    expect(message('time;rate')).toMatch(/line 4: the row has 1 field but column "rate" is field 2/);
    expect(message('time;rate')).toBe(message('"time";rate'));
  });
});
