import { describe, it, expect } from "vitest";
import fc from "fast-check";
import { coaxialCoilMutualInductance, loopInductance, spiralCoilInductance } from "../../src/inductance/index.js";
import { logUniform } from "../support/arbitraries.js";

const opts = { seed: 1, numRuns: 200 };

describe("spiral properties", () => {
  it("the exact spiral is the loop sum: self terms plus its mutual inductance with itself as filaments", () => {
    fc.assert(
      fc.property(logUniform(0.005, 0.2), logUniform(0.1, 3), fc.integer({ min: 2, max: 25 }), fc.double({ min: 0.2, max: 1, noNaN: true }), (inner, span, n, fill) => {
        const outer = inner * (1 + span);
        const pitch = (outer - inner) / (n - 1);
        const d = Math.min(fill * pitch, inner);
        const l = spiralCoilInductance({ innerRadius: inner, outerRadius: outer, turns: n, wireDiameter: d });
        let self = 0;
        for (let i = 0; i < n; i++) self += loopInductance({ loopRadius: inner + pitch * i, wireRadius: d / 2 });
        // mutual part: two half-turn-offset copies are not needed; use the coaxial engine on one ring at a time
        let mutual = 0;
        for (let i = 0; i < n; i++) {
          for (let j = 0; j < n; j++) {
            if (i !== j) mutual += coaxialCoilMutualInductance({ kind: "loop", radius: inner + pitch * i }, { kind: "loop", radius: inner + pitch * j }, 0);
          }
        }
        expect(Math.abs(l / (self + mutual) - 1)).toBeLessThan(1e-12);
      }),
      { seed: 1, numRuns: 40 },
    );
  });

  it("scaling all lengths by k scales L by k; L rises with turns at fixed outline", () => {
    fc.assert(
      fc.property(logUniform(0.005, 0.2), logUniform(0.1, 3), fc.integer({ min: 2, max: 40 }), logUniform(0.01, 100), (inner, span, n, k) => {
        const outer = inner * (1 + span);
        const d = (0.5 * (outer - inner)) / (n - 1);
        const l = spiralCoilInductance({ innerRadius: inner, outerRadius: outer, turns: n, wireDiameter: d });
        const lk = spiralCoilInductance({ innerRadius: inner * k, outerRadius: outer * k, turns: n, wireDiameter: d * k });
        expect(Math.abs(lk / (k * l) - 1)).toBeLessThan(1e-12);
        expect(spiralCoilInductance({ innerRadius: inner, outerRadius: outer, turns: n + 1, wireDiameter: d * 0.5 })).toBeGreaterThan(l);
      }),
      opts,
    );
  });
});
