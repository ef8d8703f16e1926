import { describe, it, expect } from "vitest";
import fc from "fast-check";
import { multilayerCoilInductance } from "../../src/inductance/index.js";
import { logUniform } from "../support/arbitraries.js";

// each exact evaluation takes tens of milliseconds: fewer runs than elsewhere keep the suite fast
const opts = { seed: 1, numRuns: 5 };

describe("multilayer properties", () => {
  it("scaling all lengths by k scales L by k, and L ∝ turns²", () => {
    fc.assert(
      fc.property(logUniform(0.005, 0.1), logUniform(0.1, 1), logUniform(0.2, 3), logUniform(0.1, 10), (r1, depth, length, k) => {
        const g = { innerRadius: r1, outerRadius: r1 * (1 + depth), length: r1 * length, turns: 10 };
        const l = multilayerCoilInductance(g);
        const lk = multilayerCoilInductance({ innerRadius: g.innerRadius * k, outerRadius: g.outerRadius * k, length: g.length * k, turns: 10 });
        expect(Math.abs(lk / (k * l) - 1)).toBeLessThan(1e-8);
        expect(Math.abs(multilayerCoilInductance({ ...g, turns: 30 }) / (9 * l) - 1)).toBeLessThan(1e-13);
      }),
      opts,
    );
  });

  // Not "L rises with the outer radius": at fixed turns, thickening a short, thick winding first
  // lowers L (the current spreads) — a shrunk counterexample (inner 0.1 m, outer 0.1639 m, length
  // 0.02 m) sits at such a minimum, confirmed by the Bessel–Struve integral in scipy.
  it("L rises when the winding moves outward and falls with length", () => {
    fc.assert(
      fc.property(logUniform(0.005, 0.1), logUniform(0.1, 1), logUniform(0.2, 3), (r1, depth, length) => {
        const g = { innerRadius: r1, outerRadius: r1 * (1 + depth), length: r1 * length, turns: 10 };
        const l = multilayerCoilInductance(g);
        const shift = 0.01 * r1;
        expect(multilayerCoilInductance({ ...g, innerRadius: g.innerRadius + shift, outerRadius: g.outerRadius + shift })).toBeGreaterThan(l);
        expect(multilayerCoilInductance({ ...g, length: g.length * 1.01 })).toBeLessThan(l);
      }),
      opts,
    );
  });
});
