import { xoroshiro128plus } from 'pure-rand/generator/xoroshiro128plus';
import type { JumpableRandomGenerator } from 'pure-rand/types/JumpableRandomGenerator';

/** 2^-53: turns 53 random bits into a double in [0, 1). */
const TWO_POW_MINUS_53 = 1.1102230246251565e-16;
/** 2^-31: a signed 32-bit integer to [-1, 1). */
const TWO_POW_MINUS_31 = 4.656612873077393e-10;

/**
 * The random numbers of one Monte Carlo run. Run i of a study with seed S
 * uses xoroshiro128+ (pure-rand) seeded with S and jumped i + 1 times: each
 * jump moves 2^64 draws ahead (Blackman & Vigna, "Scrambled linear
 * pseudorandom number generators", ACM TOMS 47(4), 2021), so the runs' streams
 * never overlap and any run replays alone from (S, i) on any machine.
 */
export class RunRandom {
  private spare = 0;
  private hasSpare = false;

  private constructor(private readonly rng: JumpableRandomGenerator) {}

  /**
   * The generator of run `runIndex` (an integer >= 0) of a study seeded with
   * `seed` (an integer, taken modulo 2^32). Costs runIndex + 1 jumps (about
   * 0.3 µs each); {@link RunRandom.following} is cheaper for consecutive runs.
   */
  static forRun(seed: number, runIndex: number): RunRandom {
    const rng = xoroshiro128plus(seed | 0);
    for (let i = 0; i <= runIndex; i++) rng.jump();
    return new RunRandom(rng);
  }

  /** The generator of the next run index, from a fresh copy of this one's starting point. */
  static following(start: RunRandom): RunRandom {
    const rng = start.rng.clone();
    rng.jump();
    return new RunRandom(rng);
  }

  /** A copy at the same position (for stepping from run to run before drawing). */
  clone(): RunRandom {
    return new RunRandom(this.rng.clone());
  }

  /**
   * Uniform on [0, 1) with 53 random bits. pure-rand's own uniformFloat64
   * keeps the low bits of each 32-bit word, which are xoroshiro128+'s weakest
   * (Blackman & Vigna 2021; section from memory: §10.7); this keeps the high bits instead.
   */
  uniform(): number {
    const hi = this.rng.next() >>> 5;
    const lo = this.rng.next() >>> 6;
    return (hi * 67108864 + lo) * TWO_POW_MINUS_53;
  }

  /**
   * A standard normal draw by Marsaglia's polar method (Marsaglia & Bray,
   * SIAM Review 6(3), 1964; Knuth, TAOCP vol. 2, 3rd ed., §3.4.1 Algorithm P),
   * which needs only log and sqrt: no library offers a normal draw from a
   * caller's generator without a call per uniform, and fewer transcendental
   * functions keep the stream identical across JavaScript engines.
   */
  normal(): number {
    if (this.hasSpare) {
      this.hasSpare = false;
      return this.spare;
    }
    let u: number, v: number, s: number;
    do {
      // One signed 32-bit output per coordinate, uniform on [-1, 1) in steps of 2^-31: ample for
      // a normal draw, and half the generator calls of two 53-bit uniforms.
      u = this.rng.next() * TWO_POW_MINUS_31;
      v = this.rng.next() * TWO_POW_MINUS_31;
      s = u * u + v * v;
    } while (s >= 1 || s === 0);
    const m = Math.sqrt((-2 * Math.log(s)) / s);
    this.spare = v * m;
    this.hasSpare = true;
    return u * m;
  }
}
