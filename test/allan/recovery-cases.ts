/**
 * The synthetic recovery cases, one function per case and seed, each
 * returning its checks as booleans (so that a sweep over seeds can reuse
 * them). Tolerances are explained in synthetic-recovery.test.ts. Not a test
 * file itself.
 */
import { allanDeviationCurve } from '../../src/allan/allan-curve';
import { readBiasInstabilityFloor } from '../../src/allan/floor-reading';
import { allanPercentageError } from '../../src/allan/percentage-error';
import { readTermBySlope } from '../../src/allan/slope-readoff';
import { fitNoiseTerms } from '../../src/allan/term-fit';
import { GM_ALLAN_PEAK_RATIO, GM_ALLAN_PEAK_U, gaussMarkovAllanVariance } from '../../src/sources/gauss-markov-allan';
import { syntheticRateLog } from './synthetic-log';

const RATE_HZ = 100;
const SAMPLES = 1_000_000;

function relativeError(estimate: number, truth: number): number {
  return Math.abs(estimate / truth - 1);
}

/** Angle random walk N and rate random walk K, crossing at τ = √3 N/K ≈ 1.7 s. */
export function randomWalkCase(seed: number) {
  const n = 1e-4, k = 1e-4;
  const curve = allanDeviationCurve(syntheticRateLog({ rateHz: RATE_HZ, sampleCount: SAMPLES, seed, randomWalk: n, rateRandomWalk: k, offset: 0.02 }), RATE_HZ);
  const slopeN = readTermBySlope(curve, 'random-walk');
  const slopeK = readTermBySlope(curve, 'rate-random-walk');
  const fit = fitNoiseTerms(curve);
  const fitN = fit.terms.find((t) => t.id === 'random-walk')!;
  const fitK = fit.terms.find((t) => t.id === 'rate-random-walk')!;
  const deltaAtOneSecond = allanPercentageError(SAMPLES, RATE_HZ * 1);
  return {
    checks: [
      relativeError(slopeN.coefficient, n) <= 3 * deltaAtOneSecond,
      relativeError(slopeN.coefficient, n) <= 3 * slopeN.relativeUncertainty,
      relativeError(slopeK.coefficient, k) <= 3 * slopeK.relativeUncertainty,
      relativeError(fitN.coefficient, n) <= 3 * Math.max(slopeN.relativeUncertainty, deltaAtOneSecond),
      relativeError(fitK.coefficient, k) <= 3 * slopeK.relativeUncertainty,
    ],
    slopeK,
  };
}

/** d² ln σ_A / d(ln τ)² of a Gauss-Markov process at its peak, by central differences on the closed form. */
function peakCurvature(): number {
  const h = 0.05;
  const lnSigma = (u: number): number => 0.5 * Math.log(gaussMarkovAllanVariance(1, 1, u));
  const u = GM_ALLAN_PEAK_U;
  return (lnSigma(u * Math.exp(h)) - 2 * lnSigma(u) + lnSigma(u * Math.exp(-h))) / (h * h);
}

/**
 * A Gauss-Markov bias (σ = 1e-3, T = 20 s) over weak white noise. The floor is
 * read at the peak: 3 × the reported uncertainty plus the reader's own 1 %
 * bias (slope-readoff.test.ts). T comes from where the local slope crosses
 * zero: the slope's noise is about 1.1δ (measured on 40 white-noise logs,
 * slope-readoff.ts; 1.5δ is used), and the slope changes with ln τ at the
 * peak's curvature c, so ln T̂ has about 1.5δ/|c| of scatter; 3 of those plus 1 %.
 */
export function gaussMarkovCase(seed: number) {
  const sigma = 1e-3, correlationTimeS = 20;
  const curve = allanDeviationCurve(syntheticRateLog({ rateHz: RATE_HZ, sampleCount: SAMPLES, seed, randomWalk: 1e-4, gaussMarkov: { sigma, correlationTimeS } }), RATE_HZ);
  const floor = readBiasInstabilityFloor(curve);
  const tHat = floor.readAtTauS / GM_ALLAN_PEAK_U;
  const deltaAtFloor = allanPercentageError(SAMPLES, Math.round(floor.readAtTauS * RATE_HZ));
  const lnTolerance = (3 * 1.5 * deltaAtFloor) / Math.abs(peakCurvature()) + 0.01;
  return {
    checks: [
      !floor.upperBound,
      relativeError(floor.deviation, GM_ALLAN_PEAK_RATIO * sigma) <= 3 * floor.relativeUncertainty + 0.01,
      Math.abs(Math.log(tHat / correlationTimeS)) <= lnTolerance,
    ],
    curve,
    floor,
  };
}

/** Angle quantisation s = 1e-3 with independent uniform errors (docs/checks.md §1.5). */
export function quantisationCase(seed: number) {
  const quantum = 1e-3;
  const curve = allanDeviationCurve(syntheticRateLog({ rateHz: RATE_HZ, sampleCount: SAMPLES, seed, angleQuantum: quantum }), RATE_HZ);
  const q = quantum / Math.sqrt(12);
  const slopeQ = readTermBySlope(curve, 'quantisation');
  const fitQ = fitNoiseTerms(curve).terms.find((t) => t.id === 'quantisation')!;
  const atTaus = [0.01, 0.1, 1].map((tau) => {
    const i = curve.tauS.findIndex((t) => Math.abs(t - tau) < 1e-9);
    return relativeError(curve.adev[i], quantum / (2 * tau)) <= 3 * curve.percentageError[i];
  });
  return {
    checks: [...atTaus, relativeError(slopeQ.coefficient, q) <= 3 * slopeQ.relativeUncertainty, relativeError(fitQ.coefficient, q) <= 3 * slopeQ.relativeUncertainty],
  };
}

