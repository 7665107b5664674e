import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { InputError } from '../../src/errors';
import { formatSignificant } from '../../src/units/format-significant';

describe('formatSignificant', () => {
  it.each([
    [2.908882086657216e-4, 6, '2.90888e-4'],
    [206264.80624709636, 6, '206265'],
    [3437.746770784939, 6, '3437.75'],
    [1 / 60, 6, '0.0166667'],
    [0.5, 6, '0.5'],
    [60, 6, '60'],
    [1852, 3, '1850'],
    [-1.5e-7, 3, '-1.5e-7'],
    [1e6, 3, '1e6'],
    [123456.7, 3, '123000'],
    [1.23456e21, 4, '1.235e21'],
    [0.001, 3, '0.001'],
    [0.000999, 3, '9.99e-4'],
  ])('writes %s with %s significant digits as %s', (x, digits, text) => {
    expect(formatSignificant(x, digits)).toBe(text);
  });

  it('switches notation correctly when rounding carries into the next power of ten', () => {
    expect(formatSignificant(999999.7, 6)).toBe('1e6');
    expect(formatSignificant(0.00099999, 2)).toBe('0.001');
    expect(formatSignificant(9.9996, 4)).toBe('10');
  });

  it('writes zero, negative zero and non-finite numbers plainly', () => {
    expect(formatSignificant(0, 6)).toBe('0');
    expect(formatSignificant(-0, 6)).toBe('0');
    expect(formatSignificant(NaN, 6)).toBe('NaN');
    expect(formatSignificant(-Infinity, 6)).toBe('-Infinity');
  });

  it.each([0, 18, 2.5, NaN])('refuses %s significant digits', (digits) => {
    expect(() => formatSignificant(1, digits)).toThrow(InputError);
    expect(() => formatSignificant(1, digits)).toThrow('digits: must be a whole number from 1 to 17');
  });

  it('reads back as the same double with 17 digits', () => {
    // computed: 17 significant decimal digits identify every double (IEEE 754 binary64)
    fc.assert(
      fc.property(fc.double({ noNaN: true, noDefaultInfinity: true }), (x) => {
        expect(Number(formatSignificant(x, 17))).toBe(x === 0 ? 0 : x);
      }),
      { seed: 7, numRuns: 2000 },
    );
  });
});
