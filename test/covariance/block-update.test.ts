import { describe, expect, it } from 'vitest';
import { BlockUpdate } from '../../src/covariance/block-update';
import { josephUpdateInPlace, multiplySparseVector } from '../../src/covariance/covariance-kernels';

/** A seeded linear congruential generator (Numerical Recipes constants), so the test is repeatable. */
function seeded(seed: number): () => number {
  let s = seed >>> 0;
  return () => ((s = (Math.imul(s, 1664525) + 1013904223) >>> 0) / 2 ** 32) - 0.5;
}

/** A random symmetric positive definite n x n matrix L Lᵀ + I. */
function randomSpd(n: number, rand: () => number): Float64Array {
  const l = Float64Array.from({ length: n * n }, rand);
  const p = new Float64Array(n * n);
  for (let i = 0; i < n; i++) for (let j = 0; j < n; j++) {
    let s = i === j ? 1 : 0;
    for (let k = 0; k < n; k++) s += l[i * n + k] * l[j * n + k];
    p[i * n + j] = s;
  }
  return p;
}

describe('the block update of a boundary', () => {
  // The fixed-gain Joseph recursion of docs/planar-model.md §7 (Gelb 1974, sec. 7.3) applied q times in
  // turn equals one congruence with I − B H (an algebraic identity, shown in block-update.ts).
  it.each([1, 2, 3, 8])('equals %i sequential scalar updates of a source share to round-off', (q) => {
    const n = 13, rand = seeded(17 + q);
    const total = randomSpd(n, rand), share = randomSpd(n, rand);
    const expected = share.slice();
    const block = new BlockUpdate(n);
    const rShare = new Float64Array(q);
    const u = new Float64Array(n), gain = new Float64Array(n), uShare = new Float64Array(n);
    for (let a = 0; a < q; a++) {
      const hIdx = Int32Array.from([a % n, (a * 5 + 3) % n]).sort();
      const hVal = Float64Array.from([1, 0.3 * (a + 1)]);
      const rTotal = 0.5 + a, r = a % 2 === 0 ? 0.2 * rTotal : 0;
      rShare[a] = r;
      const hph = multiplySparseVector(total, 0, n, hIdx, hVal, u);
      for (let i = 0; i < n; i++) gain[i] = u[i] / (hph + rTotal);
      josephUpdateInPlace(total, 0, n, gain, u, hph, rTotal);
      const hxh = multiplySparseVector(expected, 0, n, hIdx, hVal, uShare);
      josephUpdateInPlace(expected, 0, n, gain, uShare, hxh, r);
      block.add(hIdx, hVal, gain);
    }
    block.finish();
    block.apply(share, 0, rShare);
    const scale = Math.max(...expected.map(Math.abs));
    share.forEach((v, e) => expect(Math.abs(v - expected[e])).toBeLessThan(1e-13 * scale));
    for (let i = 0; i < n; i++) for (let j = 0; j < n; j++) expect(share[i * n + j]).toBe(share[j * n + i]);
  });
});
