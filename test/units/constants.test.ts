import { describe, expect, it } from "vitest";
import { InputError } from "../../src/core/index.js";
import {
  ANNEALED_COPPER_RESISTIVITY,
  ANNEALED_COPPER_TEMPERATURE_COEFFICIENT,
  celsius,
  EPSILON_0,
  inches,
  millimetres,
  mils,
  MU_0,
  STEFAN_BOLTZMANN,
  toCelsius,
  toInches,
  toMillimetres,
  toMils,
} from "../../src/units/index.js";

describe("constants", () => {
  it("carry the CODATA 2018 values", () => {
    // CODATA 2018 (Tiesinga et al., Rev. Mod. Phys. 93, 025010): μ0 = 1.25663706212e-6 N/A²,
    // ε0 = 8.8541878128e-12 F/m, σ = 5.670374419e-8 W m⁻² K⁻⁴.
    expect(MU_0).toBe(1.25663706212e-6);
    expect(Math.abs(EPSILON_0 / 8.8541878128e-12 - 1)).toBeLessThan(2e-11);
    expect(STEFAN_BOLTZMANN).toBe(5.670374419e-8);
  });
  it("carry the IEC 60028 annealed copper standard", () => {
    // IEC 60028: 1/58 Ω·mm²/m at 20 °C, α = 0.00393 /K.
    expect(ANNEALED_COPPER_RESISTIVITY).toBeCloseTo(1.7241e-8, 12);
    expect(ANNEALED_COPPER_TEMPERATURE_COEFFICIENT).toBe(0.00393);
  });
});

describe("conversions", () => {
  it("convert Celsius and kelvin both ways", () => {
    expect(celsius(20)).toBe(293.15);
    expect(celsius(-273.15)).toBe(0);
    expect(toCelsius(373.15)).toBeCloseTo(100, 12);
    expect(() => celsius(-274)).toThrow(InputError);
    expect(() => toCelsius(-1)).toThrow(InputError);
    expect(() => celsius(NaN)).toThrow(InputError);
  });
  it("convert inch units exactly (1 in = 25.4 mm)", () => {
    expect(inches(1)).toBe(0.0254);
    expect(toInches(inches(3.5))).toBeCloseTo(3.5, 14);
    expect(mils(1000)).toBeCloseTo(0.0254, 16);
    expect(toMils(mils(12))).toBeCloseTo(12, 12);
    expect(millimetres(25.4)).toBe(inches(1));
    expect(toMillimetres(0.0254)).toBeCloseTo(25.4, 12);
    expect(() => inches(Infinity)).toThrow(InputError);
  });
});
