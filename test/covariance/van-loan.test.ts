import { describe, expect, it } from 'vitest';
import { EigenvalueDecomposition, Matrix } from 'ml-matrix';
import { expm as mathjsExpm, matrix } from 'mathjs';
import { discretiseVanLoan } from '../../src/covariance/van-loan';
import { InputError } from '../../src/errors';
import { seededRandom } from '../fixtures/seeded-random';

const DEG = Math.PI / 180;

function rowMajor(rows: number[][]): Float64Array {
  return Float64Array.from(rows.flat());
}

function diagonal(values: number[]): Float64Array {
  const n = values.length;
  const out = new Float64Array(n * n);
  values.forEach((v, i) => (out[i * n + i] = v));
  return out;
}

function expectRelative(actual: Float64Array, expected: number[][], rel: number): void {
  expected.flat().forEach((e, k) => {
    if (e === 0) expect(actual[k]).toBe(0);
    else expect(Math.abs(actual[k] / e - 1)).toBeLessThan(rel);
  });
}

function expectSymmetricPsd(qd: Float64Array, n: number): void {
  for (let i = 0; i < n; i++) for (let j = 0; j < n; j++) expect(qd[i * n + j]).toBe(qd[j * n + i]);
  const rows = Array.from({ length: n }, (_, i) => Array.from(qd.subarray(i * n, (i + 1) * n)));
  const eigenvalues = new EigenvalueDecomposition(new Matrix(rows)).realEigenvalues;
  const largest = Math.max(...eigenvalues.map(Math.abs));
  for (const lambda of eigenvalues) expect(lambda).toBeGreaterThanOrEqual(-1e-14 * largest);
}

