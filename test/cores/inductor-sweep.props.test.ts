import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { eCore, inductorTurnsSweep, inventedExampleFerrite } from "../../src/index.js";

const SEED = 19022;
const core = eCore({ width: 0.042, height: 0.021, depth: 0.015, windowWidth: 0.03, centreLegWidth: 0.012, windowHeight: 0.015 });
const conductor = { kind: "litz" as const, strands: 105, strandDiameter: 0.1e-3, outerDiameter: 1.4e-3 };

describe("inductorTurnsSweep properties", () => {
  it("the least-loss point is usable, no usable point beats it, the design is the fewest usable turns, and turns increase", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 40e-6, max: 200e-6, noNaN: true }),
        fc.double({ min: 0.5, max: 6, noNaN: true }),
        fc.double({ min: 0.2, max: 4, noNaN: true }),
        fc.double({ min: 50e3, max: 200e3, noNaN: true }),
        (inductance, average, ripple, frequency) => {
          const s = inductorTurnsSweep({
            design: { inductance, frequency, core, material: inventedExampleFerrite, conductor, ambientTemperature: 313.15, current: { kind: "triangular", average, ripple, dutyCycle: 0.5 } },
            maxTurns: 60,
          });
          for (let i = 1; i < s.points.length; i++) expect(s.points[i]!.turns).toBeGreaterThan(s.points[i - 1]!.turns);
          if (s.leastLoss === null) return;
          expect(s.leastLoss.usable).toBe(true);
          for (const p of s.points) if (p.usable) expect(s.leastLoss.design.totalLoss).toBeLessThanOrEqual(p.design.totalLoss);
          const firstUsable = s.points.find((p) => p.usable);
          if (firstUsable !== undefined && s.design.turns >= s.points[0]!.turns) expect(firstUsable.turns).toBe(s.design.turns);
        },
      ),
      { seed: SEED, numRuns: 6 },
    );
  });
});
