/**
 * Non-negative least squares, min ‖Ax − b‖² subject to x ≥ 0, for a handful
 * of unknowns, by trying every support. The problem is convex; its solution
 * x* is the unconstrained least-squares solution on its own support S* with
 * every entry positive (the Karush-Kuhn-Tucker conditions; Lawson & Hanson,
 * "Solving Least Squares Problems", Prentice-Hall 1974, ch. 23). Each support
 * whose unconstrained solution is positive is a feasible point, so the best
 * of them is at least as good as x*: it is the solution. With five noise
 * terms that is 31 small solves, exact and simpler than an active-set loop.
 *
 * Columns are scaled to unit length before solving (the Allan basis spans
 * many decades); ml-matrix's QR does the solves.
 */
import { inverse, Matrix, QrDecomposition } from 'ml-matrix';
import { InputError } from '../errors';

/** Most unknowns accepted (2^10 supports). */
const MAX_UNKNOWNS = 10;

/** The solution of a non-negative least-squares problem. */
export interface NnlsSolution {
  /** x ≥ 0, one entry per column of A. */
  readonly x: Float64Array;
  /** Which entries are positive (the support S). */
  readonly support: readonly boolean[];
  /** ‖Ax − b‖². */
  readonly residualSumSquares: number;
}

function columnNorms(a: Matrix): number[] {
  return Array.from({ length: a.columns }, (_, k) => Math.hypot(...a.getColumn(k)) || 1);
}

/** Unconstrained least squares on the columns in `cols`; undefined when rank deficient. */
function solveOn(a: Matrix, b: Matrix, cols: number[]): number[] | undefined {
  if (cols.length > a.rows) return undefined;
  const sub = a.subMatrixColumn(cols);
  const qr = new QrDecomposition(sub);
  if (!qr.isFullRank()) return undefined;
  const x = qr.solve(b).getColumn(0);
  return x.every(Number.isFinite) ? x : undefined;
}

function residualSumSquares(a: Matrix, b: Matrix, x: Float64Array): number {
  const r = a.mmul(Matrix.columnVector(Array.from(x))).sub(b);
  return r.getColumn(0).reduce((s, v) => s + v * v, 0);
}

/**
 * Solves min ‖Ax − b‖² with x ≥ 0.
 * @param rows A as an array of rows (each of the same length, at most 10 columns).
 * @param b right-hand side, one entry per row.
 * @throws InputError when the shapes disagree, there are too many unknowns,
 *   or an entry is not finite.
 */
export function nonNegativeLeastSquares(rows: readonly (readonly number[])[], b: readonly number[]): NnlsSolution {
  const k = rows[0]?.length ?? 0;
  if (rows.length !== b.length || k === 0 || k > MAX_UNKNOWNS || rows.some((r) => r.length !== k)) {
    throw new InputError('nnls', `A must be ${b.length} rows of 1 to ${MAX_UNKNOWNS} equal columns`);
  }
  if (!rows.every((r) => r.every(Number.isFinite)) || !b.every(Number.isFinite)) throw new InputError('nnls', 'every entry must be finite');
  const raw = new Matrix(rows.map((r) => [...r]));
  const norms = columnNorms(raw);
  const a = raw.clone().divRowVector(norms);
  const rhs = Matrix.columnVector([...b]);
  let best: NnlsSolution = { x: new Float64Array(k), support: new Array<boolean>(k).fill(false), residualSumSquares: rhs.getColumn(0).reduce((s, v) => s + v * v, 0) };
  for (let mask = 1; mask < 1 << k; mask++) {
    const cols = Array.from({ length: k }, (_, i) => i).filter((i) => mask & (1 << i));
    const xs = solveOn(a, rhs, cols);
    if (!xs || xs.some((v) => v <= 0)) continue;
    const x = new Float64Array(k);
    cols.forEach((c, i) => (x[c] = xs[i] / norms[c]));
    const rss = residualSumSquares(raw, rhs, x);
    if (rss < best.residualSumSquares) best = { x, support: Array.from({ length: k }, (_, i) => (mask & (1 << i)) !== 0), residualSumSquares: rss };
  }
  return best;
}

/**
 * (AᵀA)⁻¹ restricted to the columns in `cols`, computed on unit-scaled
 * columns and scaled back: the covariance of the least-squares solution per
 * unit residual variance.
 * @returns a cols.length × cols.length matrix, or undefined when singular. Throws nothing.
 */
export function normalMatrixInverse(rows: readonly (readonly number[])[], cols: readonly number[]): number[][] | undefined {
  const a = new Matrix(rows.map((r) => cols.map((c) => r[c])));
  const norms = columnNorms(a);
  const scaled = a.clone().divRowVector(norms);
  try {
    const inv = inverse(scaled.transpose().mmul(scaled));
    const out = inv.to2DArray().map((row, i) => row.map((v, j) => v / (norms[i] * norms[j])));
    return out.every((r) => r.every(Number.isFinite)) ? out : undefined;
  } catch {
    return undefined;
  }
}
