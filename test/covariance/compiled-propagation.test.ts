import { describe, expect, it } from 'vitest';
import { compile, genericKernel, propagationKernel, type KernelForm } from '../../src/covariance/compiled-propagation';
import { reachability, toSparseRows } from '../../src/covariance/sparse-rows';
import { seededRandom } from '../fixtures/seeded-random';


describe('the generated propagation kernel', () => {
  it('gives the same Φ X Φᵀ as the generic sparse loop and as a dense product', () => {
    const uniform = seededRandom(7);
    const rand = () => uniform() - 0.5;
    for (const n of [3, 7, 11, 14]) {
      const phiDense = new Float64Array(n * n).map(() => (rand() > 0.2 ? rand() : 0));
      const phi = toSparseRows(phiDense, n, reachability(phiDense, n));
      const b = new Float64Array(n * n).map(() => rand());
      const x = new Float64Array(n * n); // X = B Bᵀ, symmetric
      for (let i = 0; i < n; i++) for (let j = 0; j < n; j++) for (let k = 0; k < n; k++) x[i * n + j] += b[i * n + k] * b[j * n + k];
      const generated = x.slice(), generic = x.slice();
      propagationKernel(phi)(generated, 0, phi.val, new Float64Array(n * n));
      genericKernel(phi)(generic, 0, phi.val, new Float64Array(n * n));
      for (let i = 0; i < n; i++) {
        for (let j = 0; j < n; j++) {
          let dense = 0;
          for (let k = 0; k < n; k++) for (let l = 0; l < n; l++) dense += phiDense[i * n + k] * x[k * n + l] * phiDense[j * n + l];
          expect(generated[i * n + j]).toBeCloseTo(dense, 10);
          expect(generated[i * n + j] === generic[i * n + j], "bitwise equal up to the sign of zero").toBe(true);
        }
      }
    }
  });

  it('gives the generic loop\'s numbers bit for bit in every generated form, past the size where one function stops being optimised', () => {
    const uniform = seededRandom(11);
    const rand = () => uniform() - 0.5;
    for (const n of [5, 12, 31, 45]) {
      // A sparse Φ like the models': the diagonal plus a few couplings.
      const phiDense = new Float64Array(n * n).map((_, e) => (e % (n + 1) === 0 || uniform() < 0.06 ? rand() : 0));
      const phi = toSparseRows(phiDense, n, new Uint8Array(n * n).fill(1));
      const b = new Float64Array(n * n).map(() => rand());
      const x = new Float64Array(n * n);
      for (let i = 0; i < n; i++) for (let j = 0; j < n; j++) for (let k = 0; k < n; k++) x[i * n + j] += b[i * n + k] * b[j * n + k];
      const generic = x.slice();
      genericKernel(phi)(generic, 0, phi.val, new Float64Array(n * n));
      for (const form of ['unrolled', 'blocked', 'row-loop'] as KernelForm[]) {
        const out = x.slice();
        compile(phi, form)!(out, 0, phi.val, new Float64Array(n * n));
        const differing = out.filter((v, e) => v !== generic[e]).length;
        expect(differing, `${form} at n = ${n}`).toBe(0);
      }
    }
  });
});
