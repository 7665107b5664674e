import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { parseArgs } from 'node:util';
import { afterAll, describe, expect, it } from 'vitest';
import { CALIBRATE_CLI_OPTIONS, calibrateCommand, calibrateOptionsFromArgs, type CalibrateCommandOptions } from '../../src/cli/calibrate-command';
import { SeededRandom } from '../allan/seeded-random';

const dir = mkdtempSync(join(tmpdir(), 'sigma-ledger-calibrate-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

/** An invented turntable log: set rates in deg/s, the gyro's output with s = 2000 ppm, b = 0.05 deg/s, white noise 0.02 deg/s. */
function writeTurntableLog(): string {
  const rng = new SeededRandom(8);
  const sets = [-90, -30, -10, 0, 10, 30, 90];
  const rows = ['table_rate_dps,gyro_dps'];
  for (let i = 0; i < 700; i++) {
    const x = sets[Math.floor(i / 100)];
    rows.push(`${x},${((1 + 2e-3) * x + 0.05 + 0.02 * rng.normal()).toFixed(6)}`);
  }
  const file = join(dir, 'turntable.csv');
  writeFileSync(file, rows.join('\n') + '\n');
  return file;
}

async function run(options: CalibrateCommandOptions) {
  let out = '', err = '';
  const code = await calibrateCommand(options, { out: (t) => { out += t; }, err: (t) => { err += t; } });
  return { code, out, err };
}

describe('sigma-ledger calibrate', () => {
  const file = writeTurntableLog();
  const base: CalibrateCommandOptions = { file, measured: 'gyro_dps', truth: 'table_rate_dps', unit: 'deg/s', json: true };

  it('reports offset and scale factor with standard deviations and a whiteness check as JSON', async () => {
    const r = await run(base);
    expect(r.code).toBe(0);
    const j = JSON.parse(r.out);
    expect(j.samples).toBe(700);
    expect(j.offset.unit).toBe('deg/s');
    expect(j.offset.unitSI).toBe('rad/s');
    expect(j.offset.valueSI).toBeCloseTo((j.offset.value * Math.PI) / 180, 15);
    expect(j.scaleFactor.unit).toBe('ppm');
    // Known values of the generated log, within 3 of the reported standard deviations (least squares, Draper & Smith ch. 1, from memory).
    expect(Math.abs(j.scaleFactor.value - 2000)).toBeLessThanOrEqual(3 * j.scaleFactor.uncertainty);
    expect(Math.abs(j.offset.value - 0.05)).toBeLessThanOrEqual(3 * j.offset.uncertainty);
    expect(j.whiteness).toHaveProperty('lag1Autocorrelation');
    expect(j.whiteness).toHaveProperty('ljungBoxPValue');
  });

  it('prints a readable summary', async () => {
    const r = await run({ ...base, json: false });
    expect(r.code).toBe(0);
    expect(r.out).toMatch(/offset b +[-\d.e]+ ± [\d.e-]+ deg\/s/);
    expect(r.out).toMatch(/scale factor s +[-\d.e]+ ± [\d.e-]+ ppm/);
    expect(r.out).toMatch(/residual whiteness: lag-1 autocorrelation/);
  });

  it('refuses bad input with exit 2 and one message, never a stack trace', async () => {
    const constant = join(dir, 'constant.csv');
    writeFileSync(constant, 'x,y\n5,5.1\n5,5.2\n5,5.0\n5,5.1\n');
    const cases: [Partial<CalibrateCommandOptions>, RegExp][] = [
      [{ truth: 'set_rate' }, /there is no column "set_rate" \(named by --truth\); the columns found are "table_rate_dps", "gyro_dps"/],
      [{ unit: 'deg/fortnight' }, /--unit: unknown unit/],
      [{ file: constant, measured: 'y', truth: 'x' }, /never changes, so offset and scale factor cannot be told apart/],
      [{ file: join(dir, 'none.csv') }, /cannot be read \(ENOENT\)/],
    ];
    for (const [change, message] of cases) {
      const r = await run({ ...base, ...change });
      expect(r.code, JSON.stringify(change)).toBe(2);
      expect(r.err).toMatch(message);
      expect(/^ {4}at /m.test(r.err)).toBe(false);
    }
  });

  it('turns parsed command-line options into command options, naming a missing one', () => {
    const { values, positionals } = parseArgs({
      args: ['calibrate', 'run.csv', '--measured', 'gz', '--truth', 'table', '--unit', 'deg/s'],
      options: { ...CALIBRATE_CLI_OPTIONS, json: { type: 'boolean', default: false } }, allowPositionals: true,
    });
    expect(calibrateOptionsFromArgs(positionals[1], values)).toEqual({ file: 'run.csv', measured: 'gz', truth: 'table', unit: 'deg/s', json: false });
    expect(() => calibrateOptionsFromArgs('run.csv', { measured: 'gz', unit: 'deg/s' })).toThrow(/--truth: is required/);
  });
});
