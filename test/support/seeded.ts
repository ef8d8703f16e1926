/**
 * Deterministic pseudo-random numbers for tests that draw many seeded inputs.
 */

/**
 * A xorshift32 generator (G. Marsaglia, "Xorshift RNGs", J. Stat. Softw. 8(14), 2003, the
 * 13/17/5 triple), returning numbers uniform in (0, 1): never 0 or 1, so that logarithms and
 * reciprocals of the draws stay finite.
 */
export function uniform(seed: number): () => number {
  let s = seed >>> 0;
  return () => {
    s ^= s << 13;
    s >>>= 0;
    s ^= s >>> 17;
    s ^= s << 5;
    s >>>= 0;
    return (s + 0.5) / 4294967296;
  };
}