describe('discretiseVanLoan', () => {
  it('reproduces the continuous white-noise-acceleration Q_d for T = 0.1 s, q = 0.01', () => {
    // Bar-Shalom, Li & Kirubarajan 2001, §6.2.2: Q_d = q[[T³/3, T²/2],[T²/2, T]], Φ = [[1, T],[0, 1]];
    // values as recorded in docs/checks.md §3.2(a).
    const t = 0.1;
    const q = 0.01;
    const { phi, qd } = discretiseVanLoan(rowMajor([[0, 1], [0, 0]]), diagonal([0, q]), 2, t);
    [1, t, 0, 1].forEach((e, k) => expect(Math.abs(phi[k] - e)).toBeLessThan(1e-18));
    const closed = [(q * t ** 3) / 3, (q * t ** 2) / 2, (q * t ** 2) / 2, q * t];
    closed.forEach((e, k) => expect(Math.abs(qd[k] - e)).toBeLessThan(1e-18));
    expectRelative(qd, [[3.33333333333e-6, 5e-5], [5e-5, 1e-3]], 1e-11);
  });

  it('reproduces the continuous white-noise-acceleration Q_d for T = 1 s, q = 1', () => {
    // Bar-Shalom, Li & Kirubarajan 2001, §6.2.2; docs/checks.md §3.2(a): [[1/3, 1/2],[1/2, 1]].
    const { phi, qd } = discretiseVanLoan(rowMajor([[0, 1], [0, 0]]), diagonal([0, 1]), 2, 1);
    expectRelative(phi, [[1, 1], [0, 1]], 1e-12);
    expectRelative(qd, [[1 / 3, 1 / 2], [1 / 2, 1]], 1e-12);
  });

  it('reproduces the continuous white-noise-jerk (three-state) Q_d', () => {
    // Bar-Shalom, Li & Kirubarajan 2001, §6.2.3: Q_d = q[[T⁵/20, T⁴/8, T³/6],[T⁴/8, T³/3, T²/2],[T³/6, T²/2, T]];
    // docs/checks.md §3.2(b), T = 0.1 s, q = 0.01.
    const t = 0.1;
    const q = 0.01;
    const f = rowMajor([[0, 1, 0], [0, 0, 1], [0, 0, 0]]);
    const { phi, qd } = discretiseVanLoan(f, diagonal([0, 0, q]), 3, t);
    expectRelative(phi, [[1, t, t * t / 2], [0, 1, t], [0, 0, 1]], 1e-14);
    const closed = [
      [t ** 5 / 20, t ** 4 / 8, t ** 3 / 6],
      [t ** 4 / 8, t ** 3 / 3, t ** 2 / 2],
      [t ** 3 / 6, t ** 2 / 2, t],
    ].map((row) => row.map((v) => q * v));
    expectRelative(qd, closed, 1e-12);
    closed.flat().forEach((e, k) => expect(Math.abs(qd[k] - e)).toBeLessThan(1e-18));
  });

  it('gives φ = e^(−T/τ) and Q_d = σ²(1 − φ²) for a scalar Gauss-Markov process', () => {
    // Closed form and values: docs/checks.md §3.2(c) (computed with scipy.linalg.expm).
    const cases = [
      { sigma: 0.5, tauS: 100, dtS: 1, phi: 9.900498337492e-1, qd: 4.950331673311e-3 },
      { sigma: 1, tauS: 20, dtS: 1, phi: 9.512294245007e-1, qd: 9.516258196404e-2 },
    ];
    for (const c of cases) {
      const { phi, qd } = discretiseVanLoan(Float64Array.of(-1 / c.tauS), Float64Array.of((2 * c.sigma ** 2) / c.tauS), 1, c.dtS);
      expect(Math.abs(phi[0] / Math.exp(-c.dtS / c.tauS) - 1)).toBeLessThan(1e-12);
      // σ²(1 − e^{−2T/τ}) written with expm1 so the reference itself does not cancel.
      expect(Math.abs(qd[0] / (-(c.sigma ** 2) * Math.expm1((-2 * c.dtS) / c.tauS)) - 1)).toBeLessThan(1e-12);
      expect(Math.abs(phi[0] / c.phi - 1)).toBeLessThan(1e-12);
      expect(Math.abs(qd[0] / c.qd - 1)).toBeLessThan(1e-12);
    }
  });

  it('reproduces the Singer manoeuvre model for two step lengths', () => {
    // Singer, IEEE Trans. AES-6(4), 1970 (from memory); values docs/checks.md §3.2(d), computed with scipy.linalg.expm.
    const singer = (tauS: number) => rowMajor([[0, 1, 0], [0, 0, 1], [0, 0, -1 / tauS]]);
    const first = discretiseVanLoan(singer(20), diagonal([0, 0, 2 / 20]), 3, 1);
    expectRelative(first.phi, [[1, 1, 4.917698002856e-1], [0, 1, 9.754115099857e-1], [0, 0, 9.512294245007e-1]], 1e-10);
    expectRelative(
      first.qd,
      [
        [4.863556953336e-3, 1.209187682365e-2, 1.585580558761e-2],
        [1.209187682365e-2, 3.211198675859e-2, 4.757138069063e-2],
        [1.585580558761e-2, 4.757138069063e-2, 9.516258196404e-2],
      ],
      1e-10,
    );
    expectSymmetricPsd(first.qd, 3);
    const second = discretiseVanLoan(singer(10), diagonal([0, 0, 2 / 10]), 3, 2);
    expectRelative(
      second.qd,
      [
        [2.868483530855e-1, 3.508411108683e-1, 2.187652733168e-1],
        [3.508411108683e-1, 4.602966276288e-1, 3.285853987968e-1],
        [2.187652733168e-1, 3.285853987968e-1, 3.296799539644e-1],
      ],
      1e-10,
    );
    expectSymmetricPsd(second.qd, 3);
  });

  it('reproduces the heading / Gauss-Markov gyro bias / scale-factor example', () => {
    // docs/checks.md §3.2(e) (computed with scipy.linalg.expm): N = 0.1 °/√h, σ_b = 10 °/h, τ_b = 300 s, T = 1 s.
    const arw = (0.1 * DEG) / 60;
    const sigmaB = (10 * DEG) / 3600;
    const tauB = 300;
    const qB = (2 * sigmaB ** 2) / tauB;
    const f = rowMajor([[0, 1, 0], [0, -1 / tauB, 0], [0, 0, 0]]);
    const { phi, qd } = discretiseVanLoan(f, diagonal([arw ** 2, qB, 0]), 3, 1);
    expectRelative(phi, [[1, 9.98335183643e-1, 0], [0, 9.966722160545e-1, 0], [0, 0, 1]], 1e-12);
    expectRelative(
      qd,
      [
        [8.513696684653e-10, 7.808744854483e-12, 0],
        [7.808744854483e-12, 1.56175041696e-11, 0],
        [0, 0, 0],
      ],
      1e-10,
    );
    // Closed form of docs/checks.md §3.2(e) with x = βT. Its q₁₁ bracket
    // T − 2(1−e^{−x})/β + (1−e^{−2x})/(2β) cancels in doubles, so it is summed as the
    // series (1/β) Σ_{k≥3} (−1)^{k+1}(2^{k−1} − 2) x^k/k! (Taylor expansion of both exponentials, derived here).
    const beta = 1 / tauB;
    const x = beta * 1;
    let bracket = 0;
    let power = x * x;
    let factorial = 2;
    for (let k = 3; k < 30; k++) {
      power *= x;
      factorial *= k;
      bracket += ((k % 2 === 1 ? 1 : -1) * (2 ** (k - 1) - 2) * power) / factorial;
    }
    const q11 = arw ** 2 * 1 + (qB / beta ** 2) * (bracket / beta);
    const q12 = (qB / beta) * (-Math.expm1(-x) / beta + Math.expm1(-2 * x) / (2 * beta));
    const q22 = (-qB * Math.expm1(-2 * x)) / (2 * beta);
    expect(Math.abs(qd[0] / q11 - 1)).toBeLessThan(1e-12);
    expect(Math.abs(qd[1] / q12 - 1)).toBeLessThan(1e-12);
    expect(Math.abs(qd[4] / q22 - 1)).toBeLessThan(1e-12);
    expectSymmetricPsd(qd, 3);
  });

  it('matches Simpson quadrature of the defining integral on a random stable model', () => {
    // Q_d = ∫₀ᵀ e^{Fs} G Q Gᵀ e^{Fᵀs} ds (Van Loan 1978); e^{Fs} from the reference library mathjs `expm`.
    const n = 4;
    const random = seededRandom(1978);
    const f = Float64Array.from({ length: n * n }, (_, k) => (2 * random() - 1) - (k % (n + 1) === 0 ? 1 : 0));
    const g = Float64Array.from({ length: n * n }, () => 2 * random() - 1);
    const gqgT = new Float64Array(n * n); // G Gᵀ, symmetric PSD
    for (let i = 0; i < n; i++)
      for (let j = 0; j < n; j++) for (let k = 0; k < n; k++) gqgT[i * n + j] += g[i * n + k] * g[j * n + k];
    const dtS = 0.7;
    const intervals = 400;
    const integral = new Float64Array(n * n);
    for (let step = 0; step <= intervals; step++) {
      const s = (dtS * step) / intervals;
      const weight = step === 0 || step === intervals ? 1 : step % 2 === 1 ? 4 : 2;
      const rows = Array.from({ length: n }, (_, i) => Array.from(f.subarray(i * n, (i + 1) * n), (v) => v * s));
      const e = (mathjsExpm(matrix(rows)).toArray() as number[][]).flat();
      for (let i = 0; i < n; i++)
        for (let j = 0; j < n; j++) {
          let sum = 0;
          for (let a = 0; a < n; a++) for (let b = 0; b < n; b++) sum += e[i * n + a] * gqgT[a * n + b] * e[j * n + b];
          integral[i * n + j] += ((weight * dtS) / (3 * intervals)) * sum;
        }
    }
    const { qd } = discretiseVanLoan(f, gqgT, n, dtS);
    const scale = Math.max(...integral.map(Math.abs));
    qd.forEach((v, k) => expect(Math.abs(v - integral[k])).toBeLessThan(1e-9 * scale));
    expectSymmetricPsd(qd, n);
  });

  it('composes two half steps into one full step', () => {
    // Φ(2T) = Φ(T)², Q_d(2T) = Φ(T) Q_d(T) Φ(T)ᵀ + Q_d(T), from the integral definition (common practice, no source).
    const n = 5;
    const random = seededRandom(42);
    const f = Float64Array.from({ length: n * n }, () => 2 * random() - 1);
    const gqgT = diagonal(Array.from({ length: n }, () => random()));
    const half = discretiseVanLoan(f, gqgT, n, 0.4);
    const full = discretiseVanLoan(f, gqgT, n, 0.8);
    for (let i = 0; i < n; i++) {
      for (let j = 0; j < n; j++) {
        let phi2 = 0;
        let q2 = half.qd[i * n + j];
        for (let a = 0; a < n; a++) {
          phi2 += half.phi[i * n + a] * half.phi[a * n + j];
          for (let b = 0; b < n; b++) q2 += half.phi[i * n + a] * half.qd[a * n + b] * half.phi[j * n + b];
        }
        expect(Math.abs(full.phi[i * n + j] - phi2)).toBeLessThan(1e-13);
        expect(Math.abs(full.qd[i * n + j] - q2)).toBeLessThan(1e-13);
      }
    }
    expectSymmetricPsd(full.qd, n);
  });

  it('returns Φ = I and Q_d = 0 for a zero-length step', () => {
    // e^0 = I and an empty integral (common practice, no source).
    const { phi, qd } = discretiseVanLoan(rowMajor([[0, 1], [-2, -0.3]]), diagonal([1, 2]), 2, 0);
    expect(Array.from(phi)).toEqual([1, 0, 0, 1]);
    expect(Array.from(qd)).toEqual([0, 0, 0, 0]);
  });

  it('rejects inconsistent sizes, non-finite entries and a negative step with InputError', () => {
    const f = new Float64Array(4);
    expect(() => discretiseVanLoan(f, new Float64Array(4), 0, 1)).toThrow(InputError);
    expect(() => discretiseVanLoan(new Float64Array(3), new Float64Array(4), 2, 1)).toThrow(InputError);
    expect(() => discretiseVanLoan(f, new Float64Array(9), 2, 1)).toThrow(InputError);
    expect(() => discretiseVanLoan(Float64Array.of(0, Number.NaN, 0, 0), new Float64Array(4), 2, 1)).toThrow(InputError);
    expect(() => discretiseVanLoan(f, Float64Array.of(0, 0, 0, Infinity), 2, 1)).toThrow(InputError);
    expect(() => discretiseVanLoan(f, new Float64Array(4), 2, -0.1)).toThrow(InputError);
    expect(() => discretiseVanLoan(f, new Float64Array(4), 2, Number.NaN)).toThrow(InputError);
  });
});
