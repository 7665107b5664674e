import { describe, expect, it } from 'vitest';
import * as allan from '../../src/allan';
import * as calibration from '../../src/calibration';
import { analyseLogColumn } from '../../src/allan/log-allan';
import { convert } from '../../src/units';
import { expectRelative } from './expect-close';
import { syntheticRateLog } from './synthetic-log';

const RATE_HZ = 50;
/** White rate noise N = 1e-3 (SI) and rate random walk 1e-5, 100 000 samples at 50 Hz. */
const RATE_SI = syntheticRateLog({ rateHz: RATE_HZ, sampleCount: 100_000, seed: 31, randomWalk: 1e-3, rateRandomWalk: 1e-5 });

function scaled(factor: number): Float64Array {
  return RATE_SI.map((y) => y * factor);
}

describe('analysing a log column', () => {
  it('gives the same SI terms whichever unit the log is written in', () => {
    const inRadPerS = analyseLogColumn({ samples: RATE_SI, unit: 'rad/s', rateHz: RATE_HZ });
    const inDegPerH = analyseLogColumn({ samples: scaled((180 / Math.PI) * 3600), unit: 'deg/h', rateHz: RATE_HZ });
    inRadPerS.analysis.terms.forEach((t, i) => expectRelative(inDegPerH.analysis.terms[i].valueSI, t.valueSI, 1e-9));
    expect(inDegPerH.adevUnit).toBe('deg/h');
    expectRelative(inDegPerH.points[0].adev, inRadPerS.points[0].adev * (180 / Math.PI) * 3600, 1e-12);
  });

  it('labels a gyro\'s terms in deg/√h, deg/h and deg/h/√h with their SI units', () => {
    const r = analyseLogColumn({ samples: scaled(180 / Math.PI), unit: 'deg/s', rateHz: RATE_HZ });
    expect(r.kind).toBe('gyro');
    const slope = r.analysis.terms.filter((t) => t.method === 'slope');
    expect(slope.map((t) => [t.name, t.unit, t.unitSI])).toEqual([
      ['quantisation', 'arcsec', 'rad'],
      ['angle random walk', 'deg/√h', 'rad/√s'],
      ['bias instability', 'deg/h', 'rad/s'],
      ['rate random walk', 'deg/h/√h', 'rad/s/√s'],
      ['rate ramp', 'deg/h²', 'rad/s²'],
    ]);
    for (const t of slope) expectRelative(t.value, convert(t.valueSI, t.unitSI, t.unit, 'test'), 1e-15);
    // 1 rad/√s = 3437.746770784939 deg/√h (docs/checks.md §2).
    const arw = slope[1];
    expectRelative(arw.value, arw.valueSI * 3437.746770784939, 1e-12);
  });

  it('labels an accelerometer\'s and a speed sensor\'s terms in their own units', () => {
    const accel = analyseLogColumn({ samples: scaled(1 / 9.80665e-3), unit: 'mg', rateHz: RATE_HZ });
    expect(accel.kind).toBe('accelerometer');
    const vrw = accel.analysis.terms.find((t) => t.id === 'random-walk' && t.method === 'slope')!;
    expect([vrw.name, vrw.unit, vrw.unitSI]).toEqual(['velocity random walk', 'm/s/√h', 'm/s/√s']);
    expectRelative(vrw.valueSI, analyseLogColumn({ samples: RATE_SI, unit: 'm/s²', rateHz: RATE_HZ }).analysis.terms[1].valueSI, 1e-9);
    const speed = analyseLogColumn({ samples: RATE_SI, unit: 'm/s', rateHz: RATE_HZ });
    expect(speed.kind).toBe('speed');
    const drw = speed.analysis.terms.find((t) => t.id === 'random-walk' && t.method === 'fit')!;
    expect([drw.name, drw.unit, drw.unitSI]).toEqual(['distance random walk', 'm/s/√Hz', 'm/√s']);
  });

  it('treats an angle column as increments per sample (θ₀ = 0, L = N + 1) with σ in angle per second', () => {
    const rates = analyseLogColumn({ samples: RATE_SI, unit: 'rad/s', rateHz: RATE_HZ });
    const increments = analyseLogColumn({ samples: RATE_SI.map((y) => y / RATE_HZ), unit: 'rad', rateHz: RATE_HZ });
    expect(increments.input).toBe('increment');
    expect(increments.adevUnit).toBe('rad/s');
    increments.points.forEach((p, i) => expectRelative(p.adev, rates.points[i].adev, 1e-9));
  });

  it('takes velocity increments only when the kind says accelerometer', () => {
    expect(analyseLogColumn({ samples: RATE_SI, unit: 'm/s', rateHz: RATE_HZ }).input).toBe('rate');
    const dv = analyseLogColumn({ samples: RATE_SI, unit: 'm/s', rateHz: RATE_HZ, kind: 'accelerometer' });
    expect([dv.kind, dv.input, dv.adevUnit]).toEqual(['accelerometer', 'increment', 'm/s/s']);
  });

  it('refuses a unit that fits no sensor kind, or not the kind given', () => {
    expect(() => analyseLogColumn({ samples: RATE_SI, unit: 's', rateHz: RATE_HZ })).toThrow(/--unit: 's' is not a rate or an increment/);
    expect(() => analyseLogColumn({ samples: RATE_SI, unit: 'deg/s', rateHz: RATE_HZ, kind: 'speed' })).toThrow(/a speed log needs a speed/);
  });
});

describe('the Allan and calibration modules', () => {
  it('import under bare Node and expose their entry points', () => {
    expect(typeof allan.SensorLogReader).toBe('function');
    expect(typeof allan.analyseLogColumn).toBe('function');
    expect(typeof allan.allanDeviationCurve).toBe('function');
    expect(typeof calibration.fitOffsetAndScaleFactor).toBe('function');
    expect(typeof calibration.checkResidualWhiteness).toBe('function');
  });
});
