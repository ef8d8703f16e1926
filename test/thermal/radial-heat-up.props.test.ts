import { describe, it, expect } from "vitest";
import fc from "fast-check";
import { radialHeatUp } from "../../src/index.js";
import { logUniform } from "../support/arbitraries.js";

const problem = fc.record({
  geometry: fc.constantFrom("slab" as const, "cylinder" as const),
  size: logUniform(0.002, 0.05),
  surfacePowerDensity: logUniform(1e3, 1e6),
  skinDepth: logUniform(1e-5, 0.05),
  thermalConductivity: logUniform(10, 400),
  convectionCoefficient: logUniform(2, 200),
  emissivity: fc.double({ min: 0, max: 1, noNaN: true, noDefaultInfinity: true }),
  duration: logUniform(0.5, 100),
});

interface Problem {
  geometry: "slab" | "cylinder";
  size: number;
  surfacePowerDensity: number;
  skinDepth: number;
  thermalConductivity: number;
  convectionCoefficient: number;
  emissivity: number;
  duration: number;
}

const run = (p: Problem, scale = 1) =>
  radialHeatUp({
    geometry: p.geometry,
    ...(p.geometry === "slab" ? { thickness: 2 * p.size } : { radius: p.size }),
    surfacePowerDensity: p.surfacePowerDensity * scale,
    skinDepth: p.skinDepth,
    density: 7850,
    specificHeat: 480,
    thermalConductivity: p.thermalConductivity,
    convectionCoefficient: p.convectionCoefficient,
    emissivity: p.emissivity,
    ambientTemperature: 293.15,
    duration: p.duration,
    cells: 30,
    temperatureTolerance: 0.05,
  });

describe("radialHeatUp properties", () => {
  it("energy is conserved: |input − stored − lost| ≤ 1e-9 of the input", () => {
    fc.assert(
      fc.property(problem, (p) => {
        const r = run(p);
        expect(Math.abs(r.energy.imbalance)).toBeLessThanOrEqual(1e-9 * r.energy.input);
      }),
      { seed: 1, numRuns: 40 },
    );
  });

  it("more power → hotter surface and core", () => {
    fc.assert(
      fc.property(problem, logUniform(1.1, 5), (p, k) => {
        const a = run(p);
        const b = run(p, k);
        expect(b.finalSurfaceTemperature).toBeGreaterThan(a.finalSurfaceTemperature);
        expect(b.finalCoreTemperature).toBeGreaterThanOrEqual(a.finalCoreTemperature - 1e-6);
      }),
      { seed: 1, numRuns: 30 },
    );
  });

  it("heating from ambient never cools any node below ambient", () => {
    fc.assert(
      fc.property(problem, (p) => {
        const r = run(p);
        for (const t of r.finalTemperatures) expect(t).toBeGreaterThanOrEqual(293.15 - 1e-6);
      }),
      { seed: 1, numRuns: 40 },
    );
  });
});
