import { describe, it, expect } from "vitest";
import fc from "fast-check";
import { roundWireWindingAcRatio } from "../../src/index.js";

const logUniform = (lo: number, hi: number) =>
  fc.double({ min: Math.log10(lo), max: Math.log10(hi), noNaN: true, noDefaultInfinity: true }).map((e) => 10 ** e);
const rho = 1.7241e-8;
const winding = fc.record({
  wireDiameter: logUniform(1e-5, 5e-3),
  frequency: logUniform(1, 1e7),
  layers: fc.integer({ min: 1, max: 20 }),
  turnsPerLayer: fc.integer({ min: 1, max: 60 }),
  slack: logUniform(1, 3),
});

describe("roundWireWindingAcRatio properties", () => {
  it("Rac/Rdc ≥ 1, finite, and non-decreasing in frequency", () => {
    fc.assert(
      fc.property(winding, logUniform(1, 100), (w, k) => {
        const o = { wireDiameter: w.wireDiameter, frequency: w.frequency, resistivity: rho, layers: w.layers, turnsPerLayer: w.turnsPerLayer, windowBreadth: w.turnsPerLayer * w.wireDiameter * w.slack };
        const a = roundWireWindingAcRatio(o);
        const b = roundWireWindingAcRatio({ ...o, frequency: o.frequency * k });
        expect(Number.isFinite(a)).toBe(true);
        expect(a).toBeGreaterThanOrEqual(1);
        expect(b).toBeGreaterThanOrEqual(a * (1 - 1e-15));
      }),
      { seed: 1, numRuns: 200 },
    );
  });
  it("grows with the number of layers and with tighter winding (porosity)", () => {
    fc.assert(
      fc.property(winding, (w) => {
        const o = { wireDiameter: w.wireDiameter, frequency: w.frequency, resistivity: rho, layers: w.layers, turnsPerLayer: w.turnsPerLayer, windowBreadth: w.turnsPerLayer * w.wireDiameter * w.slack };
        const a = roundWireWindingAcRatio(o);
        expect(roundWireWindingAcRatio({ ...o, layers: o.layers + 1 })).toBeGreaterThan(a * (1 - 1e-15));
        expect(roundWireWindingAcRatio({ ...o, windowBreadth: o.windowBreadth * 2 })).toBeLessThanOrEqual(a * (1 + 1e-15));
      }),
      { seed: 1, numRuns: 200 },
    );
  });
  it("tends to 1 as the frequency tends to 0", () => {
    fc.assert(
      fc.property(winding, (w) => {
        const o = { wireDiameter: w.wireDiameter, frequency: 1e-6, resistivity: rho, layers: w.layers, turnsPerLayer: w.turnsPerLayer, windowBreadth: w.turnsPerLayer * w.wireDiameter * w.slack };
        expect(roundWireWindingAcRatio(o) - 1).toBeLessThan(1e-6);
      }),
      { seed: 1, numRuns: 200 },
    );
  });
});
