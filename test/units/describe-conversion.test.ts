import { describe, expect, it } from 'vitest';
import { InputError } from '../../src/errors';
import { describeConversion } from '../../src/units/describe-conversion';
import { expectRelative } from './expect-relative';

describe('describeConversion', () => {
  it('records the exact numbers and the SI unit of the expected dimension', () => {
    const record = describeConversion(0.2, 'deg/√h', 'angle-random-walk');
    expect(record.value).toBe(0.2);
    expect(record.unit).toBe('deg/√h');
    expect(record.unitSI).toBe('rad/√s');
    // computed: pure arithmetic, 1 deg/√h = 2.908882086657216e-4 rad/√s
    expectRelative(record.factorToSI, 2.908882086657216e-4, 1e-12);
    expect(record.valueSI).toBe(0.2 * record.factorToSI);
  });

  it('writes the value, the factor, the result and the definition of each table unit in one line', () => {
    expect(describeConversion(0.2, 'deg/√h', 'angle-random-walk').text).toBe(
      '0.2 deg/√h × 2.90888e-4 rad/√s per deg/√h = 5.81776e-5 rad/√s (1 deg = π/180 rad; 1 h = 3600 s)',
    );
    expect(describeConversion(100, 'µg/√Hz', 'velocity-random-walk').definitions).toEqual([
      '1 µg = 9.80665e-6 m/s²',
      '1 Hz = 1/s',
    ]);
  });

  it('shows the value as written even when it carries binary noise', () => {
    expect(describeConversion(0.1 + 0.2, 'm', 'length').text).toBe('0.3 m = 0.3 m');
  });

  it('shows no factor step for a unit already in SI', () => {
    expect(describeConversion(1.5, 'rad/s', 'angular-rate').text).toBe('1.5 rad/s = 1.5 rad/s');
  });

  it('writes a plain ratio without a unit', () => {
    expect(describeConversion(1000, 'ppm', 'ratio').text).toBe('1000 ppm × 1e-6 per ppm = 0.001 (1 ppm = 1e-6)');
    expect(describeConversion(0.25, '', 'ratio').text).toBe('0.25 = 0.25');
  });

  it('uses the requested significant digits for the factor and the result only', () => {
    expect(describeConversion(0.2, 'deg/√h', 'angle-random-walk', 'x', 3).text).toBe(
      '0.2 deg/√h × 2.91e-4 rad/√s per deg/√h = 5.82e-5 rad/√s (1 deg = π/180 rad; 1 h = 3600 s)',
    );
  });

  it('throws like toSI, naming the path, for a bad value or unit', () => {
    expect(() => describeConversion(NaN, 'deg/h', 'angular-rate', 'gyro.bias')).toThrow(InputError);
    expect(() => describeConversion(1, 'deg/h', 'angle', 'gyro.bias')).toThrow("gyro.bias: 'deg/h' is an angular rate");
    expect(() => describeConversion(1, 'deg', 'angle', 'x', 0)).toThrow('digits: must be a whole number from 1 to 17');
  });
});
