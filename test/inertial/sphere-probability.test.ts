import { describe, expect, it } from 'vitest';
import { probabilityInsideSphere, sphericalErrorProbableM } from '../../src/inertial/sphere-probability';

// docs/checks.md §6: SEP of the equal-sigma case is √χ²₃(0.5) σ = 1.5381722545 σ (scipy.stats.chi2.ppf);
// χ²₃ 95 % quantile 7.8147279033.
describe('spherical error probable from the exact trivariate normal', () => {
  it('is 1.5381722545 σ for equal sigmas', () => {
    expect(sphericalErrorProbableM([4, 0, 0, 0, 4, 0, 0, 0, 4]) / 2).toBeCloseTo(1.5381722545, 9);
  });

  it('holds 95 % inside √7.8147279033 σ', () => {
    expect(probabilityInsideSphere(1, 1, 1, Math.sqrt(7.8147279033))).toBeCloseTo(0.95, 10);
  });

  it('reduces to the 1-D quantile 0.6744897502 σ for a covariance of rank one', () => {
    expect(sphericalErrorProbableM([9, 0, 0, 0, 0, 0, 0, 0, 0]) / 3).toBeCloseTo(0.6744897502, 8);
  });

  it('reduces to the circular CEP 1.1774100225 σ when one axis has no error (docs/checks.md §6)', () => {
    expect(sphericalErrorProbableM([1, 0, 0, 0, 1, 0, 0, 0, 0])).toBeCloseTo(1.1774100225, 8);
  });

  it('does not depend on the axes: a rotated covariance gives the same radius', () => {
    const c = Math.cos(0.7), s = Math.sin(0.7);
    const d = [9, 4, 0.25];
    // R diag(d) Rᵀ with R a rotation about z.
    const p = [c * c * d[0] + s * s * d[1], c * s * (d[0] - d[1]), 0, c * s * (d[0] - d[1]), s * s * d[0] + c * c * d[1], 0, 0, 0, d[2]];
    expect(sphericalErrorProbableM(p)).toBeCloseTo(sphericalErrorProbableM([9, 0, 0, 0, 4, 0, 0, 0, 0.25]), 10);
  });
});
