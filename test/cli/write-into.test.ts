import { describe, expect, it } from 'vitest';
import { copyFileSync, mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { SeededRandom } from '../allan/seeded-random';
import { runCli } from './run-cli';


/** A budget copy and a log in a fresh folder. */
function workspace(logLines: string[]) {
  const dir = mkdtempSync(join(tmpdir(), 'sl-into-'));
  const budget = join(dir, 'budget.json');
  copyFileSync('budgets/orchard-rover.json', budget);
  const log = join(dir, 'log.csv');
  writeFileSync(log, logLines.join('\n') + '\n');
  return { budget, log };
}

describe('writing a log\'s results into a budget from the command line', () => {
  it('allan --into writes the angle random walk into the gyro with its origin as provenance', async () => {
    // White rate noise of 0.05 deg/s per sample at 100 Hz: N = σ/√f = 0.005 deg/√s = 0.3 deg/√h (IEEE Std 952 convention, docs/checks.md §2).
    const random = new SeededRandom(5);
    const lines = ['t,rate'];
    for (let k = 0; k < 40000; k++) lines.push(`${(k / 100).toFixed(2)},${(0.05 * random.normal()).toFixed(6)}`);
    const { budget, log } = workspace(lines);
    const r = await runCli(['allan', log, '--column', 'rate', '--unit', 'deg/s', '--time-column', 't', '--into', budget, '--sensor', 'gyro']);
    expect(r.code, r.err).toBe(0);
    expect(r.out).toMatch(/overwritten gyro\.arw \(angle random walk\): /);
    const doc = JSON.parse(readFileSync(budget, 'utf8'));
    const arw = doc.sensors[0].sources.find((s: { id: string }) => s.id === 'arw');
    expect(arw.unit).toBe('deg/√h');
    // δ at τ = 1 s with 40,000 samples is 1/√(2(400 − 1)) = 3.5 %; allow 3δ.
    expect(Math.abs(arw.value / 0.3 - 1)).toBeLessThan(0.11);
    expect(arw.provenance).toMatch(/^fitted from log\.csv, \d{4}-\d{2}-\d{2}, 40000 samples/);
    expect((await runCli(['check', budget])).code).toBe(0);
  });

  it('refuses a sensor of the wrong kind and leaves the budget as it was', async () => {
    const { budget, log } = workspace(['t,rate', ...Array.from({ length: 200 }, (_, k) => `${k / 10},${(k % 7) / 100}`)]);
    const before = readFileSync(budget, 'utf8');
    const r = await runCli(['allan', log, '--column', 'rate', '--unit', 'deg/s', '--time-column', 't', '--into', budget, '--sensor', 'wheel']);
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/--sensor: "wheel" is a wheel-speed sensor; these rows belong in a yaw-rate gyro/);
    expect(readFileSync(budget, 'utf8')).toBe(before);
  });

  it('calibrate --into writes the scale factor\'s and offset\'s uncertainty into the gyro', async () => {
    // Turntable at known rates: measured = (1 + 2000 ppm) truth + 0.3 deg/s + noise.
    const random = new SeededRandom(8);
    const lines = ['truth,measured'];
    for (let k = 0; k < 2000; k++) {
      const truth = -100 + (200 * k) / 1999;
      lines.push(`${truth},${(1.002 * truth + 0.3 + 0.01 * random.normal()).toFixed(6)}`);
    }
    const { budget, log } = workspace(lines);
    const r = await runCli(['calibrate', log, '--measured', 'measured', '--truth', 'truth', '--unit', 'deg/s', '--into', budget, '--sensor', 'gyro']);
    expect(r.code, r.err).toBe(0);
    const doc = JSON.parse(readFileSync(budget, 'utf8'));
    const sf = doc.sensors[0].sources.find((s: { kind: string }) => s.kind === 'scale-factor');
    expect(sf.provenance).toMatch(/^calibrated from log\.csv, .*scale factor 2\d\d\d(\.\d+)? ± /);
    expect(sf.value).toBeGreaterThan(0);
  });
});
