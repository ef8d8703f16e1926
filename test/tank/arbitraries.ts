import fc from "fast-check";

/** Log-uniform positive doubles in [lo, hi] (quantities spanning decades). */
export function logUniform(lo: number, hi: number): fc.Arbitrary<number> {
  return fc
    .double({ min: Math.log10(lo), max: Math.log10(hi), noNaN: true, noDefaultInfinity: true })
    .map((x) => Math.pow(10, x));
}

export const inductanceArb = logUniform(1e-8, 1);
export const capacitanceArb = logUniform(1e-10, 1e-2);
export const resistanceArb = logUniform(1e-4, 1e3);
export const settings = { seed: 1, numRuns: 200 } as const;
