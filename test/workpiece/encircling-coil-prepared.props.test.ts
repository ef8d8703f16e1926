import { describe, it } from "vitest";
import fc from "fast-check";
import { prepareEncirclingCoilOverRod } from "../../src/index.js";

describe("prepareEncirclingCoilOverRod invariants", () => {
  it("the reflected resistance is ≥ 0 and grows as turns² (uniform winding density)", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.005, max: 0.03, noNaN: true }),
        fc.double({ min: 0.01, max: 0.2, noNaN: true }),
        fc.integer({ min: 1, max: 20 }),
        fc.double({ min: 2, max: 6, noNaN: true }),
        fc.double({ min: 0, max: 3, noNaN: true }),
        (radius, length, turns, logF, logMu) => {
          const coil = { innerRadius: radius * 1.3, outerRadius: radius * 1.4, length, turns: 1 };
          const one = prepareEncirclingCoilOverRod({ coil, rod: { radius } })(10 ** logF, 2e-7, 10 ** logMu);
          const many = prepareEncirclingCoilOverRod({ coil: { ...coil, turns }, rod: { radius } })(10 ** logF, 2e-7, 10 ** logMu);
          return one.reflectedResistance >= 0 && Math.abs(many.reflectedResistance - turns * turns * one.reflectedResistance) <= 1e-12 * many.reflectedResistance;
        },
      ),
      { seed: 7, numRuns: 30 },
    );
  });

  it("a non-magnetic rod always lowers the inductance (ΔL < 0 for μr = 1)", () => {
    fc.assert(
      fc.property(fc.double({ min: 0.005, max: 0.03, noNaN: true }), fc.double({ min: 1, max: 6, noNaN: true }), (radius, logF) => {
        const evaluate = prepareEncirclingCoilOverRod({ coil: { innerRadius: radius * 1.2, outerRadius: radius * 1.3, length: 0.05, turns: 5 }, rod: { radius } });
        return evaluate(10 ** logF, 4e-8, 1).inductanceChange < 0;
      }),
      { seed: 8, numRuns: 30 },
    );
  });
});
