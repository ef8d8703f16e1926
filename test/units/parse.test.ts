import { describe, expect, it } from "vitest";
import { InputError } from "../../src/core/index.js";
import { parseQuantity } from "../../src/units/index.js";

describe("parseQuantity", () => {
  it("reads 4.7 µF as the double nearest 4.7e-6 (within 1 ulp, foundation acceptance)", () => {
    expect(parseQuantity("4.7 µF", "F")).toBe(4.7e-6);
  });

  it("accepts the micro sign, the Greek mu and u for micro", () => {
    expect(parseQuantity("4.7 \u00b5F", "F")).toBe(4.7e-6);
    expect(parseQuantity("4.7 \u03bcF", "F")).toBe(4.7e-6);
    expect(parseQuantity("4.7uF", "F")).toBe(4.7e-6);
  });

  it("reads decimal and scientific notation with or without a space and unit", () => {
    expect(parseQuantity("12.5 kHz", "Hz")).toBe(12500);
    expect(parseQuantity("12.5kHz")).toBe(12500);
    expect(parseQuantity("330nH", "H")).toBe(330e-9);
    expect(parseQuantity("-3e-3 m", "m")).toBe(-0.003);
    expect(parseQuantity("+.5 mm")).toBe(0.0005);
    expect(parseQuantity("1.5E3")).toBe(1500);
    expect(parseQuantity("  42  ")).toBe(42);
    expect(parseQuantity("\u22122 V", "V")).toBe(-2);
  });

  it("reads RKM codes as IEC 60062 writes them", () => {
    // IEC 60062:2016, §4 examples of the RKM code: the letter stands for the decimal point.
    expect(parseQuantity("4k7")).toBe(4700);
    expect(parseQuantity("4K7")).toBe(4700);
    expect(parseQuantity("4R7")).toBe(4.7);
    expect(parseQuantity("0R22", "Ω")).toBe(0.22);
    expect(parseQuantity("R47")).toBe(0.47);
    expect(parseQuantity("47R")).toBe(47);
    expect(parseQuantity("2n2", "F")).toBe(2.2e-9);
    expect(parseQuantity("4µ7", "F")).toBe(4.7e-6);
    expect(parseQuantity("6p8", "F")).toBe(6.8e-12);
    expect(parseQuantity("1M5", "Ω")).toBe(1.5e6);
    expect(parseQuantity("47k")).toBe(47000);
  });

  it("reads ohms in every accepted spelling", () => {
    expect(parseQuantity("2.2 kΩ", "Ω")).toBe(2200);
    expect(parseQuantity("2.2 k\u2126", "Ω")).toBe(2200);
    expect(parseQuantity("2.2 kohm", "ohm")).toBe(2200);
    expect(parseQuantity("1.7241e-8 Ω·m", "Ω·m")).toBe(1.7241e-8);
  });

  it("raises a prefix with the metre in areas and volumes (SI Brochure §5.4.3)", () => {
    // SI Brochure, 9th edition, §5.4.3: "1 cm³ = (10⁻² m)³ = 10⁻⁶ m³".
    expect(parseQuantity("6 cm²", "m²")).toBe(6e-4);
    expect(parseQuantity("2.5 mm2", "m²")).toBe(2.5e-6);
    expect(parseQuantity("1 cm³", "m³")).toBe(1e-6);
    expect(parseQuantity("2 mm³", "m³")).toBe(2e-9);
    expect(parseQuantity("3 kW/m²", "W/m²")).toBe(3000);
  });

  it("knows the compound units of heat transfer", () => {
    expect(parseQuantity("15 W/(m²·K)", "W/(m²·K)")).toBe(15);
    expect(parseQuantity("50 W/(m·K)", "W/(m·K)")).toBe(50);
    expect(parseQuantity("460 J/(kg·K)", "J/(kg·K)")).toBe(460);
    expect(parseQuantity("7850 kg/m³", "kg/m³")).toBe(7850);
  });

  it("converts grams to kilograms and degrees Celsius to kelvin", () => {
    expect(parseQuantity("500 g", "kg")).toBe(0.5);
    expect(parseQuantity("1.2 kg", "kg")).toBe(1.2);
    expect(parseQuantity("20 °C", "K")).toBe(293.15);
  });

  it("reads a lone m or T as the unit, and a lone M as the prefix", () => {
    expect(parseQuantity("1 m")).toBe(1);
    expect(parseQuantity("1 T", "T")).toBe(1);
    expect(parseQuantity("1 M", "Ω")).toBe(1e6);
    expect(parseQuantity("3 dam", "m")).toBe(30);
    expect(parseQuantity("2.5 m", "")).toBe(0.0025);
    expect(() => parseQuantity("2.5 mH", "")).toThrow(InputError);
  });

  it("rejects a unit other than the expected one", () => {
    // Foundation issue: parseQuantity("10 mH", "F") throws InputError.
    expect(() => parseQuantity("10 mH", "F")).toThrow(InputError);
    expect(() => parseQuantity("1 m", "F")).toThrow(InputError);
    expect(() => parseQuantity("4R7", "F")).toThrow(InputError);
  });

  it("rejects unknown prefixes and garbage with InputError, never NaN", () => {
    for (const bad of ["4.7 xF", "", "   ", "abc", "1..2 V", "1e", "4.7 µ F F", "--1", "1e999 V", "NaN", "Infinity"]) {
      expect(() => parseQuantity(bad, "F"), bad).toThrow(InputError);
    }
    expect(() => parseQuantity(42 as unknown as string)).toThrow(InputError);
    expect(() => parseQuantity("1 F", "furlong")).toThrow(InputError);
  });

  it("names the text in its error message", () => {
    expect(() => parseQuantity("4.7 xF", "F")).toThrow(/^parseQuantity: text must be .*got "4\.7 xF"$/u);
  });
});
