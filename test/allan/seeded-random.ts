/**
 * A seeded random source for the tests: xoshiro128** (D. Blackman and
 * S. Vigna, "Scrambled linear pseudorandom number generators", ACM Trans.
 * Math. Softw. 47(4), 2021) for uniforms, seeded through the 32-bit
 * finaliser of MurmurHash3 so that nearby seeds give unrelated streams, and
 * the Box-Muller transform for normals (G. E. P. Box and M. E. Muller, Ann.
 * Math. Statist. 29(2):610–611, 1958). Not a test file itself.
 */

/** MurmurHash3's fmix32: a bijective 32-bit mixer. */
function mix32(x: number): number {
  x ^= x >>> 16;
  x = Math.imul(x, 0x85ebca6b);
  x ^= x >>> 13;
  x = Math.imul(x, 0xc2b2ae35);
  x ^= x >>> 16;
  return x >>> 0;
}

const rotl = (x: number, k: number): number => ((x << k) | (x >>> (32 - k))) >>> 0;

/** A reproducible stream of uniform and normal numbers. */
export class SeededRandom {
  private s0: number;
  private s1: number;
  private s2: number;
  private s3: number;
  private spare: number | undefined;

  constructor(seed: number) {
    this.s0 = mix32(seed + 0x9e3779b9);
    this.s1 = mix32(seed + 0x3c6ef372);
    this.s2 = mix32(seed + 0xdaa66d2b);
    this.s3 = mix32(seed + 0x78dde6e4) | 1;
  }

  /** The next 32 random bits, as an unsigned integer. */
  nextUint32(): number {
    const result = Math.imul(rotl(Math.imul(this.s1, 5) >>> 0, 7), 9) >>> 0;
    const t = (this.s1 << 9) >>> 0;
    this.s2 ^= this.s0;
    this.s3 ^= this.s1;
    this.s1 ^= this.s2;
    this.s0 ^= this.s3;
    this.s2 ^= t;
    this.s3 = rotl(this.s3 >>> 0, 11);
    this.s0 >>>= 0; this.s1 >>>= 0; this.s2 >>>= 0;
    return result;
  }

  /** Uniform on the open interval (0, 1), 53 random bits. */
  uniform(): number {
    const hi = this.nextUint32() >>> 5, lo = this.nextUint32() >>> 6;
    return (hi * 67108864 + lo + 0.5) / 9007199254740992;
  }

  /** Standard normal by Box-Muller, using both outputs of each pair. */
  normal(): number {
    if (this.spare !== undefined) {
      const z = this.spare;
      this.spare = undefined;
      return z;
    }
    const r = Math.sqrt(-2 * Math.log(this.uniform()));
    const phi = 2 * Math.PI * this.uniform();
    this.spare = r * Math.sin(phi);
    return r * Math.cos(phi);
  }
}
