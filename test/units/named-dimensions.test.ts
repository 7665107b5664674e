import { describe, expect, it } from 'vitest';
import { sameDimension } from '../../src/units/dimension';
import {
  describeExpected,
  DIMENSION_NAMES,
  DIMENSIONS,
  dimensionOf,
  isDimensionName,
  labelWithArticle,
  unitDimension,
} from '../../src/units/named-dimensions';
import { parseUnit } from '../../src/units/parse-unit';

describe('named dimensions', () => {
  it('has an entry for every name and a name for every entry', () => {
    expect(Object.keys(DIMENSIONS).sort()).toEqual([...DIMENSION_NAMES].sort());
  });

  it.each(DIMENSION_NAMES)('parses the SI text of %s to its dimension with factor 1', (name) => {
    const unit = parseUnit(DIMENSIONS[name].si, name);
    expect(unit.factorToSI).toBe(1);
    expect(dimensionOf(unit)).toBe(name);
  });

  it.each(DIMENSION_NAMES)('offers only units of the %s dimension in its picker', (name) => {
    expect(DIMENSIONS[name].picker.length).toBeGreaterThanOrEqual(2);
    for (const text of DIMENSIONS[name].picker) expect(unitDimension(text)).toBe(name);
  });

  it('gives no two names the same dimension', () => {
    for (const a of DIMENSION_NAMES) {
      for (const b of DIMENSION_NAMES) {
        if (a !== b) expect(sameDimension(DIMENSIONS[a].dimension, DIMENSIONS[b].dimension)).toBe(false);
      }
    }
  });

  it('files a rate noise density under angle random walk and an accelerometer density under velocity random walk', () => {
    expect(unitDimension('deg/s/√Hz')).toBe('angle-random-walk');
    expect(unitDimension('µg/√Hz')).toBe('velocity-random-walk');
  });

  it('keeps deg/h an angular rate and 1/h a frequency', () => {
    expect(unitDimension('deg/h')).toBe('angular-rate');
    expect(unitDimension('1/h')).toBe('frequency');
  });

  it('returns no name for unknown, malformed, unnamed or non-text units', () => {
    expect(unitDimension('dg/h')).toBeUndefined();
    expect(unitDimension('deg//h')).toBeUndefined();
    expect(unitDimension('m·deg')).toBeUndefined();
    expect(unitDimension(42 as unknown as string)).toBeUndefined();
  });

  it('puts the right article before a label', () => {
    expect(labelWithArticle('angular-rate')).toBe('an angular rate');
    expect(labelWithArticle('speed')).toBe('a speed');
    expect(labelWithArticle('acceleration')).toBe('an acceleration');
  });

  it('describes what is expected with the first three picker units', () => {
    expect(describeExpected('angular-rate')).toBe('an angular rate such as deg/h, deg/s, rad/s');
    expect(describeExpected('angle-random-walk')).toBe('an angle random walk such as deg/√h, deg/s/√Hz, rad/√s');
  });

  it('recognises only the listed names', () => {
    expect(isDimensionName('angular-rate')).toBe(true);
    expect(isDimensionName('angular rate')).toBe(false);
    expect(isDimensionName(undefined)).toBe(false);
  });
});
