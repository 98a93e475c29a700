/**
 * Seeded pseudo-random numbers for the simulator: xoshiro128** (Blackman & Vigna, "Scrambled linear
 * pseudorandom number generators", 2018), its 128-bit state filled by splitmix32 from (seed, stream).
 * Chosen because it is small, fast in 32-bit JavaScript arithmetic (Math.imul) and well documented;
 * the same (seed, stream) always yields the same sequence on every platform.
 */
export interface Rng {
  /** A uniform number strictly inside (0, 1), 32-bit resolution; never 0, so −log(u) is finite. */
  next(): number;
  /** The raw 32-bit output as an unsigned integer. */
  nextUint32(): number;
}

const TWO_POW_MINUS_32 = 2 ** -32;

class Xoshiro128StarStar implements Rng {
  private s0: number;
  private s1: number;
  private s2: number;
  private s3: number;

  constructor(seed: number, stream: number) {
    // Different streams of one seed start from unrelated states, so replications are independent.
    let sm = (Math.imul(seed | 0, 0x9e3779b1) ^ Math.imul((stream | 0) + 1, 0x85ebca6b)) | 0;
    const split = (): number => {
      sm = (sm + 0x9e3779b9) | 0;
      let z = sm ^ (sm >>> 16);
      z = Math.imul(z, 0x21f0aaad);
      z ^= z >>> 15;
      z = Math.imul(z, 0x735a2d97);
      return (z ^ (z >>> 15)) | 0;
    };
    this.s0 = split();
    this.s1 = split();
    this.s2 = split();
    this.s3 = split();
    if ((this.s0 | this.s1 | this.s2 | this.s3) === 0) this.s0 = 1; // the all-zero state is a fixed point
  }

  nextUint32(): number {
    const s1 = this.s1;
    let r = Math.imul(s1, 5);
    r = Math.imul((r << 7) | (r >>> 25), 9);
    const t = s1 << 9;
    this.s2 ^= this.s0;
    this.s3 ^= this.s1;
    this.s1 ^= this.s2;
    this.s0 ^= this.s3;
    this.s2 ^= t;
    this.s3 = (this.s3 << 11) | (this.s3 >>> 21);
    return r >>> 0;
  }

  next(): number {
    return (this.nextUint32() + 0.5) * TWO_POW_MINUS_32;
  }
}

/**
 * Creates a generator. `seed` and `stream` are taken as 32-bit integers; use one stream per
 * replication (0, 1, 2…) so that replications are independent and each is reproducible on its own.
 */
export function createRng(seed: number, stream = 0): Rng {
  return new Xoshiro128StarStar(seed, stream);
}
