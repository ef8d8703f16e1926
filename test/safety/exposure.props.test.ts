import { describe, it, expect } from "vitest";
import fc from "fast-check";
import { exposureCheck, icnirpReferenceLevel } from "../../src/index.js";

const logFrequency = fc.double({ min: 0, max: 7, noNaN: true, noDefaultInfinity: true }).map((x) => 10 ** x);

describe("ICNIRP reference level properties", () => {
  it("never rises with frequency", () => {
    fc.assert(
      fc.property(logFrequency, logFrequency, fc.constantFrom("general-public" as const, "occupational" as const), (f1, f2, who) => {
        const [lo, hi] = f1 < f2 ? [f1, f2] : [f2, f1];
        expect(icnirpReferenceLevel(hi, who)).toBeLessThanOrEqual(icnirpReferenceLevel(lo, who) * (1 + 1e-12));
      }),
      { seed: 1, numRuns: 200 },
    );
  });

  it("the occupational level is at least 3.7 times the public one at every frequency", () => {
    fc.assert(
      fc.property(logFrequency, (f) => {
        expect(icnirpReferenceLevel(f, "occupational") / icnirpReferenceLevel(f, "general-public")).toBeGreaterThanOrEqual(3.7 - 1e-12);
      }),
      { seed: 1, numRuns: 200 },
    );
  });

  it("ratio is linear in the flux density and exceeded iff ratio > 1", () => {
    fc.assert(
      fc.property(logFrequency, fc.double({ min: 1e-9, max: 1, noNaN: true, noDefaultInfinity: true }), (f, b) => {
        const r = exposureCheck({ fluxDensityRms: b, frequency: f, population: "general-public" });
        const r2 = exposureCheck({ fluxDensityRms: 2 * b, frequency: f, population: "general-public" });
        expect(r2.ratio).toBeCloseTo(2 * r.ratio, 10);
        expect(r.exceeded).toBe(r.ratio > 1);
      }),
      { seed: 1, numRuns: 200 },
    );
  });
});
