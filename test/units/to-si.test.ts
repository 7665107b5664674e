import { describe, expect, it } from 'vitest';
import { InputError } from '../../src/errors';
import { convert, fromSI, toSI, unitFor } from '../../src/units/to-si';
import { expectRelative } from './expect-relative';

// Check values from the project's reference sheet (docs/checks.md §2). The
// source of each is written beside it; "computed" means pure arithmetic.
const CONVERSIONS: [number, string, string, number, number][] = [
  // value, from, to, expected, relative tolerance
  [1, 'deg/h', 'rad/s', 4.84813681109536e-6, 1e-12], // computed: pure arithmetic
  [1, 'rad/s', 'deg/h', 206264.80624709636, 1e-12], // computed: pure arithmetic
  [1, 'deg/√h', 'rad/√s', 2.908882086657216e-4, 1e-12], // computed: pure arithmetic
  [1, 'deg/√h', 'deg/s/√Hz', 1 / 60, 1e-15], // computed: pure arithmetic
  [1, 'deg/s/√Hz', 'deg/√h', 60, 1e-15], // computed: pure arithmetic
  [1, 'deg/h/√Hz', 'deg/√h', 1 / 60, 1e-15], // computed: pure arithmetic
  [0.01, 'deg/s/√Hz', 'deg/√h', 0.6, 1e-15], // computed: pure arithmetic
  [1, 'rad/√s', 'deg/√h', 3437.746770784939, 1e-12], // computed: pure arithmetic
  [1, 'deg/h/√h', 'rad/s/√s', 8.080228018492267e-8, 1e-12], // computed: pure arithmetic
  [1, 'deg/h²', 'rad/s²', 1.346704669748711e-9, 1e-12], // computed: pure arithmetic
  [1, 'm/s/√h', 'm/s/√s', 1 / 60, 1e-15], // computed: pure arithmetic
  [1, 'm/s/√h', 'µg/√Hz', 1699.5270216298807, 1e-12], // computed: pure arithmetic, with g0 from the 3rd CGPM 1901
  [1, 'µg/√Hz', 'm/s/√h', 5.88399e-4, 1e-12], // computed: pure arithmetic, with g0 from the 3rd CGPM 1901
  [100, 'µg/√Hz', 'm/s/√h', 0.0588399, 1e-12], // computed: pure arithmetic, with g0 from the 3rd CGPM 1901
  [1, 'mg', 'm/s²', 9.80665e-3, 1e-15], // 3rd CGPM 1901: g0 = 9.80665 m/s^2
  [1, 'µg', 'm/s²', 9.80665e-6, 1e-15], // 3rd CGPM 1901: g0 = 9.80665 m/s^2
  [1, 'm/s²', 'mg', 101.97162129779282, 1e-12], // computed: pure arithmetic, with g0 from the 3rd CGPM 1901
  [1, 'µg', 'm/h²', 127.094184, 1e-12], // computed: pure arithmetic, with g0 from the 3rd CGPM 1901
  [1000, 'ppm', '%', 0.1, 1e-15], // computed: pure arithmetic
  [1000, 'ppm', '1', 1e-3, 1e-15], // computed: pure arithmetic
  [1, '%', 'ppm', 10000, 1e-15], // computed: pure arithmetic
  [1, 'nmi', 'm', 1852, 0], // from memory: international nautical mile, 1852 m exactly (IHO 1929)
  [1, 'kn', 'm/s', 0.5144444444444445, 1e-15], // computed: 1852/3600, knot = nmi/h
  [7.292115e-5, 'rad/s', 'deg/h', 15.04106687606545, 1e-12], // computed: pure arithmetic (Earth rate value from memory, WGS 84)
];

