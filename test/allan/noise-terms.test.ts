import { describe, expect, it } from 'vitest';
import { localLogLogSlopes } from '../../src/allan/log-log-lines';
import { NOISE_TERMS, termDeviation } from '../../src/allan/noise-terms';
import { FLICKER_FLOOR_FACTOR } from '../../src/sources/gauss-markov-allan';
import { fromSI, toSI } from '../../src/units';
import { curveFromVariance, logTaus, termsVariance } from './closed-form-curve';
import { expectAbsolute, expectRelative } from './expect-close';

describe('the IEEE Std 952 noise terms', () => {
  it('give exactly their coefficient at their read-off τ when the coefficient is 1', () => {
    // docs/checks.md §1.1 unit-test idea: σ(√3) = Q, σ(1) = N, σ(3) = K, σ(√2) = R (IEEE Std 952-1997 Annex C, from memory).
    for (const term of NOISE_TERMS) {
      if (term.readOffTauS === undefined) continue;
      expectRelative(termDeviation(term.id, 1, term.readOffTauS), 1, 2e-16);
      expect(term.coefficientFromDeviation(termDeviation(term.id, 0.37, term.readOffTauS))).toBeCloseTo(0.37, 15);
    }
  });

  it('put the bias-instability floor at 0.6642824702679601 B', () => {
    // docs/checks.md §1.1, computed: √(2 ln 2/π).
    expectRelative(termDeviation('bias-instability', 1, 123), 0.6642824702679601, 1e-15);
    expectRelative(FLICKER_FLOOR_FACTOR, 0.6642824702679601, 1e-15);
  });

  it('have log-log slopes of −1, −½, 0, +½ and +1 over two decades', () => {
    // docs/checks.md §1.1 unit-test idea: fitted slopes of closed-form curves, ±1e-12.
    const tau = logTaus(-1, 1);
    for (const term of NOISE_TERMS) {
      const slopes = localLogLogSlopes(curveFromVariance(tau, (t) => term.unitVariance(t)));
      for (const s of slopes) expectAbsolute(s, term.slope, 1e-12);
    }
  });

  it('reproduce the trade-unit example table in deg/h', () => {
    // docs/checks.md §1.1 (computed): N = 0.1 °/√h, K = 0.5 °/h/√h, R = 10 °/h², Q = 1 arcsec; σ in °/h at 1, 100, 3600, 10800 s.
    const n = toSI(0.1, 'deg/√h', 'angle-random-walk', 'N');
    const k = toSI(0.5, 'deg/h/√h', 'rate-random-walk', 'K');
    const r = toSI(10, 'deg/h²', 'angular-acceleration', 'R');
    const q = toSI(1, 'arcsec', 'angle', 'Q');
    const degPerHour = (x: number): number => fromSI(x, 'deg/h', 'angular-rate', 'σ');
    const table: [number, number, number, number, number, number][] = [
      [1, 6, 0.004811252243, 0.001964185503, 1.732050808, 6.000001929],
      [100, 0.6, 0.04811252243, 0.1964185503, 0.01732050808, 0.6019259214],
      [3600, 0.1, 0.2886751346, 7.071067812, 4.811252243e-4, 0.3055050463],
      [10800, 0.05773502692, 0.5, 21.21320344, 1.603750748e-4, 0.5033222957],
    ];
    for (const [tau, sN, sK, sR, sQ, sNK] of table) {
      expectRelative(degPerHour(termDeviation('random-walk', n, tau)), sN, 1e-9);
      expectRelative(degPerHour(termDeviation('rate-random-walk', k, tau)), sK, 1e-9);
      expectRelative(degPerHour(termDeviation('rate-ramp', r, tau)), sR, 1e-9);
      expectRelative(degPerHour(termDeviation('quantisation', q, tau)), sQ, 1e-9);
      expectRelative(degPerHour(Math.sqrt(termsVariance({ 'random-walk': n, 'rate-random-walk': k })(tau))), sNK, 1e-9);
    }
  });

  it('read N in deg/√h as σ at 1 h in deg/h, and K in deg/h/√h as σ at 3 h', () => {
    // docs/checks.md §1.1: "in trade units N [°/√h] = σ(τ = 1 h) in °/h; K [°/h/√h] = σ(τ = 3 h) in °/h".
    const n = toSI(0.1, 'deg/√h', 'angle-random-walk', 'N');
    const k = toSI(0.5, 'deg/h/√h', 'rate-random-walk', 'K');
    expectRelative(fromSI(termDeviation('random-walk', n, 3600), 'deg/h', 'angular-rate', 'σ'), 0.1, 1e-12);
    expectRelative(fromSI(termDeviation('rate-random-walk', k, 10800), 'deg/h', 'angular-rate', 'σ'), 0.5, 1e-12);
  });
});
