import type { RunRandom } from './run-random';

/** Intervals whose φ and √Q_d one process remembers. */
const MEMO_SIZE = 64;

/**
 * One scalar error process in exact discrete time: a random constant, a
 * random walk or a first-order Gauss-Markov process,
 *   x' = -x / T + w,  E[w(t) w(s)] = q δ(t - s)  (T = ∞ for a walk or constant).
 * Over any interval Δ the exact discretisation is x ← φ x + √Q_d n with
 *   φ = e^{-Δ/T},  Q_d = q T (1 - φ²) / 2   (Gauss-Markov),
 *   φ = 1,         Q_d = q Δ                (random walk; q = 0: constant)
 * (Gelb, Applied Optimal Estimation, 1974, Table 3.4-1 and §4.2, sections from memory; Maybeck,
 * Stochastic Models, Estimation, and Control, vol. 1, 1979, §4.9). The last
 * interval's φ and √Q_d are kept, so a fixed sample rate pays one exp.
 */
export class ScalarProcess {
  /** Current value, SI. */
  value = 0;
  private timeS = 0;
  private lastIntervalS = -1;
  private phi = 1;
  private sdDrive = 0;
  /**
   * φ and √Q_d of the intervals seen so far, keyed by the exact interval: a
   * run meets a few dozen distinct intervals (sample periods that differ in
   * the last bits, and the slivers between a sample and a step boundary)
   * about 30,000 times, and the values are a pure function of Δ, so the
   * memo changes no bit of the result.
   */
  private readonly memoIntervalS = new Float64Array(MEMO_SIZE);
  private readonly memoPhi = new Float64Array(MEMO_SIZE);
  private readonly memoSd = new Float64Array(MEMO_SIZE);
  private memoCount = 0;

  /**
   * @param decayPerS 1/T in 1/s (0 for a random walk or a constant).
   * @param psdSI two-sided PSD q of the driving noise, SI² per s (0 for a constant).
   */
  constructor(private readonly decayPerS: number, private readonly psdSI: number) {}

  /** Starts the process at time 0 with a draw of standard deviation `initialSigma` (SI). */
  start(initialSigma: number, rng: RunRandom): void {
    this.value = initialSigma > 0 ? initialSigma * rng.normal() : 0;
    this.timeS = 0;
    // Forget the last interval: a run must not depend on the runs before it (bit-for-bit replays).
    this.lastIntervalS = -1;
  }

  /** Advances to `tS` (not before the current time); a constant draws nothing. */
  advanceTo(tS: number, rng: RunRandom): number {
    const dtS = tS - this.timeS;
    if (!(dtS > 0)) return this.value;
    this.timeS = tS;
    if (this.psdSI === 0 && this.decayPerS === 0) return this.value;
    // Sample intervals j/f - (j-1)/f differ in the last bits; reuse φ and √Q_d within 1e-12 relative.
    if (Math.abs(dtS - this.lastIntervalS) > 1e-12 * dtS) this.discretise(dtS);
    // (Reused within a run only, and the first interval of a run is the same in every run.)
    this.value = this.phi * this.value + (this.sdDrive > 0 ? this.sdDrive * rng.normal() : 0);
    return this.value;
  }

  private discretise(dtS: number): void {
    this.lastIntervalS = dtS;
    for (let i = 0; i < this.memoCount; i++) {
      if (this.memoIntervalS[i] === dtS) {
        this.phi = this.memoPhi[i];
        this.sdDrive = this.memoSd[i];
        return;
      }
    }
    if (this.decayPerS > 0) {
      this.phi = Math.exp(-dtS * this.decayPerS);
      // -expm1(-2Δ/T) = 1 - φ², without cancellation for Δ << T.
      this.sdDrive = Math.sqrt((this.psdSI * -Math.expm1(-2 * dtS * this.decayPerS)) / (2 * this.decayPerS));
    } else {
      this.phi = 1;
      this.sdDrive = Math.sqrt(this.psdSI * dtS);
    }
    // A full memo starts over (a mission with ever new intervals pays the exp as before).
    const slot = this.memoCount < MEMO_SIZE ? this.memoCount++ : (this.memoCount = 1) - 1;
    this.memoIntervalS[slot] = dtS;
    this.memoPhi[slot] = this.phi;
    this.memoSd[slot] = this.sdDrive;
  }
}
