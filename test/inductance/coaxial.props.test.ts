import { describe, it, expect } from "vitest";
import fc from "fast-check";
import { coaxialCoilMutualInductance, couplingCoefficient, solenoidInductance, spiralCoilInductance } from "../../src/inductance/index.js";
import { logUniform } from "../support/arbitraries.js";

describe("coaxial coil properties", () => {
  it("M12 = M21 and |k| ≤ 1 for a solenoid and a pancake spiral in any position", () => {
    fc.assert(
      fc.property(logUniform(0.005, 0.1), logUniform(0.005, 0.2), fc.integer({ min: 2, max: 20 }), logUniform(0.005, 0.1), logUniform(1e-4, 1), (ra, la, n, rb, z) => {
        const sol = { kind: "solenoid" as const, radius: ra, length: la, turns: 10 };
        const outer = rb * 2;
        const pitch = (outer - rb) / (n - 1);
        const spi = { kind: "spiral" as const, innerRadius: rb, outerRadius: outer, turns: n };
        const m12 = coaxialCoilMutualInductance(sol, spi, z);
        const m21 = coaxialCoilMutualInductance(spi, sol, z);
        expect(Math.abs(m12 / m21 - 1)).toBeLessThan(1e-8);
        const l1 = solenoidInductance({ radius: ra, length: la, turns: 10 });
        const l2 = spiralCoilInductance({ innerRadius: rb, outerRadius: outer, turns: n, wireDiameter: 0.9 * pitch });
        const k = couplingCoefficient({ mutualInductance: m12, selfInductance1: l1, selfInductance2: l2 });
        expect(k).toBeGreaterThan(0);
        expect(k).toBeLessThanOrEqual(1);
      }),
      { seed: 1, numRuns: 60 },
    );
  });

  it("the mutual inductance of two solenoids falls as they move apart along the axis", () => {
    fc.assert(
      fc.property(logUniform(0.005, 0.1), logUniform(0.005, 0.1), logUniform(1e-3, 1), (ra, rb, z) => {
        const a = { kind: "solenoid" as const, radius: ra, length: 0.02, turns: 10 };
        const b = { kind: "solenoid" as const, radius: rb, length: 0.01, turns: 5 };
        expect(coaxialCoilMutualInductance(a, b, z * 1.05)).toBeLessThan(coaxialCoilMutualInductance(a, b, z));
      }),
      { seed: 1, numRuns: 60 },
    );
  });
});
