import { mkdirSync, mkdtempSync, rmSync, truncateSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { parseArgs } from 'node:util';
import { afterAll, describe, expect, it } from 'vitest';
import { ALLAN_CLI_OPTIONS, allanCommand, allanOptionsFromArgs, MAX_LOG_BYTES, type AllanCommandOptions } from '../../src/cli/allan-command';
import { syntheticRateLog } from './synthetic-log';

const dir = mkdtempSync(join(tmpdir(), 'sigma-ledger-allan-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

/** A 100 Hz gyro log in deg/s: white noise 0.2 deg/√h over 20 000 samples, with a time column. */
function writeGyroLog(name: string): string {
  const rate = syntheticRateLog({ rateHz: 100, sampleCount: 20_000, seed: 3, randomWalk: (0.2 * Math.PI) / 180 / 60, offset: 1e-3 });
  const rows = ['t_s,rate_z_dps,board_temp'];
  rate.forEach((y, k) => rows.push(`${(k / 100).toFixed(2)},${((y * 180) / Math.PI).toExponential(9)},21.5`));
  const file = join(dir, name);
  writeFileSync(file, rows.join('\n') + '\n');
  return file;
}

async function run(options: AllanCommandOptions) {
  let out = '', err = '';
  const code = await allanCommand(options, { out: (t) => { out += t; }, err: (t) => { err += t; } });
  return { code, out, err };
}

const hasStackTrace = (text: string): boolean => /^ {4}at /m.test(text);

describe('sigma-ledger allan', () => {
  const log = writeGyroLog('gyro.csv');
  const base: AllanCommandOptions = { file: log, column: 'rate_z_dps', unit: 'deg/s', timeColumn: 't_s', json: true };

  it('exits 0 with the required JSON keys on a small generated log', async () => {
    const r = await run(base);
    expect(r.code).toBe(0);
    const json = JSON.parse(r.out);
    expect(Object.keys(json)).toEqual(expect.arrayContaining(['file', 'samples', 'rateHz', 'points', 'terms']));
    expect(json.samples).toBe(20_000);
    expect(json.rateHz).toBeCloseTo(100, 6);
    expect(Object.keys(json.points[0]).sort()).toEqual(['adev', 'lower', 'tau_s', 'upper']);
    for (const term of json.terms) {
      for (const key of ['name', 'value', 'unit', 'valueSI', 'unitSI', 'uncertainty', 'method']) expect(term).toHaveProperty(key);
    }
    const arw = json.terms.find((t: { name: string; method: string }) => t.name === 'angle random walk' && t.method === 'slope');
    expect(arw.unit).toBe('deg/√h');
    expect(arw.unitSI).toBe('rad/√s');
    // The log was generated with N = 0.2 deg/√h; 3δ at τ = 1 s (docs/checks.md §1.3) with N = 20 000, n = 100 is 15 %.
    expect(Math.abs(arw.value / 0.2 - 1)).toBeLessThan(0.15);
  });

  it('finds a time column called time without --time-column, and prints its rate as 100', async () => {
    const file = join(dir, 'timed.csv');
    writeFileSync(file, ['time,rate_dps', ...Array.from({ length: 400 }, (_, k) => `${(k / 100).toFixed(2)},${Math.sin(k * 7.1) * 1e-3}`)].join('\n') + '\n');
    const r = await run({ file, column: 'rate_dps', unit: 'deg/s', json: true });
    expect(r.code).toBe(0);
    expect(r.out).toMatch(/"rateHz":100,/);
  });

  it('prints the table and the terms as text', async () => {
    const r = await run({ ...base, json: false });
    expect(r.code).toBe(0);
    expect(r.out).toMatch(/tau \(s\) +adev \(deg\/s\) +lower +upper/);
    expect(r.out).toMatch(/angle random walk +0\.\d+ ± [\d.e-]+ deg\/√h/);
    expect(r.out).toMatch(/understates the real scatter/);
  });

  it('takes the rate from --rate when the log has no time column, and reads increments by their unit', async () => {
    const r = await run({ ...base, timeColumn: undefined, rateHz: 100 });
    expect(r.code).toBe(0);
    expect(JSON.parse(r.out).rateHz).toBe(100);
    const inc = join(dir, 'increments.csv');
    writeFileSync(inc, ['dtheta_deg', ...Array.from({ length: 200 }, (_, k) => String(0.001 * Math.sin(k * 1.7)))].join('\n'));
    const j = JSON.parse((await run({ file: inc, column: 'dtheta_deg', unit: 'deg', rateHz: 100, json: true })).out);
    expect(j.input).toBe('increment');
    expect(j.adevUnit).toBe('deg/s');
  });

  it('refuses bad input with exit 2 and one message, never a stack trace', async () => {
    const notNumeric = join(dir, 'bad.csv');
    writeFileSync(notNumeric, 't,v\n0,1\n0.01,2\n0.02,oops\n0.03,4\n');
    const folder = join(dir, 'a-folder');
    mkdirSync(folder);
    const cases: [Partial<AllanCommandOptions>, RegExp][] = [
      [{ file: join(dir, 'missing.csv') }, /missing\.csv: cannot be read \(ENOENT\)/],
      [{ file: folder }, /is not a file/],
      [{ column: 'rate_x' }, /there is no column "rate_x" \(named by --column\); the columns found are "t_s", "rate_z_dps", "board_temp"/],
      [{ file: notNumeric, column: 'v', timeColumn: 't' }, /bad\.csv line 4, column "v": "oops" is not a number/],
      [{ rateHz: 100 }, /--rate: give either --time-column .* or --rate, not both/],
      [{ timeColumn: undefined }, /line 1 \(header\): no time column: none is called "time", "t", "time_s"; name it \(--time-column\) or give the sample rate/],
      [{ unit: 'm/s²', kind: 'gyro' }, /--unit: a gyro log needs an angular rate/],
      [{ unit: 'parsec' }, /--unit: unknown unit/],
      [{ timeUnit: 'deg' }, /--time-unit: 'deg' is an angle; expected a time/],
    ];
    for (const [change, message] of cases) {
      const r = await run({ ...base, ...change });
      expect(r.code, JSON.stringify(change)).toBe(2);
      expect(r.err).toMatch(message);
      expect(r.err).toMatch(/^error: /);
      expect(hasStackTrace(r.err)).toBe(false);
      expect(r.out).toBe('');
    }
  });

  it('refuses a file over 1 GiB before reading it', async () => {
    const huge = join(dir, 'huge.csv');
    writeFileSync(huge, 't,v\n');
    truncateSync(huge, MAX_LOG_BYTES + 1); // sparse: takes no disk space
    const r = await run({ ...base, file: huge, column: 'v', timeColumn: 't' });
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/huge\.csv: is 1\.00 GiB; logs over 1 GiB are refused before reading/);
  });

  it('turns parsed command-line options into command options, naming a missing one', () => {
    const { values, positionals } = parseArgs({
      args: ['allan', 'log.csv', '--column', 'gz', '--unit', 'deg/h', '--rate', '200', '--kind', 'gyro', '--json'],
      options: { ...ALLAN_CLI_OPTIONS, json: { type: 'boolean', default: false } }, allowPositionals: true,
    });
    expect(allanOptionsFromArgs(positionals[1], values)).toEqual({
      file: 'log.csv', column: 'gz', unit: 'deg/h', timeColumn: undefined, timeUnit: undefined, rateHz: 200, kind: 'gyro', gapTolerance: undefined, json: true,
    });
    expect(() => allanOptionsFromArgs('log.csv', { unit: 'deg/h' })).toThrow(/--column: name the value column/);
    expect(() => allanOptionsFromArgs('log.csv', { column: 'gz', unit: 'deg/h', rate: 'fast' })).toThrow(/--rate: must be a positive number/);
    expect(() => allanOptionsFromArgs('log.csv', { column: 'gz', unit: 'deg/h', kind: 'compass' })).toThrow(/--kind: must be one of gyro, accelerometer, speed/);
  });
});
