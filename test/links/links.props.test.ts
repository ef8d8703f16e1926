import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { inductiveLink, maximumLinkEfficiency, optimalLoadResistance } from "../../src/index.js";
import { logUniform } from "../support/arbitraries.js";

describe("inductive link properties", () => {
  it("efficiency lies in (0, 1], power is conserved, and no link beats the kQ limit", () => {
    fc.assert(
      fc.property(
        logUniform(1e-6, 1e-3), logUniform(1e-6, 1e-3), fc.double({ min: 0.01, max: 0.9, noNaN: true }), logUniform(1e-3, 1), logUniform(1e-3, 1),
        logUniform(1e4, 1e7), logUniform(0.1, 1e3), fc.constantFrom("series-series", "series-parallel", "parallel-series", "parallel-parallel" as const),
        (l1, l2, k, r1, r2, f, rl, compensation) => {
          const link = inductiveLink({ primaryInductance: l1, secondaryInductance: l2, mutualInductance: k * Math.sqrt(l1 * l2), primaryResistance: r1, secondaryResistance: r2, frequency: f, compensation, loadResistance: rl, sourceVoltage: 1 });
          expect(link.efficiency).toBeGreaterThan(0);
          expect(link.efficiency).toBeLessThanOrEqual(1);
          const losses = link.primaryCurrentRms ** 2 * r1 + link.secondaryCurrentRms ** 2 * r2;
          expect(Math.abs(link.inputPower - link.outputPower - losses)).toBeLessThanOrEqual(1e-9 * link.inputPower);
          const w = 2 * Math.PI * f;
          const limit = maximumLinkEfficiency({ couplingCoefficient: k, primaryQuality: (w * l1) / r1, secondaryQuality: (w * l2) / r2 });
          expect(link.efficiency).toBeLessThanOrEqual(limit * (1 + 1e-9));
        },
      ),
      { seed: 18, numRuns: 300 },
    );
  });

  it("the kQ limit rises with k and with each Q, and the optimal load scales with R₂", () => {
    fc.assert(
      fc.property(fc.double({ min: 0.01, max: 0.8, noNaN: true }), logUniform(1, 1e3), logUniform(1, 1e3), logUniform(1e-3, 10), (k, q1, q2, r2) => {
        const a = maximumLinkEfficiency({ couplingCoefficient: k, primaryQuality: q1, secondaryQuality: q2 });
        expect(maximumLinkEfficiency({ couplingCoefficient: k * 1.1, primaryQuality: q1, secondaryQuality: q2 })).toBeGreaterThan(a);
        expect(maximumLinkEfficiency({ couplingCoefficient: k, primaryQuality: q1 * 1.1, secondaryQuality: q2 })).toBeGreaterThan(a);
        const r = optimalLoadResistance({ couplingCoefficient: k, primaryQuality: q1, secondaryQuality: q2, secondaryResistance: r2 });
        expect(Math.abs(optimalLoadResistance({ couplingCoefficient: k, primaryQuality: q1, secondaryQuality: q2, secondaryResistance: 2 * r2 }) / r - 2)).toBeLessThanOrEqual(1e-12);
      }),
      { seed: 18, numRuns: 200 },
    );
  });
});