describe('convert', () => {
  it.each(CONVERSIONS)('converts %s %s to %s as the reference values say', (value, from, to, expected, tol) => {
    expectRelative(convert(value, from, to, 'x'), expected, tol);
  });

  it.each(CONVERSIONS)('brings %s %s back from %s to within two roundings', (value, from, to) => {
    // computed: two multiplications by a rounded ratio, each within half an ulp
    expectRelative(convert(convert(value, from, to, 'x'), to, from, 'x'), value, 1e-15);
  });

  it('refuses units of different dimensions, saying what each one is', () => {
    expect(() => convert(1, 'deg/h', 'deg/√h', 'row.value')).toThrow(
      "row.value: 'deg/h' is an angular rate; expected an angle random walk such as deg/√h, deg/s/√Hz, rad/√s",
    );
    expect(() => convert(1, 'm·deg', 'm·s', 'row.value')).toThrow(
      "row.value: cannot convert 'm·deg', which has the dimension m·rad, to 'm·s', which has the dimension m·s",
    );
  });

  it('converts between two units of a dimension that has no name', () => {
    expectRelative(convert(1, 'km·deg', 'm·rad', 'x'), 1000 * (Math.PI / 180), 1e-15); // computed: pure arithmetic
  });

  it('names the expected dimension from the other unit when one unit is unknown', () => {
    expect(() => convert(1, 'dg/h', 'rad/s', 'x')).toThrow("unknown unit 'dg/h' (no unit is called 'dg'); expected an angular rate");
    expect(() => convert(1, 'dg/h', 'dg/s', 'x')).toThrow("x: unknown unit 'dg/h' (no unit is called 'dg')");
  });
});

describe('toSI and fromSI', () => {
  it('converts a datasheet value into the SI unit of the expected dimension', () => {
    // computed: pure arithmetic
    expectRelative(toSI(0.2, 'deg/√h', 'angle-random-walk', 'x'), 0.2 * 2.908882086657216e-4, 1e-12);
    expectRelative(toSI(10, 'deg/h', 'angular-rate', 'x'), 4.84813681109536e-5, 1e-12);
    expect(toSI(5, 'mg', 'acceleration', 'x')).toBe(5 * 9.80665e-3);
  });

  it('converts an SI value back to a display unit', () => {
    // computed: pure arithmetic
    expectRelative(fromSI(1, 'deg/h', 'angular-rate', 'x'), 206264.80624709636, 1e-12);
    expectRelative(fromSI(1, 'deg/√h', 'angle-random-walk', 'x'), 3437.746770784939, 1e-12);
  });

  it('treats an empty unit and 1 as a plain ratio', () => {
    expect(toSI(0.5, '', 'ratio', 'x')).toBe(0.5);
    expect(toSI(0.5, '1', 'ratio', 'x')).toBe(0.5);
  });

  it('names the path, the unknown symbol and the expected dimension with examples for an unknown unit', () => {
    const call = (): number => toSI(1, 'dg/h', 'angular-rate', 'sensors[0].sources[1].value');
    expect(call).toThrow(InputError);
    expect(call).toThrow(
      "sensors[0].sources[1].value: unknown unit 'dg/h' (no unit is called 'dg'); expected an angular rate such as deg/h, deg/s, rad/s",
    );
  });

  it('names what a wrong unit is and what was expected', () => {
    expect(() => toSI(1, 'deg/h', 'angle-random-walk', 'gyro.arw')).toThrow(
      "gyro.arw: 'deg/h' is an angular rate; expected an angle random walk such as deg/√h, deg/s/√Hz, rad/√s",
    );
    expect(() => fromSI(1, '1/h', 'angular-rate', 'gyro.bias')).toThrow("gyro.bias: '1/h' is a frequency; expected an angular rate");
  });

  it('describes a wrong unit of an unnamed dimension by its SI dimension', () => {
    expect(() => toSI(1, 'deg·m', 'angle', 'x')).toThrow("x: 'deg·m' has the dimension m·rad; expected an angle such as deg, rad, mrad");
  });

  it('reports a malformed unit as unreadable, with the expected dimension', () => {
    expect(() => toSI(1, 'deg//h', 'angular-rate', 'x')).toThrow(
      "x: cannot read the unit 'deg//h' (expected a unit but found '/' at position 5); expected an angular rate",
    );
  });

  it.each([NaN, Infinity, -Infinity])('refuses the value %s, naming the path', (bad) => {
    for (const call of [
      () => toSI(bad, 'deg/h', 'angular-rate', 'row.value'),
      () => fromSI(bad, 'deg/h', 'angular-rate', 'row.value'),
      () => convert(bad, 'deg/h', 'rad/s', 'row.value'),
    ]) {
      expect(call).toThrow(InputError);
      expect(call).toThrow(`row.value: the value must be a finite number, got ${String(bad)}`);
    }
  });

  it('refuses a unit that is not a text', () => {
    expect(() => toSI(1, undefined as unknown as string, 'speed', 'x')).toThrow('x: the unit must be a text; expected a speed such as m/s');
    expect(() => convert(1, 'm', null as unknown as string, 'x')).toThrow(InputError);
  });

  it('returns the checked unit from unitFor', () => {
    expect(unitFor('kn', 'speed', 'x').factorToSI).toBe(1852 / 3600);
  });
});
