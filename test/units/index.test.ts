import { describe, expect, it } from 'vitest';
import * as units from '../../src/units';

describe('units index', () => {
  it('exports the whole public API and every export loads under bare Node', () => {
    const expected = [
      'DIMENSIONLESS', 'dimension', 'formatDimension', 'multiplyDimensions', 'raiseDimension', 'sameDimension',
      'UNIT_ATOMS', 'findAtom', 'spellingInOtherCase',
      'parseUnit', 'readUnit', 'unitProblemMessage',
      'DIMENSIONS', 'DIMENSION_NAMES', 'describeExpected', 'dimensionOf', 'isDimensionName', 'labelWithArticle', 'unitDimension',
      'convert', 'fromSI', 'toSI', 'unitFor',
      'formatSignificant',
      'describeConversion', 'withUnit',
      'densityFromRandomWalk', 'randomWalkFromDensity', 'randomWalkFromSampleSigma', 'sampleSigmaFromRandomWalk',
    ];
    expect(Object.keys(units).sort()).toEqual(expected.sort());
    for (const name of expected) expect((units as Record<string, unknown>)[name]).toBeDefined();
  });
});
