import { describe, it, expect } from "vitest";
import fc from "fast-check";
import { skinDepth } from "../../src/index.js";

const logUniform = (lo: number, hi: number) =>
  fc.double({ min: Math.log10(lo), max: Math.log10(hi), noNaN: true, noDefaultInfinity: true }).map((e) => 10 ** e);

describe("skinDepth properties", () => {
  it("skinDepth decreases as frequency rises, as 1/sqrt(f)", () => {
    fc.assert(
      fc.property(logUniform(1e-9, 1e-5), logUniform(1e-3, 1e9), logUniform(1.0001, 1e4), (rho, f, k) => {
        const a = skinDepth({ resistivity: rho, frequency: f });
        const b = skinDepth({ resistivity: rho, frequency: f * k });
        expect(b).toBeLessThan(a);
        expect(a / b).toBeCloseTo(Math.sqrt(k), 8);
      }),
      { seed: 1, numRuns: 200 },
    );
  });
  it("skinDepth scales as sqrt(resistivity) and is finite and positive", () => {
    fc.assert(
      fc.property(logUniform(1e-9, 1e-5), logUniform(1e-3, 1e9), logUniform(1e-3, 1e5), (rho, f, mu) => {
        const a = skinDepth({ resistivity: rho, frequency: f, relativePermeability: mu });
        const b = skinDepth({ resistivity: 4 * rho, frequency: f, relativePermeability: mu });
        expect(Number.isFinite(a) && a > 0).toBe(true);
        expect(b / a).toBeCloseTo(2, 12);
      }),
      { seed: 1, numRuns: 200 },
    );
  });
});
