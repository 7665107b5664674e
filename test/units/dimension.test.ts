import { describe, expect, it } from 'vitest';
import { InputError } from '../../src/errors';
import {
  DIMENSIONLESS,
  dimension,
  formatDimension,
  multiplyDimensions,
  raiseDimension,
  sameDimension,
} from '../../src/units/dimension';

describe('dimension', () => {
  it('stores exponents doubled, so rad/√s has time half-steps -1', () => {
    expect(dimension(0, 1, -0.5)).toEqual({ lengthHalfSteps: 0, angleHalfSteps: 2, timeHalfSteps: -1 });
  });

  it('refuses exponents that are not multiples of one half', () => {
    expect(() => dimension(0, 1, 1 / 3)).toThrow(InputError);
    expect(() => dimension(0, 1, 1 / 3)).toThrow('dimension: exponents must be multiples of 1/2');
  });

  it('adds exponents when multiplying: rad/s times √s is rad/√s', () => {
    expect(multiplyDimensions(dimension(0, 1, -1), dimension(0, 0, 0.5))).toEqual(dimension(0, 1, -0.5));
  });

  it('raises to half powers and refuses results that need quarter powers', () => {
    expect(raiseDimension(dimension(0, 0, 1), 1)).toEqual(dimension(0, 0, 0.5));
    expect(raiseDimension(dimension(0, 0, 0.5), 1)).toBeUndefined();
  });

  it('never produces a negative zero when raising to a negative power', () => {
    const raised = raiseDimension(dimension(0, 1, 0), -2);
    expect(Object.is(raised?.lengthHalfSteps, 0)).toBe(true);
    expect(Object.is(raised?.timeHalfSteps, 0)).toBe(true);
  });

  it('tells an angular rate from a frequency because angle is a base of its own', () => {
    expect(sameDimension(dimension(0, 1, -1), dimension(0, 0, -1))).toBe(false);
    expect(sameDimension(dimension(0, 1, -1), dimension(0, 1, -1))).toBe(true);
  });

  it.each([
    ['rad/√s', dimension(0, 1, -0.5)],
    ['rad/s/√s', dimension(0, 1, -1.5)],
    ['m/s²', dimension(1, 0, -2)],
    ['m·rad', dimension(1, 1, 0)],
    ['1/s', dimension(0, 0, -1)],
    ['√s', dimension(0, 0, 0.5)],
    ['m·s·√s', dimension(1, 0, 1.5)],
    ['1/s^5', dimension(0, 0, -5)],
    ['1', DIMENSIONLESS],
  ])('writes %s in the trade style, whole powers first and the half power last', (text, d) => {
    expect(formatDimension(d)).toBe(text);
  });
});
