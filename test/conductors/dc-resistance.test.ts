import { describe, it, expect } from "vitest";
import { wireDcResistance, wireDcResistanceAt, copper, celsius, resistivityAt, InputError } from "../../src/index.js";
import { ANNEALED_COPPER_RESISTIVITY } from "../../src/units/index.js";

describe("wireDcResistance", () => {
  it("gives 21.95 mΩ per metre for 1 mm annealed copper at 20 °C (IEC 60028 resistivity)", () => {
    // IEC 60028: ρ = 1/58 Ω·mm²/m → R' = ρ/(π/4 · 1 mm²) = 21.952 mΩ/m
    expect(wireDcResistance({ resistivity: ANNEALED_COPPER_RESISTIVITY, length: 1, diameter: 1e-3 })).toBeCloseTo(0.021952, 6);
  });
  it("agrees with IEC 60228 class 1 maximum for 1.5 mm² plain copper within the standard's margin", () => {
    // IEC 60228:2004 Table 1: 1.5 mm² class 1 plain annealed copper ≤ 12.1 Ω/km at 20 °C
    // (as reproduced in KabelMetal's "Conductor specification according to IEC 60228", Table A.1)
    const d = Math.sqrt((4 * 1.5e-6) / Math.PI);
    const r = wireDcResistance({ resistivity: ANNEALED_COPPER_RESISTIVITY, length: 1000, diameter: d });
    expect(r).toBeLessThan(12.1);
    expect(r).toBeGreaterThan(11.0);
  });
  it("throws InputError on bad input", () => {
    expect(() => wireDcResistance({ resistivity: 1e-8, length: 0, diameter: 1e-3 })).toThrow(/length/);
    expect(() => wireDcResistance({ resistivity: 1e-8, length: 1, diameter: -1 })).toThrow(InputError);
    expect(() => wireDcResistance({ resistivity: NaN, length: 1, diameter: 1 })).toThrow(/resistivity/);
  });
});

describe("wireDcResistanceAt", () => {
  it("equals wireDcResistance with resistivityAt(material, temperature)", () => {
    for (const t of [250, 293.15, 373.15, 500]) {
      const r = wireDcResistanceAt({ material: copper, temperature: t, length: 3, diameter: 2e-3 });
      const ref = wireDcResistance({ resistivity: resistivityAt(copper, t), length: 3, diameter: 2e-3 });
      expect(Math.abs(r / ref - 1)).toBeLessThan(1e-15);
    }
  });
  it("rises about 31 % from 20 °C to 100 °C for copper (IEC 60028 α = 0.00393/K)", () => {
    const r20 = wireDcResistanceAt({ material: copper, temperature: celsius(20), length: 1, diameter: 1e-3 });
    const r100 = wireDcResistanceAt({ material: copper, temperature: celsius(100), length: 1, diameter: 1e-3 });
    expect(r100 / r20).toBeCloseTo(1 + 0.00393 * 80, 3);
  });
  it("throws InputError on bad input", () => {
    expect(() => wireDcResistanceAt({ material: null as never, temperature: 300, length: 1, diameter: 1e-3 })).toThrow(/material/);
    expect(() => wireDcResistanceAt({ material: copper, temperature: -1, length: 1, diameter: 1e-3 })).toThrow(InputError);
    expect(() => wireDcResistanceAt({ material: copper, temperature: 300, length: 1, diameter: 0 })).toThrow(/diameter/);
  });
});
