import { describe, expect, it } from "vitest";
import { E24, InputError, llcDesign, type LlcDesignOptions } from "../../src/index.js";
import fixture from "../fixtures/converters/llc-design.json" with { type: "json" };

const rel = (a: number, b: number): number => Math.abs(a - b) / Math.max(Math.abs(b), 1e-300);

/** FHA gain of the LLC converter, written here from its published form (Steigerwald 1988; Yang et al. 2002). */
function fhaGain(ln: number, q: number, fn: number): number {
  const a = 1 + 1 / ln - 1 / (ln * fn * fn);
  const b = q * (fn - 1 / fn);
  return 1 / Math.sqrt(a * a + b * b);
}
/** Peak of the FHA gain below resonance by a dense scan (independent of the library's search). */
function scannedPeak(ln: number, q: number): number {
  const lo = 1 / Math.sqrt(1 + ln);
  let best = 0;
  for (let k = 1; k <= 200000; k++) best = Math.max(best, fhaGain(ln, q, lo + ((1 - lo) * k) / 200000));
  return best;
}

const adapter: LlcDesignOptions = {
  inputVoltage: { min: 340, nominal: 390, max: 410 }, outputVoltage: 19.5, outputPower: 65, resonantFrequency: 100e3, bridge: "half",
};

describe("llcDesign", () => {
  for (const c of fixture.cases) {
    it(`the designed circuit delivers the specified ${c.spec.outputVoltage} V at ${c.corner.inputVoltage} V input in a time-domain simulation`, () => {
      const design = llcDesign(c.spec as LlcDesignOptions);
      // the fixture simulates the components and frequencies this design returns (guard: regenerate when they change)
      expect(rel(design.turnsRatio, c.components.turnsRatio)).toBeLessThanOrEqual(1e-12);
      expect(rel(design.resonantInductance, c.components.resonantInductance)).toBeLessThanOrEqual(1e-9);
      expect(design.resonantCapacitance).toBe(c.components.resonantCapacitance);
      expect(rel(design.magnetisingInductance, c.components.magnetisingInductance)).toBeLessThanOrEqual(1e-9);
      const corner = design.corners.find((k) => k.loadFraction === 1 && k.inputVoltage === c.corner.inputVoltage);
      expect(corner?.method).toBe("exact");
      expect(rel(corner?.switchingFrequency ?? 0, c.corner.switchingFrequency)).toBeLessThanOrEqual(1e-9);
      // the outside reference: scipy shooting simulation, test/fixtures/converters/generate_design.py
      expect(rel(c.expected.outputVoltage, c.spec.outputVoltage)).toBeLessThanOrEqual(fixture.meta.rtol);
      expect(rel(corner?.operatingPoint?.outputVoltage ?? 0, c.expected.outputVoltage)).toBeLessThanOrEqual(fixture.meta.rtol);
    });
  }

  it("picks the largest Q whose first-harmonic peak gain keeps the margin: one E24 step smaller C_r loses it", () => {
    const d = llcDesign(adapter);
    const mMax = 390 / 340;
    const rac = (8 * d.turnsRatio ** 2 * d.loadResistance) / Math.PI ** 2;
    // gain margin against an independent dense scan of the FHA formula
    expect(rel(d.gainMargin, scannedPeak(6, d.qualityFactor) / mMax)).toBeLessThanOrEqual(1e-6);
    expect(d.gainMargin).toBeGreaterThanOrEqual(1.1);
    const mantissa = d.resonantCapacitance / 10 ** Math.floor(Math.log10(d.resonantCapacitance));
    const index = E24.findIndex((v) => Math.abs(v - mantissa) < 1e-9);
    expect(index).toBeGreaterThanOrEqual(0); // an E24 value (IEC 60063)
    const below = (index > 0 ? E24[index - 1]! : E24[E24.length - 1]! / 10) * 10 ** Math.floor(Math.log10(d.resonantCapacitance));
    const qBelow = 1 / (2 * Math.PI * 100e3 * below * rac);
    expect(scannedPeak(6, qBelow) / mMax).toBeLessThan(1.1);
    // f_r kept exactly
    expect(rel(d.resonantFrequency, 100e3)).toBeLessThanOrEqual(1e-12);
    expect(rel(d.magnetisingInductance / d.resonantInductance, 6)).toBeLessThanOrEqual(1e-12);
  });

  it("puts the nominal full-load corner at resonance and orders the corners by input voltage", () => {
    const d = llcDesign(adapter);
    const nominal = d.corners.find((k) => k.loadFraction === 1 && k.inputVoltage === 390);
    // at f_s = f_r the exact gain of the LLC is 1 whatever the load (the series tank is a short; from memory, Yang et al. 2002)
    expect(rel(nominal?.switchingFrequency ?? 0, 100e3)).toBeLessThanOrEqual(1e-9);
    for (const fraction of [1, 0.2]) {
      const f = d.corners.filter((k) => k.loadFraction === fraction).map((k) => k.switchingFrequency);
      expect(f[0]!).toBeLessThan(f[1]!);
      expect(f[1]!).toBeLessThan(f[2]!);
    }
    expect(d.zeroVoltageSwitching).toBe(true);
    expect(d.frequencyRange.min).toBe(Math.min(...d.corners.map((k) => k.switchingFrequency)));
    expect(d.cautions.map((c) => c.code)).toContain("voltage-above-extra-low");
  });

  it("cautions when the highest input needs a frequency far above resonance", () => {
    const wide = llcDesign({ ...adapter, inputVoltage: { min: 340, nominal: 390, max: 520 }, inductanceRatio: 10 });
    expect(wide.cautions.map((c) => c.code)).toContain("frequency-far-above-resonance");
    expect(wide.frequencyRange.max).toBeGreaterThan(2 * 100e3);
    // every solved corner is exact and delivers the output (a corner left to the FHA would say so in validity)
    for (const c of wide.corners) expect(c.method === "exact" ? Math.abs((c.operatingPoint?.outputVoltage ?? 0) / 19.5 - 1) : 0).toBeLessThanOrEqual(1e-9);
  });

  it("throws InputError for an inverted range, an unknown key and out-of-range options", () => {
    expect(() => llcDesign({ ...adapter, inputVoltage: { min: 400, nominal: 390, max: 410 } })).toThrow(InputError);
    expect(() => llcDesign({ ...adapter, inputVoltage: { min: 340, nominal: 390, max: 380 } })).toThrow(InputError);
    expect(() => llcDesign({ ...adapter, inputVoltage: { min: 340, nominal: 390, max: 410, typo: 1 } as unknown as LlcDesignOptions["inputVoltage"] })).toThrow(/inputVoltage\.typo/);
    expect(() => llcDesign({ ...adapter, ratio: 6 } as unknown as LlcDesignOptions)).toThrow(InputError);
    expect(() => llcDesign({ ...adapter, inductanceRatio: 2 })).toThrow(InputError);
    expect(() => llcDesign({ ...adapter, gainMargin: 0.9 })).toThrow(InputError);
    expect(() => llcDesign({ ...adapter, lightLoadFraction: 1 })).toThrow(InputError);
  });

  it("runs its documented example", () => {
    const d = llcDesign(adapter);
    expect(d.turnsRatio.toFixed(3)).toBe("10.000");
    expect(d.resonantCapacitance).toBe(8.2e-9);
  });
});
