/**
 * Method (b): a weighted least-squares fit of the whole curve,
 *   σ²(τ) = Σ_i c_i · σ_i²(τ),  c_i ≥ 0,
 * with σ_i² the IEEE Std 952 term shapes of unit coefficient (noise-terms.ts)
 * and c_i the squared coefficients (Q², N², B², K², R²).
 *
 * Weights: the relative uncertainty of σ² is about 2δ (δ from
 * percentage-error.ts), so each residual is divided by 2δ_j·v_j. The first
 * pass takes v_j = the measured σ_j²; two more passes take v_j = the fitted
 * model (iteratively reweighted least squares), because weights built from
 * the data favour points that scattered low and bias the fit downward
 * (common practice, no source).
 *
 * Standard errors come from (AᵀWA)⁻¹ on the terms in use, inflated by the
 * reduced χ² when it exceeds 1 (common practice, no source). They treat the
 * points as independent, which overlapping estimates at neighbouring τ are
 * not, and δ itself understates the scatter (docs/checks.md §1.3): read them
 * as a lower limit of the real uncertainty.
 */
import { InputError } from '../errors';
import type { CurvePoints } from './log-log-lines';
import { nonNegativeLeastSquares, normalMatrixInverse } from './nnls-subsets';
import { NOISE_TERMS, noiseTerm, type NoiseTermId } from './noise-terms';

/** One fitted term, in the curve's units (SI when the curve is SI). */
export interface FittedTerm {
  readonly id: NoiseTermId;
  /** The coefficient √c (Q, N, B, K or R); 0 when the fit put the term at its bound. */
  readonly coefficient: number;
  /**
   * Standard error of the coefficient: se(c)/(2√c) by the delta method; for a
   * term at zero, √se(c) from the fit with the term included, i.e. the size
   * below which the curve cannot tell the term from nothing.
   */
  readonly standardError: number;
  /** True when the non-negativity bound holds the term at zero. */
  readonly atZero: boolean;
}

/** The result of {@link fitNoiseTerms}. */
export interface TermFit {
  readonly terms: readonly FittedTerm[];
  /** Weighted residual sum of squares of the last pass. */
  readonly chiSquare: number;
  /** Points used minus terms in use. */
  readonly degreesOfFreedom: number;
  /** Points used (σ > 0). */
  readonly pointCount: number;
}

/** Passes of the fit: one with data weights, then reweighted with the model. */
const PASSES = 3;

interface Design {
  rows: number[][];
  rhs: number[];
}

function design(points: CurvePoints, used: number[], ids: NoiseTermId[], reference: (j: number) => number): Design {
  const rows: number[][] = [], rhs: number[] = [];
  for (const j of used) {
    const scale = 2 * points.percentageError[j] * reference(j);
    rows.push(ids.map((id) => noiseTerm(id).unitVariance(points.tauS[j]) / scale));
    rhs.push((points.adev[j] * points.adev[j]) / scale);
  }
  return { rows, rhs };
}

function modelAt(points: CurvePoints, ids: NoiseTermId[], c: Float64Array, j: number): number {
  return ids.reduce((s, id, k) => s + c[k] * noiseTerm(id).unitVariance(points.tauS[j]), 0);
}

/**
 * Fits the noise terms to a whole curve.
 * @param points the curve (σ in any rate unit; SI gives SI coefficients).
 * @param ids the terms to fit; default all five.
 * @throws InputError when fewer than two points have σ > 0.
 */
export function fitNoiseTerms(points: CurvePoints, ids: NoiseTermId[] = NOISE_TERMS.map((t) => t.id)): TermFit {
  const used = Array.from(points.tauS, (_, j) => j).filter((j) => points.adev[j] > 0 && points.percentageError[j] > 0);
  if (used.length < 2) throw new InputError('curve', 'the Allan curve has fewer than two points above zero: the log is constant or too short');
  let c: Float64Array = new Float64Array(ids.length);
  let d: Design = design(points, used, ids, (j) => points.adev[j] ** 2);
  let solution = nonNegativeLeastSquares(d.rows, d.rhs);
  for (let pass = 1; pass < PASSES; pass++) {
    c = solution.x;
    const model = new Map(used.map((j) => [j, modelAt(points, ids, c, j)]));
    d = design(points, used, ids, (j) => (model.get(j)! > 0 ? model.get(j)! : points.adev[j] ** 2));
    solution = nonNegativeLeastSquares(d.rows, d.rhs);
  }
  c = solution.x;
  const support = ids.map((_, k) => k).filter((k) => solution.support[k]);
  const dof = used.length - support.length;
  const inflation = dof > 0 ? Math.max(1, solution.residualSumSquares / dof) : 1;
  const cov = normalMatrixInverse(d.rows, support);
  const terms = ids.map((id, k): FittedTerm => {
    if (solution.support[k]) {
      const varC = cov ? cov[support.indexOf(k)][support.indexOf(k)] * inflation : Number.NaN;
      const coefficient = Math.sqrt(c[k]);
      return { id, coefficient, standardError: Math.sqrt(varC) / (2 * coefficient), atZero: false };
    }
    const withTerm = [...support, k].sort((a, b) => a - b);
    const covWith = normalMatrixInverse(d.rows, withTerm);
    const varC = covWith ? covWith[withTerm.indexOf(k)][withTerm.indexOf(k)] * inflation : Number.NaN;
    return { id, coefficient: 0, standardError: Math.sqrt(Math.sqrt(varC)), atZero: true };
  });
  return { terms, chiSquare: solution.residualSumSquares, degreesOfFreedom: dof, pointCount: used.length };
}
