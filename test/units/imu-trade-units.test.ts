import { describe, expect, it } from 'vitest';
import { toSI, type DimensionName } from '../../src/units';

// SI values of the units IMU datasheets use. Sources: standard gravity 9.80665 m/s² exactly
// (3rd CGPM 1901, "980.665 cm/s²"); the others are pure arithmetic on the definitions
// (1 h = 3600 s, 1 deg = π/180 rad, 1 ppm = 1e-6); the µg/√Hz and m/s/√h rows also match
// the conversion table of docs/checks.md §2 (1 µg/√Hz = 5.88399e-4 m/s/√h).
const DEG = Math.PI / 180;
const cases: [value: number, unit: string, dimension: DimensionName, si: number][] = [
  [1, 'mg', 'acceleration', 9.80665e-3],
  [1, 'µg', 'acceleration', 9.80665e-6],
  [1, 'ug', 'acceleration', 9.80665e-6],
  [1, 'm/s²', 'acceleration', 1],
  [1, 'm/s/√h', 'velocity-random-walk', 1 / 60],
  [1, 'µg/√Hz', 'velocity-random-walk', 9.80665e-6],
  [1, 'm/s/√s', 'velocity-random-walk', 1],
  [1, 'ppm', 'ratio', 1e-6],
  [1, 'mdps/√Hz', 'angle-random-walk', DEG / 1000],
  [1, 'mdeg/s', 'angular-rate', DEG / 1000],
  [1, 'dps', 'angular-rate', DEG],
  [1, '°/s/√Hz', 'angle-random-walk', DEG],
];

describe('IMU trade units', () => {
  it.each(cases)('%d %s is the published SI value', (value, unit, dim, si) => {
    expect(Math.abs(toSI(value, unit, dim, 'value') - si)).toBeLessThanOrEqual(1e-15 * si);
  });

  it('1 µg/√Hz is 5.88399e-4 m/s/√h (docs/checks.md §2)', () => {
    expect(toSI(1, 'µg/√Hz', 'velocity-random-walk', 'value') / toSI(1, 'm/s/√h', 'velocity-random-walk', 'value')).toBeCloseTo(5.88399e-4, 9);
  });

  it('0.01 °/s/√Hz is 0.6 °/√h (docs/checks.md §2)', () => {
    expect(toSI(0.01, '°/s/√Hz', 'angle-random-walk', 'value') / toSI(1, 'deg/√h', 'angle-random-walk', 'value')).toBeCloseTo(0.6, 12);
  });
});
