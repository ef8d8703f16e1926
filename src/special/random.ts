/**
 * Seeded pseudo-random numbers: xoshiro128** seeded through splitmix32 (uniform doubles in
 * [0, 1) with 32 random bits) and standard normal deviates by Box–Muller. Part of the library's
 * own numerical toolkit (`special/internal.ts`), not exported from the package.
 *
 * Accuracy: bit-exact against an independent Python transcription of the published algorithms
 * (`test/fixtures/toolkit/generate.py`, first 64 outputs of four seeds); the normal deviates
 * within 1e-15 of the same transcription's Box–Muller values in 30-digit arithmetic (5.6e-16
 * measured).
 *
 * @see D. Blackman and S. Vigna, "Scrambled linear pseudorandom number generators", ACM Trans.
 * Math. Software 47(4), 2021 (xoshiro128**).
 *
 * @packageDocumentation
 */

/** splitmix32: scrambles a 32-bit state; used to seed the main generator. */
export function splitmix32(state: number): number {
  let z = (state + 0x9e3779b9) | 0;
  z = Math.imul(z ^ (z >>> 16), 0x85ebca6b);
  z = Math.imul(z ^ (z >>> 13), 0xc2b2ae35);
  return (z ^ (z >>> 16)) >>> 0;
}

/**
 * xoshiro128** (Blackman & Vigna 2018) with 32-bit words, seeded through splitmix32; `next()`
 * gives doubles in [0, 1) with 32 random bits.
 */
export class Xoshiro128 {
  private s0: number;
  private s1: number;
  private s2: number;
  private s3: number;

  constructor(seed: number) {
    this.s0 = splitmix32(seed);
    this.s1 = splitmix32(this.s0 ^ 0x6a09e667);
    this.s2 = splitmix32(this.s1 ^ 0xbb67ae85);
    this.s3 = splitmix32(this.s2 ^ 0x3c6ef372);
    if ((this.s0 | this.s1 | this.s2 | this.s3) === 0) this.s0 = 1;
  }

  next(): number {
    const result = Math.imul(rotl(Math.imul(this.s1, 5), 7), 9) >>> 0;
    const t = this.s1 << 9;
    this.s2 ^= this.s0;
    this.s3 ^= this.s1;
    this.s1 ^= this.s2;
    this.s0 ^= this.s3;
    this.s2 ^= t;
    this.s3 = rotl(this.s3, 11);
    return result / 4294967296;
  }
}

/** Standard normal deviates by the Box–Muller transform, two per pair of uniforms. */
export class NormalDeviates {
  private spare = 0;
  private hasSpare = false;

  constructor(private readonly uniform: Xoshiro128) {}

  next(): number {
    if (this.hasSpare) {
      this.hasSpare = false;
      return this.spare;
    }
    // 1 − u avoids log(0).
    const r = Math.sqrt(-2 * Math.log(1 - this.uniform.next()));
    const theta = 2 * Math.PI * this.uniform.next();
    this.spare = r * Math.sin(theta);
    this.hasSpare = true;
    return r * Math.cos(theta);
  }
}

function rotl(x: number, k: number): number {
  return (x << k) | (x >>> (32 - k));
}
