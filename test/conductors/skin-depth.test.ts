import { describe, it, expect } from "vitest";
import { skinDepth, InputError } from "../../src/index.js";
import { ANNEALED_COPPER_RESISTIVITY } from "../../src/units/index.js";

describe("skinDepth", () => {
  it("matches published copper skin-depth tables (rho about 1.7e-8 ohm m) within their rounding", () => {
    // common practice: handbook tables of copper skin depth at about 1.7e-8 Ω·m (values from memory)
    const rho = 1.7e-8;
    expect(skinDepth({ resistivity: rho, frequency: 60 }) * 1e3).toBeCloseTo(8.5, 1);
    expect(skinDepth({ resistivity: rho, frequency: 1e3 }) * 1e3).toBeCloseTo(2.1, 1);
    expect(skinDepth({ resistivity: rho, frequency: 20e3 }) * 1e3).toBeCloseTo(0.46, 2);
  });

  it("gives 66.1 mm/sqrt(f) for IEC 60028 annealed copper at 20 °C", () => {
    // IEC 60028: rho = 1/58 Ω·mm²/m → δ = 66.1 mm/√f (rounded to three digits)
    for (const f of [50, 1e3, 25e3, 1e6]) {
      const d = skinDepth({ resistivity: ANNEALED_COPPER_RESISTIVITY, frequency: f });
      expect(Math.round(d * Math.sqrt(f) * 1e4) / 10).toBe(66.1);
    }
  });

  it("agrees with δ = √(ρ/(π f μ0)) evaluated independently", () => {
    // mpmath at 30 digits, μ0 = 1.25663706212e-6 H/m (CODATA 2018), rounded to a double below:
    //   sqrt(mpf('1.7241e-8') / (pi * 20000 * mpf('1.25663706212e-6'))) = 4.67289862695868256766589630739e-4
    expect(Math.abs(skinDepth({ resistivity: 1.7241e-8, frequency: 20e3 }) / 4.672898626958683e-4 - 1)).toBeLessThan(4e-16);
  });

  it("shrinks as the square root of the relative permeability", () => {
    const d1 = skinDepth({ resistivity: 1e-7, frequency: 1e3 });
    const d100 = skinDepth({ resistivity: 1e-7, frequency: 1e3, relativePermeability: 100 });
    expect(d1 / d100).toBeCloseTo(10, 13);
  });

  it("throws InputError on bad input", () => {
    expect(() => skinDepth({ resistivity: 0, frequency: 1 })).toThrow(InputError);
    expect(() => skinDepth({ resistivity: 1e-8, frequency: -1 })).toThrow(InputError);
    expect(() => skinDepth({ resistivity: 1e-8, frequency: NaN })).toThrow(/frequency/);
    expect(() => skinDepth({ resistivity: 1e-8, frequency: 1, relativePermeability: 0 })).toThrow(/relativePermeability/);
    expect(() => skinDepth({ resistivity: Infinity, frequency: 1 })).toThrow(InputError);
  });
});
