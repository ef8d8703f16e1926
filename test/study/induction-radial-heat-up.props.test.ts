import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { austeniticStainless, celsius, inductionRadialHeatUp, lowCarbonSteel } from "../../src/index.js";
import { logUniform } from "../support/arbitraries.js";

// skin-depth-concentrated power: radius several skin depths (frequency high enough)
const scenario = fc.record({
  magnetic: fc.boolean(),
  radius: logUniform(0.006, 0.02),
  frequency: logUniform(1e4, 1e5),
  current: logUniform(80, 300),
  tube: fc.boolean(),
});

describe("inductionRadialHeatUp: physical invariants (fixed seed)", () => {
  it("core ≤ surface at every time while heating from a uniform start", () => {
    fc.assert(
      fc.property(scenario, (s) => {
        const r = inductionRadialHeatUp({
          part: s.tube ? { shape: "tube", radius: s.radius, innerRadius: 0.5 * s.radius } : { shape: "bar", radius: s.radius },
          material: s.magnetic ? lowCarbonSteel : austeniticStainless,
          coil: { innerRadius: s.radius + 0.01, length: 0.2, turns: 30 },
          frequency: s.frequency,
          coilCurrentRms: s.current,
          convectionCoefficient: 10,
          emissivity: 0.5,
          ambientTemperature: celsius(20),
          duration: 30,
          targetTemperature: celsius(700),
          targetLocation: "surface",
          cells: 30,
        });
        for (let i = 0; i < r.times.length; i++) {
          expect(r.coreTemperatures[i]!).toBeLessThanOrEqual(r.surfaceTemperatures[i]! + 1e-9);
        }
      }),
      { seed: 14005, numRuns: 8 },
    );
  });
  it("the hardening depth never decreases with time, nor with a longer heating", () => {
    fc.assert(
      fc.property(scenario, logUniform(2, 10), (s, first) => {
        const run = (duration: number) =>
          inductionRadialHeatUp({
            part: { shape: "bar", radius: s.radius },
            material: s.magnetic ? lowCarbonSteel : austeniticStainless,
            coil: { innerRadius: s.radius + 0.01, length: 0.2, turns: 30 },
            frequency: s.frequency,
            coilCurrentRms: 2 * s.current,
            convectionCoefficient: 10,
            emissivity: 0.5,
            ambientTemperature: celsius(20),
            duration,
            hardeningTemperature: celsius(300),
            cells: 30,
          });
        const shorter = run(first);
        const longer = run(2 * first);
        const depths = longer.hardeningDepths!;
        for (let i = 1; i < depths.length; i++) expect(depths[i]!).toBeGreaterThanOrEqual(depths[i - 1]!);
        expect(longer.hardeningDepth!).toBeGreaterThanOrEqual(shorter.hardeningDepth! - 1e-12);
      }),
      { seed: 14006, numRuns: 6 },
    );
  });
});
