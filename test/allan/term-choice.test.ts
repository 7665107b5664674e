import { describe, expect, it } from 'vitest';
import { analyseAllanCurve } from '../../src/allan/allan-analysis';
import { allanDeviationCurve } from '../../src/allan/allan-curve';
import { formatAllanText } from '../../src/allan/allan-text';
import { analyseLogColumn } from '../../src/allan/log-allan';
import { allanCandidates } from '../../src/edits/allan-rows';
import { parseSensorLog } from '../../src/allan/parse-log';
import { syntheticRateLog } from './synthetic-log';

const DEG = Math.PI / 180;
const source = { fileName: 'static.csv', date: '2026-12-02', samples: 360_000 };

/**
 * A 1-hour, 100 Hz static gyro log (invented): white noise N = 0.3 deg/√h
 * and a rate random walk K = 30 deg/h/√h, no rate ramp. IEEE Std 952 annex C:
 * the RRW line σ = K √(τ/3) crosses the white-noise line σ = N/√τ at
 * τ = √3 N / K ≈ 62 s, so the +1/2 slope shows over the last decade of τ at most.
 */
function oneHourLog(seed: number) {
  const rate = syntheticRateLog({
    rateHz: 100, sampleCount: 360_000, seed,
    randomWalk: (0.3 * DEG) / 60, rateRandomWalk: (30 * DEG) / 3600 / 60,
  });
  return analyseLogColumn({ samples: rate.map((x) => x / DEG), unit: 'deg/s', rateHz: 100, kind: 'gyro' });
}

describe('which Allan reading a grid row takes', () => {
  const result = oneHourLog(5);
  const slopeRrw = result.analysis.terms.find((t) => t.id === 'rate-random-walk' && t.method === 'slope')!;
  const fitRrw = result.analysis.terms.find((t) => t.id === 'rate-random-walk' && t.method === 'fit')!;
  // Another draw of the same noise, on which the fit gives the (absent) rate ramp a value.
  const ramp = oneHourLog(4).analysis.terms.find((t) => t.id === 'rate-ramp' && t.method === 'fit')!;

  it('writes the whole-curve fit\'s rate random walk where the slope read-off sees no slope, and says so', () => {
    const candidates = allanCandidates({ result, rateHz: 100 }, 'slope', 'yaw-gyro', source);
    const rrw = candidates.find((c) => c.id === 'rate-random-walk')!;
    expect(slopeRrw.upperBound, 'the log is made so that the slope is not seen').toBe(true);
    expect(rrw.plan, 'a plan from the fit').toBeDefined();
    expect(rrw.caution).toBeUndefined();
    expect(rrw.note).toMatch(/saw no slope.*whole-curve fit's value/);
    expect(rrw.plan!.fields.provenance).toMatch(/whole-curve fit/);
    expect(Math.abs(Number(rrw.plan!.fields.value) / fitRrw.value - 1)).toBeLessThan(1e-3);
    // With the fit method asked for, the fit's value is written without a note.
    const byFit = allanCandidates({ result, rateHz: 100 }, 'fit', 'yaw-gyro', source).find((c) => c.id === 'rate-random-walk')!;
    expect(byFit.note).toBeUndefined();
    expect(byFit.plan!.fields.value).toBe(rrw.plan!.fields.value);
    // The generated K = 30 deg/h/√h; the fit's value within 3 of its standard errors plus 20 % (docs/checks.md §1.3: δ understates).
    expect(Math.abs(fitRrw.value - 30)).toBeLessThan(3 * fitRrw.uncertainty + 6);
  });

  it('marks a fitted rate ramp on a log that has none as not significant, in the text too', () => {
    expect(ramp.atZero, 'the fit gives the ramp a value here').toBe(false);
    expect(ramp.notSignificant).toBe(true);
    expect(formatAllanText('static.csv', 360_000, 100, oneHourLog(4))).toMatch(/rate ramp +[\d.e+-]+ ± [\d.e+-]+ deg\/h² +\(not significant/);
  });

  it('finds the white noise significant and a slope term taken from the fit only where the fit sees it', () => {
    const arw = result.analysis.terms.find((t) => t.id === 'random-walk' && t.method === 'fit')!;
    expect(arw.notSignificant).toBe(false);
    const curve = allanDeviationCurve(syntheticRateLog({ rateHz: 100, sampleCount: 50_000, seed: 9, randomWalk: 1e-4 }), 100);
    // A curve of pure white noise: the fit finds no rate random walk, so nothing from the fit replaces a bound.
    const white = analyseAllanCurve(curve, 'gyro');
    const rrw = white.terms.find((t) => t.id === 'rate-random-walk' && t.method === 'fit')!;
    expect(rrw.atZero || rrw.notSignificant).toBe(true);
  });
});

describe('the log\'s time column and rate', () => {
  const rows = (name: string) => [`${name},rate`, ...Array.from({ length: 50 }, (_, k) => `${(k * 0.01).toFixed(2)},${Math.cos(k)}`)].join('\n');

  it.each(['time', 't', 'time_s', 'Time'])('finds a time column named %s without being told', (name) => {
    const table = parseSensorLog(rows(name), { valueColumns: ['rate'], timeColumnCandidates: ['time', 't', 'time_s'] });
    expect(table.timeColumn).toBe(name);
    expect(table.timeS).toHaveLength(50);
  });

  it('prints a 100 Hz rate as 100, not 99.99999999999999', () => {
    const table = parseSensorLog(rows('time'), { valueColumns: ['rate'], timeColumn: 'time' });
    expect(String(table.rateHz)).toBe('100');
  });

  it('names the names it looked for when none is there', () => {
    expect(() => parseSensorLog(rows('stamp'), { valueColumns: ['rate'], timeColumnCandidates: ['time', 't', 'time_s'], optionNames: { timeColumn: '--time-column' } }))
      .toThrow(/line 1 \(header\).*no time column.*"time", "t", "time_s".*--time-column.*"stamp", "rate"/);
  });
});
