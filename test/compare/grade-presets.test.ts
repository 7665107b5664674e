import { describe, expect, it } from 'vitest';
import { GRADE_PRESETS, presetRows, presetsFor } from '../../src/presets/grade-presets';
import { SENSOR_KINDS } from '../../src/sensors/registry';
import { toSI } from '../../src/units';

const row = (preset: string, id: string) => presetRows(preset).find((r) => r.id === id)!;

describe('grade presets', () => {
  // El-Sheimy and Youssef 2020, Table 1 (docs/checks.md §8.1, published).
  it('carry the published gyro drift of each grade', () => {
    // commercial 0.1 °/s, tactical 1-10 °/h (upper end), navigation < 0.01 °/h (the bound).
    expect(toSI(row('consumerMems', 'bias').value as number, 'deg/h', 'angular-rate', '')).toBeCloseTo(
      toSI(0.1, 'deg/s', 'angular-rate', ''),
      15,
    );
    expect(row('tactical', 'bias').value).toBe(10);
    expect(row('navigation', 'bias').value).toBe(0.01);
  });

  it('carry the typical ARW and bias floor of each grade (docs/checks.md §8.1, common practice, no source)', () => {
    const expected = {
      consumerMems: [0.3, 10],
      industrialMems: [0.15, 2],
      tactical: [0.05, 0.5],
      navigation: [0.002, 0.005],
    };
    for (const [id, [arw, floor]] of Object.entries(expected)) {
      expect(row(id, 'arw')).toMatchObject({ value: arw, unit: 'deg/√h' });
      expect(row(id, 'bi')).toMatchObject({ value: floor, unit: 'deg/h', correlationTime: { value: 100, unit: 's' } });
      expect(row(id, 'arw').provenance).toContain('common practice, no source');
    }
  });

  it('are ordered from the noisiest grade to the best, every row assumed and naming its grade', () => {
    for (const id of ['arw', 'bi', 'bias']) {
      const values = GRADE_PRESETS.map((p) => row(p.id, id).value as number);
      expect([...values].sort((a, b) => b - a)).toEqual(values);
    }
    for (const p of GRADE_PRESETS)
      for (const r of presetRows(p.id)) {
        expect(r.assumed).toBe(true);
        expect(r.provenance).toContain(`grade preset "${p.label}"`);
      }
  });

  it('are offered for a gyro only, whose rows take every preset row', () => {
    expect(presetsFor(SENSOR_KINDS['yaw-gyro'].rows).map((p) => p.label)).toEqual([
      'consumer MEMS',
      'industrial MEMS',
      'tactical',
      'navigation',
    ]);
    expect(presetsFor(SENSOR_KINDS.compass.rows)).toEqual([]);
    expect(presetsFor(SENSOR_KINDS['gnss-position'].rows)).toEqual([]);
  });

  it('names the presets when asked for one that does not exist', () => {
    expect(() => presetRows('strategic')).toThrow(
      /no grade preset "strategic"; one of consumerMems, industrialMems, tactical, navigation/,
    );
  });
});
