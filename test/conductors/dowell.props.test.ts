import { describe, it, expect } from "vitest";
import fc from "fast-check";
import { dowellFactor } from "../../src/index.js";

const logUniform = (lo: number, hi: number) =>
  fc.double({ min: Math.log10(lo), max: Math.log10(hi), noNaN: true, noDefaultInfinity: true }).map((e) => 10 ** e);
const layersArb = fc.integer({ min: 1, max: 60 });

describe("dowellFactor properties", () => {
  it("Fr is finite and at least 1 for delta from 1e-6 to 1e4", () => {
    fc.assert(
      fc.property(logUniform(1e-6, 1e4), layersArb, (d, m) => {
        const f = dowellFactor({ penetrationRatio: d, layers: m });
        expect(Number.isFinite(f)).toBe(true);
        expect(f).toBeGreaterThanOrEqual(1);
      }),
      { seed: 1, numRuns: 200 },
    );
  });
  it("Fr grows with the number of layers", () => {
    fc.assert(
      fc.property(logUniform(1e-3, 1e4), layersArb, (d, m) => {
        expect(dowellFactor({ penetrationRatio: d, layers: m + 1 })).toBeGreaterThan(dowellFactor({ penetrationRatio: d, layers: m }));
      }),
      { seed: 1, numRuns: 200 },
    );
  });
  it("Fr does not decrease as the layers thicken (frequency rises)", () => {
    fc.assert(
      fc.property(logUniform(1e-6, 1e4), logUniform(1, 10), layersArb, (d, k, m) => {
        const a = dowellFactor({ penetrationRatio: d, layers: m });
        const b = dowellFactor({ penetrationRatio: d * k, layers: m });
        expect(b).toBeGreaterThanOrEqual(a * (1 - 1e-15));
      }),
      { seed: 1, numRuns: 200 },
    );
  });
  it("one layer reduces to the foil skin-effect factor Δ (sinh 2Δ + sin 2Δ)/(cosh 2Δ − cos 2Δ)", () => {
    fc.assert(
      fc.property(fc.double({ min: 0.5, max: 300, noNaN: true, noDefaultInfinity: true }), (d) => {
        const skin = (d * (Math.sinh(2 * d) + Math.sin(2 * d))) / (Math.cosh(2 * d) - Math.cos(2 * d));
        expect(Math.abs(dowellFactor({ penetrationRatio: d, layers: 1 }) / skin - 1)).toBeLessThan(1e-13);
      }),
      { seed: 1, numRuns: 200 },
    );
  });
  it("Fr tends to 1 as delta tends to 0", () => {
    fc.assert(
      fc.property(logUniform(1e-6, 1e-3), fc.integer({ min: 1, max: 30 }), (d, m) => {
        expect(dowellFactor({ penetrationRatio: d, layers: m }) - 1).toBeLessThan(1e-9);
      }),
      { seed: 1, numRuns: 200 },
    );
  });
});
