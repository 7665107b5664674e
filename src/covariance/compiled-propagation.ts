import { propagateInPlace } from './covariance-kernels';
import type { SparseRows } from './sparse-rows';

/** X <- Φ X Φᵀ for the matrix at `offset`, with Φ's non-zero values in `val` (the pattern is baked in). */
export type PropagationKernel = (x: Float64Array, offset: number, val: Float64Array, scratch: Float64Array) => void;

const kernels = new Map<string, PropagationKernel>();

/**
 * A propagation kernel specialised to Φ's sparsity pattern: straight-line
 * code with every index a constant. The generic sparse loop spends most of
 * its time in loop overhead (rows of one to eight entries, n = 11): on the
 * benchmark mission the specialised kernel is several times faster, and
 * propagation is most of the engine's work (see `npm run bench`). Kernels are
 * cached by pattern; a platform that forbids generated code (a strict
 * Content-Security-Policy) gets the generic loop, which gives the same
 * numbers (tested).
 */
export function propagationKernel(phi: SparseRows): PropagationKernel {
  const key = `${phi.n}:${Array.from(phi.rowStart).join(',')}:${Array.from(phi.col).join(',')}`;
  let kernel = kernels.get(key);
  if (!kernel) {
    kernel = compile(phi) ?? genericKernel(phi);
    kernels.set(key, kernel);
  }
  return kernel;
}

/** The generic sparse loop wrapped as a kernel (the fallback, and the reference in tests). */
export function genericKernel(phi: SparseRows): PropagationKernel {
  return (x, offset, val, scratch) => propagateInPlace(x, offset, { ...phi, val }, scratch);
}

function compile(phi: SparseRows): PropagationKernel | undefined {
  const { n, rowStart, col } = phi;
  const lines: string[] = [];
  for (let p = 0; p < col.length; p++) lines.push(`const v${p} = val[${p}];`);
  // A = Φ X
  for (let i = 0; i < n; i++) {
    for (let k = 0; k < n; k++) {
      const terms: string[] = [];
      for (let p = rowStart[i]; p < rowStart[i + 1]; p++) terms.push(`v${p} * x[o + ${col[p] * n + k}]`);
      lines.push(`a[${i * n + k}] = ${terms.length ? terms.join(' + ') : '0'};`);
    }
  }
  // X = A Φᵀ, upper triangle mirrored
  for (let i = 0; i < n; i++) {
    for (let k = i; k < n; k++) {
      const terms: string[] = [];
      for (let p = rowStart[k]; p < rowStart[k + 1]; p++) terms.push(`a[${i * n + col[p]}] * v${p}`);
      const expr = terms.length ? terms.join(' + ') : '0';
      lines.push(i === k ? `x[o + ${i * n + k}] = ${expr};` : `t = ${expr}; x[o + ${i * n + k}] = t; x[o + ${k * n + i}] = t;`);
    }
  }
  try {
    // eslint-disable-next-line no-new-func -- deliberate: see the doc comment above.
    return new Function('x', 'o', 'val', 'a', `'use strict'; let t = 0;\n${lines.join('\n')}`) as PropagationKernel;
  } catch {
    return undefined;
  }
}
