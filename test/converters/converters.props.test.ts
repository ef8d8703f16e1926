import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { llcGain, llcOperatingPoint } from "../../src/index.js";

describe("converter properties", () => {
  it("llcGain falls as the frequency rises above resonance", () => {
    fc.assert(
      fc.property(fc.double({ min: 1.5, max: 20, noNaN: true }), fc.double({ min: 0.05, max: 3, noNaN: true }), fc.double({ min: 1, max: 5, noNaN: true }), fc.double({ min: 1.001, max: 1.5, noNaN: true }), (ln, q, fn, step) => {
        const a = llcGain({ inductanceRatio: ln, qualityFactor: q, normalisedFrequency: fn });
        const b = llcGain({ inductanceRatio: ln, qualityFactor: q, normalisedFrequency: fn * step });
        expect(b).toBeLessThan(a);
      }),
      { seed: 18, numRuns: 300 },
    );
  });

  it("the exact LLC gain falls as the frequency rises above resonance, and power is conserved", () => {
    const lr = 60e-6;
    const cr = 24e-9;
    const fr = 1 / (2 * Math.PI * Math.sqrt(lr * cr));
    const zr = Math.sqrt(lr / cr);
    fc.assert(
      fc.property(fc.double({ min: 3, max: 10, noNaN: true }), fc.double({ min: 0.15, max: 1, noNaN: true }), fc.double({ min: 1.01, max: 1.5, noNaN: true }), (ln, q, fn) => {
        const rl = (Math.PI * Math.PI * zr) / (q * 8 * 64);
        const at = (f: number) => llcOperatingPoint({ bridge: "half", inputVoltage: 390, turnsRatio: 8, resonantInductance: lr, resonantCapacitance: cr, magnetisingInductance: ln * lr, switchingFrequency: f * fr, loadResistance: rl });
        const a = at(fn);
        const b = at(fn * 1.05);
        expect(b.gain).toBeLessThan(a.gain);
        expect(Math.abs(a.inputPower / a.outputPower - 1)).toBeLessThanOrEqual(1e-9);
        expect(a.zeroVoltageSwitching).toBe(true); // above resonance the current lags: ZVS (common practice)
      }),
      { seed: 18, numRuns: 60 },
    );
  });
});
