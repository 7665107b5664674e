import { describe, expect, it } from 'vitest';
import { Matrix, solve } from 'ml-matrix';
import { expm as mathExpm, matrix as mathMatrix } from 'mathjs';
import { computeBudget } from '../../src/pipeline';
import { computeFilterDesign } from '../../src/suboptimal/compute-filter-design';
import { gaussMarkovSigmaFromAllanFloor } from '../../src/sources/gauss-markov-allan';
import { budget, gyro, q, straightMission } from '../fixtures/small-budgets';
import type { SourceInput } from '../../src/inputs/budget-input';

const DEG = Math.PI / 180;

function compass(sources: SourceInput[], rateHz = 1) {
  return { id: 'compass', kind: 'compass' as const, rate: q(rateHz, 'Hz'), sources };
}

describe('a random constant observed in white noise by a filter with the wrong R', () => {
  // The heading error with a noiseless gyro is a random constant x with prior variance P0; the compass
  // measures it at 1 Hz with white noise of variance R. The filter uses R_f instead (the row's tuning).
  // Derivation (Gelb, Applied Optimal Estimation, 1974, §7.2; the scalar case in Brown and Hwang, ch. 6):
  // the filter's own variance after k measurements is P_k = 1 / (1/P0 + k/R_f), and its estimate is the
  // information-weighted mean x̂_k = P_k Σ z_i / R_f with z_i = x + v_i. So the error is
  //   e_k = x̂_k − x = x (k P_k / R_f − 1) + P_k Σ v_i / R_f = −(P_k / P0) x + P_k Σ v_i / R_f,
  // since k P_k / R_f − 1 = −P_k / P0, and its actual variance is
  //   E[e_k²] = P_k² (1/P0 + k R / R_f²).
  const sigma0Deg = 2, sigmaDeg = 0.5, tunedDeg = 0.2;
  const input = budget(straightMission(20, 0, { positionM: 0, headingDeg: sigma0Deg }), [
    gyro([]),
    compass([{ id: 'noise', kind: 'white-noise', value: q(sigmaDeg, 'deg'), tuning: { value: q(tunedDeg, 'deg') } }]),
  ], 1);
  const base = computeBudget(input);
  const design = computeFilterDesign(input, base);
  const P0 = (sigma0Deg * DEG) ** 2, R = (sigmaDeg * DEG) ** 2, Rf = (tunedDeg * DEG) ** 2;

  it('matches P_k² (1/P0 + k R / R_f²) after every measurement to 1e-12 relative', () => {
    const actual = design.actual.series.quantities.heading!.total;
    const believed = design.believed.series.quantities.heading!.total;
    for (let step = 0; step <= 20; step++) {
      const k = step + 1; // measurements at t = 0, 1, ..., step
      const Pk = 1 / (1 / P0 + k / Rf);
      expect(believed[step] / Pk - 1, `believed, k = ${k}`).toBeLessThan(1e-12);
      expect(Math.abs(actual[step] / (Pk * Pk * (1 / P0 + (k * R) / (Rf * Rf))) - 1), `actual, k = ${k}`).toBeLessThan(1e-12);
    }
  });

  it('calls the filter overconfident, and its normalised innovation variance exceeds 1', () => {
    const heading = design.confidence.find((c) => c.quantity === 'heading')!;
    expect(heading.verdict).toMatch(/^the filter believes .* deg, the actual error is .* deg: overconfident by .*×/);
    expect(design.innovations[0].mean).toBeGreaterThan(1);
  });
});

/** Van Loan's Φ and Q_d (IEEE Trans. Automatic Control 23(3), 1978), with mathjs's expm: independent of the engine's. */
function vanLoan(f: number[][], gqg: number[][], dtS: number): { phi: Matrix; qd: Matrix } {
  const n = f.length;
  const big = Array.from({ length: 2 * n }, (_, i) => Array.from({ length: 2 * n }, (_, j) => {
    if (i < n && j < n) return -f[i][j] * dtS;
    if (i < n) return gqg[i][j - n] * dtS;
    if (j >= n) return f[j - n][i - n] * dtS;
    return 0;
  }));
  const e = (mathExpm(mathMatrix(big)).toArray() as number[][]);
  const phiT = new Matrix(e.slice(n).map((r) => r.slice(n)));
  const phi = phiT.transpose();
  const upper = new Matrix(e.slice(0, n).map((r) => r.slice(n)));
  return { phi, qd: phi.mmul(upper) };
}

