import { describe, expect, it } from 'vitest';
import { expm as mathjsExpm, matrix } from 'mathjs';
import { expm } from '../../src/covariance/matrix-exponential';
import { oneNorm } from '../../src/covariance/dense-matrix';
import { InputError } from '../../src/errors';
import { seededRandom } from '../fixtures/seeded-random';

function randomMatrix(n: number, scale: number, random: () => number): Float64Array {
  return Float64Array.from({ length: n * n }, () => scale * (2 * random() - 1));
}

function toRows(a: Float64Array, n: number): number[][] {
  return Array.from({ length: n }, (_, i) => Array.from(a.subarray(i * n, (i + 1) * n)));
}

/** e^A from the reference library mathjs (npm `mathjs`, function `expm`). */
function referenceExpm(a: Float64Array, n: number): Float64Array {
  const rows = mathjsExpm(matrix(toRows(a, n))).toArray() as number[][];
  return Float64Array.from(rows.flat());
}

function frobenius(a: ArrayLike<number>): number {
  let sum = 0;
  for (let k = 0; k < a.length; k++) sum += a[k] * a[k];
  return Math.sqrt(sum);
}

function relativeDifference(x: Float64Array, y: Float64Array): number {
  return frobenius(x.map((v, k) => v - y[k])) / frobenius(y);
}

describe('expm', () => {
  it('returns the identity for the zero matrix', () => {
    // e^0 = I by the defining power series (common practice, no source).
    for (const n of [1, 2, 5, 24]) {
      const e = expm(new Float64Array(n * n), n);
      e.forEach((v, k) => expect(v).toBe(Math.floor(k / n) === k % n ? 1 : 0));
    }
  });

  it('exponentiates a diagonal matrix entry by entry', () => {
    // e^diag(d) = diag(e^d) by the power series (common practice, no source).
    const d = [-30, -2.5, -1e-3, 0, 1e-8, 0.7, 4, 12];
    const n = d.length;
    const a = new Float64Array(n * n);
    d.forEach((v, i) => (a[i * n + i] = v));
    const e = expm(a, n);
    for (let i = 0; i < n; i++) {
      for (let j = 0; j < n; j++) {
        if (i !== j) expect(e[i * n + j]).toBe(0);
      }
      expect(Math.abs(e[i * n + i] / Math.exp(d[i]) - 1)).toBeLessThan(1e-13);
    }
  });

  it('sums the finite power series of a nilpotent matrix', () => {
    // For strictly upper triangular N, N^n = 0 and e^N = Σ_{k<n} N^k/k! exactly (common practice, no source).
    const random = seededRandom(7);
    for (const n of [2, 3, 6, 10]) {
      const a = new Float64Array(n * n);
      for (let i = 0; i < n; i++) for (let j = i + 1; j < n; j++) a[i * n + j] = 4 * (2 * random() - 1);
      const expected = new Float64Array(n * n);
      let term = Float64Array.from({ length: n * n }, (_, k) => (Math.floor(k / n) === k % n ? 1 : 0));
      for (let k = 1; k <= n; k++) {
        expected.forEach((_, idx) => (expected[idx] += term[idx]));
        const next = new Float64Array(n * n);
        for (let i = 0; i < n; i++)
          for (let m = 0; m < n; m++)
            for (let j = 0; j < n; j++) next[i * n + j] += (term[i * n + m] * a[m * n + j]) / k;
        term = next;
      }
      expect(relativeDifference(expm(a, n), expected)).toBeLessThan(1e-13);
      // Reference library mathjs `expm` agrees as well.
      expect(relativeDifference(expm(a, n), referenceExpm(a, n))).toBeLessThan(1e-12);
    }
  });

  it('matches the mathjs reference on seeded random matrices of order 2 to 24', () => {
    // Reference: npm `mathjs` 15.2.0, function `expm` (Padé with scaling and squaring).
    const random = seededRandom(20050101);
    for (let n = 2; n <= 24; n++) {
      for (const scale of [1e-3, 0.05, 0.3, 1, 3]) {
        const a = randomMatrix(n, scale / Math.sqrt(n), random);
        expect(relativeDifference(expm(a, n), referenceExpm(a, n))).toBeLessThan(1e-12);
      }
    }
  });

  it('matches the mathjs reference on large-norm matrices that need many squarings', () => {
    // Reference: npm `mathjs` `expm`. Squaring amplifies round-off with the norm, hence the looser bound.
    const random = seededRandom(13);
    for (const n of [2, 4, 8, 16, 24]) {
      const a = randomMatrix(n, 25 / Math.sqrt(n), random);
      expect(oneNorm(a, n)).toBeGreaterThan(20);
      expect(relativeDifference(expm(a, n), referenceExpm(a, n))).toBeLessThan(1e-10);
    }
  });

  it('satisfies e^A e^(-A) = I for a dense random matrix', () => {
    // Group property of the exponential (common practice, no source).
    const n = 12;
    const a = randomMatrix(n, 1, seededRandom(99));
    const e = expm(a, n);
    const eInv = expm(a.map((v) => -v), n);
    for (let i = 0; i < n; i++) {
      for (let j = 0; j < n; j++) {
        let sum = 0;
        for (let k = 0; k < n; k++) sum += e[i * n + k] * eInv[k * n + j];
        expect(Math.abs(sum - (i === j ? 1 : 0))).toBeLessThan(1e-11);
      }
    }
  });

  it('gives the rotation matrix for a skew-symmetric 2 x 2 generator', () => {
    // e^{[[0, −θ],[θ, 0]]} = [[cos θ, −sin θ],[sin θ, cos θ]] (common practice, no source).
    for (const theta of [1e-6, 0.1, 1, 3, 50]) {
      const e = expm(Float64Array.of(0, -theta, theta, 0), 2);
      const expected = [Math.cos(theta), -Math.sin(theta), Math.sin(theta), Math.cos(theta)];
      e.forEach((v, k) => expect(Math.abs(v - expected[k])).toBeLessThan(1e-13 * Math.max(1, theta)));
    }
  });

  it('does not modify its argument', () => {
    const a = randomMatrix(5, 10, seededRandom(3));
    const copy = a.slice();
    expm(a, 5);
    expect(a).toEqual(copy);
  });

  it('rejects a wrong length, a bad order and non-finite entries with InputError', () => {
    expect(() => expm(new Float64Array(5), 2)).toThrow(InputError);
    expect(() => expm(new Float64Array(4), 0)).toThrow(InputError);
    expect(() => expm(new Float64Array(4), 1.5)).toThrow(InputError);
    expect(() => expm(Float64Array.of(1, Number.NaN, 0, 1), 2)).toThrow(InputError);
  });
});
