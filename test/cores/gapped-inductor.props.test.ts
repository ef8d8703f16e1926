import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { gapLengthForInductance, gappedInductor } from "../../src/index.js";

const SEED = 19020;
const logU = (lo: number, hi: number): fc.Arbitrary<number> =>
  fc.double({ min: Math.log(lo), max: Math.log(hi), noNaN: true, noDefaultInfinity: true }).map(Math.exp);
const fringing = fc.constantFrom("none" as const, "mclyman" as const, "muhlethaler" as const);
const coreArb = fc.record({
  effectiveArea: logU(1e-5, 1e-3),
  effectivePathLength: logU(0.02, 0.3),
  relativePermeability: logU(50, 1e4),
  legShape: fc.constantFrom("rectangular" as const, "round" as const),
  legWidth: logU(3e-3, 3e-2),
  legDepth: logU(3e-3, 3e-2),
  windowHeight: logU(0.01, 0.05),
});

describe("gappedInductor properties", () => {
  it("fringing factor ≥ 1; inductance falls as the gap grows; L ∝ N²", () => {
    fc.assert(
      fc.property(coreArb, fringing, fc.double({ min: 0.001, max: 0.2, noNaN: true }), fc.integer({ min: 1, max: 200 }), (core, f, frac, turns) => {
        const g = frac * core.windowHeight;
        const a = gappedInductor({ core, turns, gapLength: g, fringing: f });
        const b = gappedInductor({ core, turns, gapLength: g * 1.2, fringing: f });
        const c = gappedInductor({ core, turns: 2 * turns, gapLength: g, fringing: f });
        expect(a.fringingFactor).toBeGreaterThanOrEqual(1);
        expect(b.inductance).toBeLessThan(a.inductance);
        expect(Math.abs(c.inductance / (4 * a.inductance) - 1)).toBeLessThan(1e-12);
      }),
      { seed: SEED, numRuns: 300 },
    );
  });

  it("gapLengthForInductance inverts gappedInductor", () => {
    fc.assert(
      fc.property(coreArb, fringing, fc.double({ min: 0.002, max: 0.15, noNaN: true }), fc.integer({ min: 1, max: 200 }), (core, f, frac, turns) => {
        const g = frac * core.windowHeight;
        if (!(g < core.effectivePathLength)) return;
        const l = gappedInductor({ core, turns, gapLength: g, fringing: f }).inductance;
        const back = gapLengthForInductance({ core, turns, inductance: l, fringing: f });
        expect(Math.abs(back / g - 1)).toBeLessThan(1e-8);
      }),
      { seed: SEED, numRuns: 300 },
    );
  });
});