describe('a first-order Gauss-Markov gyro bias tracked by a filter that models it as a random walk', () => {
  // Truth: heading error ψ' = b, b' = −b/T + w with PSD 2σ²/T (docs/planar-model.md §3); the filter's b is a
  // random walk with the same driving PSD. A compass measures ψ at 1 Hz. In steady state the filter's gain
  // is constant, and s = [b; e] (the truth bias and the filter's error; the truth heading does not enter e,
  // because Φ_f − Φ_t has only a b column) obeys s⁺ = A s + noise. Its steady covariance is the solution of
  // the discrete Lyapunov equation S = A S Aᵀ + W (Gelb, Applied Optimal Estimation, 1974, §7.2; Maybeck,
  // vol. 1, 1979, ch. 6), solved here independently as (I − A⊗A) vec S = vec W with ml-matrix.
  const floorDegH = 20, tauS = 50, compassDeg = 0.5, dtS = 1;
  const input = budget(straightMission(2000, 0, { positionM: 0, headingDeg: 1 }), [
    gyro([{ id: 'bi', kind: 'bias-instability', value: q(floorDegH, 'deg/h'), correlationTime: q(tauS, 's'), tuning: { model: 'random-walk' } }]),
    compass([{ id: 'noise', kind: 'white-noise', value: q(compassDeg, 'deg') }]),
  ], dtS);
  const base = computeBudget(input);
  const design = computeFilterDesign(input, base);

  it('reaches the steady actual heading variance of the discrete Lyapunov equation within 1e-9 relative', () => {
    const sigma = gaussMarkovSigmaFromAllanFloor((floorDegH * DEG) / 3600);
    const psd = (2 * sigma * sigma) / tauS, R = (compassDeg * DEG) ** 2;
    const truth = vanLoan([[0, 1], [0, -1 / tauS]], [[0, 0], [0, psd]], dtS);
    const filter = vanLoan([[0, 1], [0, 0]], [[0, 0], [0, psd]], dtS);
    // Steady filter gain by iterating the filter's own Riccati recursion (Joseph form).
    let P = Matrix.eye(2);
    let K = Matrix.zeros(2, 1);
    const h = new Matrix([[1, 0]]);
    for (let i = 0; i < 20000; i++) {
      const Pm = filter.phi.mmul(P).mmul(filter.phi.transpose()).add(filter.qd);
      K = Pm.mmul(h.transpose()).div(h.mmul(Pm).mmul(h.transpose()).get(0, 0) + R);
      const IKH = Matrix.eye(2).sub(K.mmul(h));
      P = IKH.mmul(Pm).mmul(IKH.transpose()).add(K.mmul(K.transpose()).mul(R));
    }
    // s = [b; eψ; eb]: propagate then update; with row-major vec, vec(A S Aᵀ) = (A ⊗ A) vec S.
    const IKH = Matrix.eye(2).sub(K.mmul(h));
    const prop = Matrix.zeros(3, 3);
    prop.set(0, 0, truth.phi.get(1, 1));
    const dPhiB = filter.phi.clone().sub(truth.phi).getColumnVector(1); // (Φ_f − Φ_t) on b (ml-matrix's sub works in place)
    for (let i = 0; i < 2; i++) {
      prop.set(1 + i, 0, dPhiB.get(i, 0));
      for (let j = 0; j < 2; j++) prop.set(1 + i, 1 + j, filter.phi.get(i, j));
    }
    const upd = Matrix.eye(3);
    for (let i = 0; i < 2; i++) for (let j = 0; j < 2; j++) upd.set(1 + i, 1 + j, IKH.get(i, j));
    const A = upd.mmul(prop);
    // Process noise enters b with +w_b and e with −w (both components of the truth's Q_d).
    const G = new Matrix([[0, 1], [-1, 0], [0, -1]]);
    const Ka = new Matrix([[0], [K.get(0, 0)], [K.get(1, 0)]]);
    const W = upd.mmul(G).mmul(truth.qd).mmul(G.transpose()).mmul(upd.transpose()).add(Ka.mmul(Ka.transpose()).mul(R));
    const vecW = Matrix.columnVector(W.to1DArray());
    const S = solve(Matrix.eye(9).sub(A.kroneckerProduct(A)), vecW);
    const steadyHeading = S.get(1 * 3 + 1, 0);
    const actual = design.actual.series.quantities.heading!.total;
    expect(Math.abs(actual[actual.length - 1] / steadyHeading - 1)).toBeLessThan(1e-9);
    // The filter's own steady variance (its random walk is told nothing of the decay) is the Riccati limit, and it differs.
    const believed = design.believed.series.quantities.heading!.total;
    expect(Math.abs(believed[believed.length - 1] / P.get(0, 0) - 1)).toBeLessThan(1e-9);
    expect(Math.abs(believed[believed.length - 1] / steadyHeading - 1)).toBeGreaterThan(0.05);
  });
});
