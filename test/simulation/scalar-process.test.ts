import { describe, expect, it } from 'vitest';
import { RunRandom } from '../../src/simulation/run-random';
import { ScalarProcess } from '../../src/simulation/scalar-process';
import { jstatChiSquareInv } from './chi-square-reference';

const CHAINS = 4000;

/** Values of CHAINS independent realisations at the given times (one generator per chain, as the study does). */
function realisations(make: () => ScalarProcess, initialSigma: number, timesS: number[]): Float64Array[] {
  const out = timesS.map(() => new Float64Array(CHAINS));
  let start = RunRandom.forRun(7, 0);
  for (let c = 0; c < CHAINS; c++, start = RunRandom.following(start)) {
    const rng = start.clone();
    const p = make();
    p.start(initialSigma, rng);
    timesS.forEach((t, i) => (out[i][c] = p.advanceTo(t, rng)));
  }
  return out;
}

const meanSquare = (x: Float64Array) => x.reduce((a, v) => a + v * v, 0) / x.length;
const correlation = (x: Float64Array, y: Float64Array) => {
  let sxy = 0, sxx = 0, syy = 0;
  for (let i = 0; i < x.length; i++) { sxy += x[i] * y[i]; sxx += x[i] * x[i]; syy += y[i] * y[i]; }
  return sxy / Math.sqrt(sxx * syy);
};

/** Two-sided 99.9 % band of a mean square of N zero-mean normal draws of variance v: N s²/v is χ²_N. */
function expectVariance(x: Float64Array, variance: number): void {
  const n = x.length;
  expect(meanSquare(x)).toBeGreaterThan((variance * jstatChiSquareInv(0.0005, n)) / n);
  expect(meanSquare(x)).toBeLessThan((variance * jstatChiSquareInv(0.9995, n)) / n);
}

/** Sample correlation within 3.3 standard errors of ρ on Fisher's z scale (Fisher, Biometrika 10, 1915: atanh r ~ N(atanh ρ, 1/(N-3))). */
function expectCorrelation(r: number, rho: number): void {
  expect(Math.abs(Math.atanh(r) - Math.atanh(rho))).toBeLessThan(3.3 / Math.sqrt(CHAINS - 3));
}

describe('exact discrete error processes', () => {
  it('a Gauss-Markov process keeps its stationary variance and has autocorrelation e^(-τ/T)', () => {
    // Gelb 1974, Table 3.4-1 (from memory): first-order Gauss-Markov, R(τ) = σ² e^{-|τ|/T}; PSD of the driving noise 2σ²/T.
    const sigma = 2, T = 5;
    const make = () => new ScalarProcess(1 / T, (2 * sigma * sigma) / T);
    const [x10, x10p1, x15, x37] = realisations(make, sigma, [10, 10.1, 15, 37.3]);
    for (const x of [x10, x15, x37]) expectVariance(x, sigma * sigma);
    expectCorrelation(correlation(x10, x10p1), Math.exp(-0.1 / T));
    expectCorrelation(correlation(x10, x15), Math.exp(-1));
  });

  it('keeps the same statistics when stepped at uneven intervals', () => {
    const sigma = 0.3, T = 2;
    const times = [0.013, 0.5, 0.51, 1.9, 2.0, 4.7, 4.8];
    const xs = realisations(() => new ScalarProcess(1 / T, (2 * sigma * sigma) / T), sigma, times);
    expectVariance(xs[xs.length - 1], sigma * sigma);
    expectCorrelation(correlation(xs[3], xs[5]), Math.exp(-(4.7 - 1.9) / T));
  });

  it('a random walk grows as q t and is correlated √(t1/t2) between two times', () => {
    // Wiener process: Var x(t) = q t, Cov(x(t1), x(t2)) = q min(t1, t2) (Maybeck 1979, §4.5, section from memory).
    const q = 0.3;
    const [x5, x20] = realisations(() => new ScalarProcess(0, q), 0, [5, 20]);
    expectVariance(x5, q * 5);
    expectVariance(x20, q * 20);
    expectCorrelation(correlation(x5, x20), Math.sqrt(5 / 20));
  });

  it('a random constant keeps its first draw', () => {
    const rng = RunRandom.forRun(1, 0);
    const p = new ScalarProcess(0, 0);
    p.start(0.7, rng);
    const first = p.value;
    expect(p.advanceTo(100, rng)).toBe(first);
  });
});

describe('per-run generators', () => {
  it('replay run i alone: forRun(seed, i) draws what the chain of following generators draws', () => {
    let chained = RunRandom.forRun(42, 0);
    for (let i = 1; i <= 70; i++) chained = RunRandom.following(chained);
    const alone = RunRandom.forRun(42, 70);
    for (let j = 0; j < 100; j++) expect(alone.normal()).toBe(chained.normal());
  });

  it('give standard normal draws (mean and variance within their 99.9 % sampling bounds)', () => {
    const rng = RunRandom.forRun(3, 5);
    const n = 200_000;
    const x = new Float64Array(n);
    for (let i = 0; i < n; i++) x[i] = rng.normal();
    const mean = x.reduce((a, v) => a + v, 0) / n;
    expect(Math.abs(mean)).toBeLessThan(3.29 / Math.sqrt(n));
    expectVariance(x, 1);
  });

  it('remembers φ and √Q_d of past intervals without changing a bit (memo against fresh processes, more intervals than it holds)', () => {
    // The exact discretisation is a pure function of Δ (Gelb 1974, Table 3.4-1, from memory): a process that
    // has seen 320 intervals, some several times, must give what a process seeing each interval first gives.
    const decayPerS = 1 / 30, psd = 2.7e-5;
    // 40 intervals three times (the memo hits), then 101 (more than it holds); neighbours 1e-9 apart or more.
    const intervals = Array.from({ length: 320 }, (_, i) => 0.005 * (1 + (i < 120 ? (i * 7) % 40 : (i * 37) % 101) * 1e-9));
    const seasoned = new ScalarProcess(decayPerS, psd);
    const rngA = RunRandom.forRun(3, 0), rngB = RunRandom.forRun(3, 0);
    for (const dt of intervals) {
      // start() forgets the last interval but not the memo; the fresh process has neither.
      seasoned.start(0.02, rngA);
      const fresh = new ScalarProcess(decayPerS, psd);
      fresh.start(0.02, rngB);
      expect(seasoned.advanceTo(dt, rngA)).toBe(fresh.advanceTo(dt, rngB));
    }
  });
});
