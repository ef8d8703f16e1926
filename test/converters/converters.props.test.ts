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

describe("exact steady state over the tested domain", () => {
  it("converges and conserves power on a grid of 3 ≤ L_n ≤ 10 (and ∞), 0.15 ≤ Q ≤ 1, 0.45 ≤ f_n ≤ 1.6", async () => {
    const { seriesResonantOperatingPoint } = await import("../../src/index.js");
    const lr = 60e-6;
    const cr = 24e-9;
    const fr = 1 / (2 * Math.PI * Math.sqrt(lr * cr));
    const zr = Math.sqrt(lr / cr);
    for (const ln of [3, 6, 10, Infinity]) {
      for (let qi = 0; qi <= 4; qi++) {
        for (let fi = 0; fi <= 12; fi++) {
          const q = 0.15 * Math.pow(1 / 0.15, qi / 4);
          const fn = 0.45 * Math.pow(1.6 / 0.45, fi / 12);
          const base = { bridge: "half" as const, inputVoltage: 390, turnsRatio: 8, resonantInductance: lr, resonantCapacitance: cr, switchingFrequency: fn * fr, loadResistance: (Math.PI ** 2 * zr) / (q * 8 * 64) };
          const op = ln === Infinity ? seriesResonantOperatingPoint(base) : llcOperatingPoint({ ...base, magnetisingInductance: ln * lr });
          expect(Math.abs(op.inputPower / op.outputPower - 1)).toBeLessThanOrEqual(1e-9);
          expect(op.validity).toHaveLength(0);
        }
      }
    }
  });
});

describe("llcDesign properties", () => {
  it("every solved corner gives the specified output, and a higher input needs a higher frequency", async () => {
    const { llcDesign } = await import("../../src/index.js");
    fc.assert(
      fc.property(
        fc.double({ min: 0.75, max: 0.95, noNaN: true }), fc.double({ min: 1.02, max: 1.08, noNaN: true }),
        fc.double({ min: 3, max: 8, noNaN: true }), fc.double({ min: 20, max: 500, noNaN: true }),
        (low, high, ln, power) => {
          const d = llcDesign({ inputVoltage: { min: 390 * low, nominal: 390, max: 390 * high }, outputVoltage: 24, outputPower: power, resonantFrequency: 150e3, bridge: "half", inductanceRatio: ln });
          for (const c of d.corners) {
            if (c.operatingPoint !== null) expect(Math.abs(c.operatingPoint.outputVoltage / 24 - 1)).toBeLessThanOrEqual(1e-9);
          }
          const full = d.corners.filter((c) => c.loadFraction === 1);
          for (let k = 1; k < full.length; k++) expect(full[k]!.switchingFrequency).toBeGreaterThan(full[k - 1]!.switchingFrequency);
          expect(d.gainMargin).toBeGreaterThanOrEqual(1.1 * (1 - 1e-9));
        },
      ),
      { seed: 18, numRuns: 8 },
    );
  });
});

describe("PRC and LCC exact steady state (inductive output filter)", () => {
  const lr = 100e-6;
  const c = 25e-9;
  const fr = 1 / (2 * Math.PI * Math.sqrt(lr * c));
  const zp = Math.sqrt(lr / c);
  const loadFor = (q: number): number => (8 * zp) / (q * Math.PI * Math.PI * 16);

  it("conserves power, and the gain falls as the frequency rises above the tank's peak (PRC and LCC)", async () => {
    const { lccOperatingPoint, parallelResonantOperatingPoint } = await import("../../src/index.js");
    fc.assert(
      fc.property(fc.double({ min: 0.25, max: 2, noNaN: true }), fc.double({ min: 0.2, max: 2.5, noNaN: true }), fc.double({ min: 1.2, max: 1.6, noNaN: true }), fc.boolean(), (ratio, q, fn, lcc) => {
        const at = (f: number) => lcc
          ? lccOperatingPoint({ bridge: "half", inputVoltage: 400, turnsRatio: 4, resonantInductance: lr, seriesCapacitance: c, parallelCapacitance: ratio * c, switchingFrequency: f * fr * Math.sqrt(1 + 1 / ratio), loadResistance: loadFor(q) })
          : parallelResonantOperatingPoint({ bridge: "half", inputVoltage: 400, turnsRatio: 4, resonantInductance: lr, parallelCapacitance: c, switchingFrequency: f * fr, loadResistance: loadFor(q) });
        const a = at(fn);
        const b = at(fn * 1.03);
        expect(b.gain).toBeLessThan(a.gain);
        expect(Math.abs(a.inputPower / a.outputPower - 1)).toBeLessThanOrEqual(1e-9);
        expect(a.clampedFraction).toBeGreaterThanOrEqual(0);
        expect(a.clampedFraction).toBeLessThan(1);
      }),
      { seed: 18, numRuns: 60 },
    );
  });

  it("the LCC tends to the PRC as the series capacitor grows (C_s → ∞)", async () => {
    const { lccOperatingPoint, parallelResonantOperatingPoint } = await import("../../src/index.js");
    fc.assert(
      fc.property(fc.double({ min: 0.2, max: 2.5, noNaN: true }), fc.double({ min: 0.7, max: 1.5, noNaN: true }), (q, fn) => {
        const common = { bridge: "half" as const, inputVoltage: 400, turnsRatio: 4, resonantInductance: lr, parallelCapacitance: c, switchingFrequency: fn * fr, loadResistance: loadFor(q) };
        const prc = parallelResonantOperatingPoint(common);
        const lcc = lccOperatingPoint({ ...common, seriesCapacitance: 1e6 * c });
        expect(Math.abs(lcc.gain / prc.gain - 1)).toBeLessThanOrEqual(1e-4);
      }),
      { seed: 18, numRuns: 40 },
    );
  });

  it("scaling: all impedances ×k at the same frequency ratio leave the gain unchanged; V_in ×s scales V_out by s", async () => {
    const { lccOperatingPoint } = await import("../../src/index.js");
    fc.assert(
      fc.property(fc.double({ min: 0.1, max: 10, noNaN: true }), fc.double({ min: 0.1, max: 10, noNaN: true }), fc.double({ min: 0.8, max: 1.5, noNaN: true }), (k, s, fn) => {
        const one = lccOperatingPoint({ bridge: "half", inputVoltage: 400, turnsRatio: 4, resonantInductance: lr, seriesCapacitance: c, parallelCapacitance: c, switchingFrequency: fn * fr, loadResistance: 20 });
        const two = lccOperatingPoint({ bridge: "half", inputVoltage: 400 * s, turnsRatio: 4, resonantInductance: lr * k, seriesCapacitance: c / k, parallelCapacitance: c / k, switchingFrequency: fn * fr, loadResistance: 20 * k });
        expect(Math.abs(two.gain / one.gain - 1)).toBeLessThanOrEqual(1e-9);
        expect(Math.abs(two.outputVoltage / (s * one.outputVoltage) - 1)).toBeLessThanOrEqual(1e-9);
      }),
      { seed: 18, numRuns: 40 },
    );
  });
});
