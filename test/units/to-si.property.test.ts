import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { DIMENSION_NAMES, DIMENSIONS } from '../../src/units/named-dimensions';
import { convert, fromSI, toSI } from '../../src/units/to-si';

// Seeded so a failure reproduces; values span 200 decades but stay clear of
// overflow and of subnormals, where relative precision is lost by design.
const SEED = 20240917;
const moderate = fc
  .double({ min: -1e100, max: 1e100, noNaN: true, noDefaultInfinity: true })
  .filter((x) => x === 0 || Math.abs(x) >= 1e-100);
const PICKS = DIMENSION_NAMES.flatMap((name) => DIMENSIONS[name].picker.map((unit) => ({ name, unit })));
const PAIRS = DIMENSION_NAMES.flatMap((name) =>
  DIMENSIONS[name].picker.flatMap((a) => DIMENSIONS[name].picker.map((b) => ({ name, a, b }))),
);

function relativeError(actual: number, expected: number): number {
  return expected === 0 ? Math.abs(actual) : Math.abs(actual - expected) / Math.abs(expected);
}

describe('conversion round trips', () => {
  it('gets back the same value, to two roundings, from toSI then fromSI for every picker unit', () => {
    // computed: one multiplication and one division, each within half an ulp
    for (const { name, unit } of PICKS) {
      fc.assert(
        fc.property(moderate, (x) => {
          const back = fromSI(toSI(x, unit, name, 'x'), unit, name, 'x');
          expect(relativeError(back, x), `${x} ${unit}`).toBeLessThanOrEqual(4.5e-16);
        }),
        { seed: SEED, numRuns: 100 },
      );
    }
  });

  it('gets back the same value from convert there and back between any two picker units of one dimension', () => {
    // computed: two multiplications by rounded ratios
    for (const { a, b } of PAIRS) {
      fc.assert(
        fc.property(moderate, (x) => {
          expect(relativeError(convert(convert(x, a, b, 'x'), b, a, 'x'), x), `${x} ${a} -> ${b}`).toBeLessThanOrEqual(1e-15);
        }),
        { seed: SEED, numRuns: 30 },
      );
    }
  });

  it('agrees between convert and going through SI for any two picker units of one dimension', () => {
    // computed: both are products of the same factors, each exact to an ulp
    for (const { name, a, b } of PAIRS) {
      fc.assert(
        fc.property(moderate, (x) => {
          const viaSI = fromSI(toSI(x, a, name, 'x'), b, name, 'x');
          expect(relativeError(convert(x, a, b, 'x'), viaSI), `${x} ${a} -> ${b}`).toBeLessThanOrEqual(1e-15);
        }),
        { seed: SEED, numRuns: 30 },
      );
    }
  });
});
