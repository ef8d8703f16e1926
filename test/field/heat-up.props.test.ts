import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { austeniticStainless, axisymmetricHeatConduction, fieldHeatUp, lowCarbonSteel, mediumCarbonSteel } from "../../src/index.js";

// Invariants of the transient solutions: energy balance (heat generated = stored + lost) through
// the Curie peak of steel's specific heat, temperatures never below the coldest of the start and
// the surroundings when heated, and the heat-up monotone in the generation.

describe("axisymmetricHeatConduction properties", () => {
  it("energy balance through the Curie peak: |generated − stored − lost| ≤ 1e-6 of the generated heat; no cell colder than the start", () => {
    fc.assert(
      fc.property(
        fc.record({
          radius: fc.double({ min: 0.005, max: 0.05, noNaN: true }),
          bore: fc.double({ min: 0, max: 0.8, noNaN: true }),
          length: fc.double({ min: 0.01, max: 0.2, noNaN: true }),
          q: fc.double({ min: 1e7, max: 3e8, noNaN: true }),
          h: fc.double({ min: 0, max: 500, noNaN: true }),
          eps: fc.double({ min: 0, max: 1, noNaN: true }),
          steel: fc.constantFrom(lowCarbonSteel, mediumCarbonSteel),
        }),
        ({ radius, bore, length, q, h, eps, steel }) => {
          const res = axisymmetricHeatConduction({
            shape: { kind: "rectangle", rMin: bore * radius, rMax: radius, zMin: 0, zMax: length },
            material: steel,
            cells: { radial: 5, axial: 4 },
            surface: { convectionCoefficient: h, emissivity: eps, ambientTemperature: 293.15 },
            powerDensity: q,
            duration: 8,
          });
          expect(Math.abs(res.energy.imbalance)).toBeLessThanOrEqual(1e-6 * res.energy.input);
          expect(Math.min(...res.minimumTemperature)).toBeGreaterThanOrEqual(293.15 - 1e-6);
          expect(res.energy.lost).toBeGreaterThanOrEqual(0);
        },
      ),
      { numRuns: 12, seed: 15 },
    );
  }, 120_000);

  it("more generation heats more: the mean temperature rises with the power density", () => {
    fc.assert(
      fc.property(fc.double({ min: 1e6, max: 5e7, noNaN: true }), fc.double({ min: 1.1, max: 3, noNaN: true }), (q, factor) => {
        const run = (density: number) =>
          axisymmetricHeatConduction({
            shape: { kind: "rectangle", rMin: 0, rMax: 0.02, zMin: 0, zMax: 0.04 },
            material: austeniticStainless,
            cells: { radial: 4, axial: 3 },
            surface: { convectionCoefficient: 20, emissivity: 0.5, ambientTemperature: 293.15 },
            powerDensity: density,
            duration: 5,
          }).meanTemperature.at(-1)!;
        expect(run(q * factor)).toBeGreaterThan(run(q));
      }),
      { numRuns: 8, seed: 15 },
    );
  }, 120_000);
});

describe("fieldHeatUp properties", () => {
  it("energy balance: the induced energy equals heat stored plus heat lost (1e-6), power ≥ 0", () => {
    fc.assert(
      fc.property(
        fc.record({
          frequency: fc.double({ min: 1e3, max: 3e4, noNaN: true }),
          current: fc.double({ min: 100, max: 2000, noNaN: true }),
          radius: fc.double({ min: 0.005, max: 0.012, noNaN: true }),
        }),
        ({ frequency, current, radius }) => {
          const res = fieldHeatUp({
            frequency,
            accuracy: 0.05,
            coils: [{ name: "coil", current, resistivity: 1.75e-8, model: "stranded", turns: { shape: { kind: "rectangle", rMin: 0.016, rMax: 0.02, zMin: -0.02, zMax: 0.02 }, count: 4 } }],
            part: { name: "slug", shape: { kind: "rectangle", rMin: 0, rMax: radius, zMin: -0.015, zMax: 0.015 }, material: mediumCarbonSteel, cells: { radial: 3, axial: 2 } },
            surface: { convectionCoefficient: 10, emissivity: 0.7, ambientTemperature: 293.15 },
            duration: 1,
            resolveStep: 100,
          });
          expect(Math.abs(res.energy.imbalance)).toBeLessThanOrEqual(1e-6 * res.energy.input + 1e-9);
          for (const s of res.solutions) expect(s.power).toBeGreaterThanOrEqual(0);
          expect(res.fieldSolutions).toBeGreaterThanOrEqual(1);
        },
      ),
      { numRuns: 3, seed: 15 },
    );
  }, 180_000);
});
