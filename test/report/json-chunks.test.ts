import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { jsonChunks } from '../../src/report/json-chunks';

/** The pieces must join to exactly what JSON.stringify (ECMA-262 §25.5.2) writes for plain data. */
describe('jsonChunks', () => {
  it('joins to JSON.stringify for any JSON value', () => {
    fc.assert(fc.property(fc.jsonValue(), (value) => {
      expect([...jsonChunks(value, { numbersPerChunk: 3 })].join('')).toBe(JSON.stringify(value));
    }));
  });

  it('follows JSON.stringify for undefined, non-finite numbers, typed arrays and toJSON', () => {
    const value = { a: undefined, b: [undefined, NaN, Infinity, 1], c: new Float64Array([0.5, 2]), d: new Date(0), e: () => 1 };
    const expected = JSON.stringify({ ...value, c: [0.5, 2] });
    expect([...jsonChunks(value)].join('')).toBe(expected);
  });

  it('splits a long number array into pieces of the given size', () => {
    const pieces = [...jsonChunks(Array.from({ length: 10 }, (_, i) => i), { numbersPerChunk: 4 })];
    expect(pieces).toEqual(['[', '0,1,2,3', ',4,5,6,7', ',8,9', ']']);
  });

  it('rounds to the requested significant digits (Number.prototype.toPrecision)', () => {
    expect([...jsonChunks([Math.PI, 1 / 3, 123456.789, 0], { significantDigits: 4 })].join('')).toBe('[3.142,0.3333,123500,0]');
    expect(() => [...jsonChunks(1, { significantDigits: 18 })]).toThrow(RangeError);
  });
});
