import { describe, expect, it } from "vitest";
import { InputError } from "../../src/core/index.js";
import { formatQuantity } from "../../src/units/index.js";

describe("formatQuantity", () => {
  it("prints engineering notation with SI prefixes", () => {
    expect(formatQuantity(4.7e-6, "F")).toBe("4.7 µF");
    expect(formatQuantity(12500, "Hz")).toBe("12.5 kHz");
    expect(formatQuantity(3.3e-7, "H")).toBe("330 nH");
    expect(formatQuantity(1, "V")).toBe("1 V");
    expect(formatQuantity(1e-3, "m")).toBe("1 mm");
    expect(formatQuantity(2.5e9, "Hz")).toBe("2.5 GHz");
  });

  it("handles zero, negatives and rounding across a prefix boundary", () => {
    expect(formatQuantity(0, "F")).toBe("0 F");
    expect(formatQuantity(-0.0022, "Ω")).toBe("-2.2 mΩ");
    expect(formatQuantity(999.96, "V")).toBe("1 kV");
    expect(formatQuantity(999.94, "V")).toBe("999.9 V");
  });

  it("respects the digits option", () => {
    expect(formatQuantity(Math.PI, "V", { digits: 3 })).toBe("3.14 V");
    expect(formatQuantity(Math.PI * 1e-9, "F", { digits: 6 })).toBe("3.14159 nF");
    expect(formatQuantity(1234567, "W", { digits: 2 })).toBe("1.2 MW");
  });

  it("falls back to scientific notation beyond quecto and quetta", () => {
    expect(formatQuantity(1e40, "F")).toBe("1e40 F");
    expect(formatQuantity(1.5e-35, "F")).toBe("1.5e-35 F");
    expect(formatQuantity(1e40, "")).toBe("1e40");
  });

  it("prints masses in grams and temperatures without prefix", () => {
    expect(formatQuantity(0.25, "kg")).toBe("250 g");
    expect(formatQuantity(1200, "kg")).toBe("1.2 Mg");
    expect(formatQuantity(293.15, "K", { digits: 5 })).toBe("293.15 K");
    expect(formatQuantity(4700, "")).toBe("4.7 k");
  });

  it("prints areas and volumes with the prefix of the metre", () => {
    expect(formatQuantity(0.0147, "m²")).toBe("14700 mm²");
    expect(formatQuantity(6e-4, "m²")).toBe("600 mm²");
    expect(formatQuantity(2.5e-6, "m²")).toBe("2.5 mm²");
    expect(formatQuantity(2e-9, "m³")).toBe("2 mm³");
    expect(formatQuantity(1.5, "m²")).toBe("1.5 m²");
    expect(formatQuantity(3e6, "m²")).toBe("3 km²");
  });

  it("rejects non-finite values and bad digit counts", () => {
    for (const bad of [NaN, Infinity, -Infinity]) expect(() => formatQuantity(bad, "F")).toThrow(InputError);
    for (const digits of [0, 18, 2.5]) expect(() => formatQuantity(1, "F", { digits })).toThrow(InputError);
  });
});
