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
  if (!generatedAllowed) return genericKernel(phi);
  const key = `${phi.n}:${Array.from(phi.rowStart).join(',')}:${Array.from(phi.col).join(',')}`;
  let kernel = kernels.get(key);
  if (!kernel) {
    kernel = compile(phi) ?? genericKernel(phi);
    kernels.set(key, kernel);
  }
  return kernel;
}

let generatedAllowed = true;

/**
 * Turns generated kernels off (every kernel is then the generic loop) or back
 * on: for a host that forbids generated code, and for the tests comparing
 * the two paths through a whole run.
 */
export function allowGeneratedKernels(allowed: boolean): void {
  generatedAllowed = allowed;
}

/** The generic sparse loop wrapped as a kernel (the fallback, and the reference in tests). */
export function genericKernel(phi: SparseRows): PropagationKernel {
  return (x, offset, val, scratch) => propagateInPlace(x, offset, { ...phi, val }, scratch);
}

/**
 * Most multiply-adds one generated function holds. A fully unrolled kernel
 * for a large model is a function V8 stops optimising (about 2,000 terms,
 * 30 states: then it runs 10-20 times slower than the generic loop), so the
 * straight-line code is cut into blocks of at most this many terms, each its
 * own small function, called in order: the same sums in the same order (the
 * same numbers, bit for bit) at the unrolled speed for every state count
 * (see the state-count sweep in `npm run bench`).
 */
export const BLOCK_TERMS = 600;

/** The generated forms: one straight-line block (small models) or several. */
export type KernelForm = 'unrolled' | 'blocked' | 'row-loop';

/**
 * Generates a kernel of Φ's pattern, `blocked` by default (one block when the
 * model is small); `unrolled` puts everything in one function, the old form
 * kept for the benchmark's comparison. Undefined where generated code is forbidden.
 */
export function compile(phi: SparseRows, form: KernelForm = 'blocked'): PropagationKernel | undefined {
  if (form === 'row-loop') {
    try {
      return blockFunction([{ code: rowLoopBody(phi), values: Array.from(phi.col, (_, p) => p), terms: 0 }]);
    } catch {
      return undefined;
    }
  }
  const statements = kernelStatements(phi);
  const limit = form === 'unrolled' ? Infinity : BLOCK_TERMS;
  const blocks: Statement[][] = [[]];
  let terms = 0;
  for (const st of statements) {
    if (terms + st.terms > limit && blocks[blocks.length - 1].length > 0) {
      blocks.push([]);
      terms = 0;
    }
    blocks[blocks.length - 1].push(st);
    terms += st.terms;
  }
  try {
    const parts = blocks.map(blockFunction);
    if (parts.length === 1) return parts[0];
    return (x, o, val, a) => {
      for (let b = 0; b < parts.length; b++) parts[b](x, o, val, a);
    };
  } catch {
    return undefined;
  }
}

/** One line of generated code, the Φ values it reads and how many multiply-adds it does. */
interface Statement {
  code: string;
  values: number[];
  terms: number;
}

function blockFunction(block: Statement[]): PropagationKernel {
  const used = [...new Set(block.flatMap((st) => st.values))].sort((a, b) => a - b);
  const body = [...used.map((p) => `const v${p} = val[${p}];`), ...block.map((st) => st.code)].join('\n');
  // eslint-disable-next-line no-new-func -- deliberate: see the doc comment of propagationKernel.
  return new Function('x', 'o', 'val', 'a', `'use strict'; let t = 0;\n${body}`) as PropagationKernel;
}

/** Every index a constant: A = Φ X row by row, then the upper triangle of X = A Φᵀ, mirrored. */
function kernelStatements(phi: SparseRows): Statement[] {
  const { n, rowStart, col } = phi;
  const out: Statement[] = [];
  const rowValues = (i: number) => Array.from({ length: rowStart[i + 1] - rowStart[i] }, (_, e) => rowStart[i] + e);
  // A = Φ X
  for (let i = 0; i < n; i++) {
    const values = rowValues(i);
    for (let k = 0; k < n; k++) {
      const terms = values.map((p) => `v${p} * x[o + ${col[p] * n + k}]`);
      out.push({ code: `a[${i * n + k}] = ${terms.length ? terms.join(' + ') : '0'};`, values, terms: Math.max(1, terms.length) });
    }
  }
  // X = A Φᵀ, upper triangle mirrored
  for (let i = 0; i < n; i++) {
    for (let k = i; k < n; k++) {
      const values = rowValues(k);
      const terms = values.map((p) => `a[${i * n + col[p]}] * v${p}`);
      const expr = terms.length ? terms.join(' + ') : '0';
      const code = i === k ? `x[o + ${i * n + k}] = ${expr};` : `t = ${expr}; x[o + ${i * n + k}] = t; x[o + ${k * n + i}] = t;`;
      out.push({ code, values, terms: Math.max(1, terms.length) });
    }
  }
  return out;
}

/**
 * One loop per row of Φ with that row's columns as constants: the same sums
 * in the same order as the unrolled form (so the same numbers, bit for bit),
 * in code that grows with Φ's non-zeros rather than with n times them.
 */
function rowLoopBody(phi: SparseRows): string {
  const { n, rowStart, col } = phi;
  const lines: string[] = [];
  // A = Φ X, row i: A[i][k] = Σ_p v_p X[col_p][k]
  for (let i = 0; i < n; i++) {
    const terms: string[] = [];
    for (let p = rowStart[i]; p < rowStart[i + 1]; p++) terms.push(`v${p} * x[o + ${col[p] * n} + k]`);
    lines.push(`for (let k = 0; k < ${n}; k++) a[${i * n} + k] = ${terms.length ? terms.join(' + ') : '0'};`);
  }
  // X = A Φᵀ, column k of the upper triangle: X[i][k] = Σ_p A[i][col_p] v_p for i <= k, mirrored
  for (let k = 0; k < n; k++) {
    const terms: string[] = [];
    for (let p = rowStart[k]; p < rowStart[k + 1]; p++) terms.push(`a[r + ${col[p]}] * v${p}`);
    const expr = terms.length ? terms.join(' + ') : '0';
    lines.push(`for (let i = 0, r = 0; i <= ${k}; i++, r += ${n}) { t = ${expr}; x[o + r + ${k}] = t; x[o + ${k * n} + i] = t; }`);
  }
  return lines.join('\n');
}
