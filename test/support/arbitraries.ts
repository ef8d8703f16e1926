import fc from "fast-check";

/**
 * Log-uniform positive doubles in [lo, hi] for property tests (quantities spanning decades):
 * uniform in ln x, mapped back by exp.
 */
export function logUniform(lo: number, hi: number): fc.Arbitrary<number> {
  return fc.double({ min: Math.log(lo), max: Math.log(hi), noNaN: true, noDefaultInfinity: true }).map(Math.exp);
}
