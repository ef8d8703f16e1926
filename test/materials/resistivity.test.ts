import { describe, expect, it } from "vitest";
import { InputError, celsius } from "../../src/index.js";
import { aluminium, aluminiumAlloy, brass, copper, ferriticStainless, lowCarbonSteel, mediumCarbonSteel, resistivityAt, austeniticStainless, silver, titaniumAlloy } from "../../src/materials/index.js";
import data from "../fixtures/materials/resistivity-linear.json" with { type: "json" };

const sets = { copper, aluminium } as const;

describe("resistivityAt", () => {
  it("gives annealed copper 1/58 µΩ·m at 20 °C (IEC 60028)", () => {
    expect(resistivityAt(copper, celsius(20))).toBeCloseTo(1.7241e-8, 12); // IEC 60028
    expect(copper.temperatureCoefficient).toBe(0.00393); // IEC 60028
  });

  it("gives hard-drawn aluminium 0.028264 µΩ·m at 20 °C (IEC 60889)", () => {
    expect(resistivityAt(aluminium, celsius(20))).toBe(2.8264e-8); // IEC 60889
  });

  it("matches the IEC linear laws (fixture from mpmath, generate.py)", () => {
    for (const c of data.cases) {
      const got = resistivityAt(sets[c.material as keyof typeof sets], c.temperature);
      expect(Math.abs(got - c.resistivity) / c.resistivity).toBeLessThanOrEqual(data.meta.rtol);
    }
  });

  it("reads tabulated steel data exactly at the table points (consistency, not an outside check: the steel tables above 20 °C are unverified, docs/unverified-values.md)", () => {
    expect(resistivityAt(lowCarbonSteel, celsius(1000))).toBeCloseTo(1.15e-6, 15);
  });

  it("gives the room-temperature resistivities of the alloy data sheets", () => {
    expect(resistivityAt(austeniticStainless, celsius(20))).toBeCloseTo(0.72e-6, 15); // ASM/MatWeb AISI 304: 72 µΩ·cm at 20 °C
    expect(resistivityAt(ferriticStainless, celsius(20))).toBeCloseTo(0.6e-6, 15); // AK Steel Type 430: 60 µΩ·cm at 21 °C
    expect(resistivityAt(brass, celsius(20))).toBeCloseTo(6.16e-8, 10); // Olin Brass C26000: 6.16 µΩ·cm (28 % IACS)
    expect(Math.abs(resistivityAt(aluminiumAlloy, celsius(20)) - 3.99e-8) / 3.99e-8).toBeLessThan(0.01); // AA typical 6061-T6: 3.99 µΩ·cm (MatWeb), 43 % IACS
    const ti = resistivityAt(titaniumAlloy, celsius(20));
    expect(ti).toBeGreaterThanOrEqual(1.68e-6); // producers' data sheets: 1.68 µΩ·m …
    expect(ti).toBeLessThanOrEqual(1.78e-6); // … to 1.78 µΩ·m (ASM/MatWeb, BTI Metals)
  });

  it("gives medium-carbon steel 22.1 and 29.6 µΩ·cm at 100 and 200 °C (ASM/MatWeb AISI 1040 sheets) and low-carbon steel 0.143 µΩ·m at 20 °C within 1 % (MatMake and MatWeb AISI 1010)", () => {
    expect(resistivityAt(mediumCarbonSteel, celsius(100))).toBeCloseTo(0.221e-6, 15); // MatWeb AISI 1040: 22.1 µΩ·cm at 100 °C
    expect(resistivityAt(mediumCarbonSteel, celsius(200))).toBeCloseTo(0.296e-6, 15); // MatWeb AISI 1040: 29.6 µΩ·cm at 200 °C
    expect(Math.abs(resistivityAt(lowCarbonSteel, celsius(20)) - 0.143e-6) / 0.143e-6).toBeLessThan(0.01); // MatMake 1010: 1.43 × 10⁻⁷ Ω·m
  });

  it("gives AISI 304 the resistivity of Valley Design's type 304 page at 100 and 200 °C and within 3 % at 400 and 600 °C", () => {
    // Valley Design 'Type 304 and 304L Stainless Steel': 78, 86, 100, 111 µΩ·cm at 100, 200, 400, 600 °C
    // (ASM/MatWeb AISI 302: the same 78, 86, 100 µΩ·cm up to 400 °C)
    expect(resistivityAt(austeniticStainless, celsius(100))).toBeCloseTo(0.78e-6, 15);
    expect(resistivityAt(austeniticStainless, celsius(200))).toBeCloseTo(0.86e-6, 15);
    for (const [t, rho] of [[400, 1.0e-6], [600, 1.11e-6]] as const) {
      expect(Math.abs(resistivityAt(austeniticStainless, celsius(t)) - rho) / rho).toBeLessThan(0.03);
    }
  });

  it("gives silver 1.587 × 10⁻⁸ Ω·m at 293 K (CRC Handbook, Electrical Resistivity of Pure Metals) and 0.0038 /K (OpenStax University Physics Vol. 2, §9.3, Table 9.1)", () => {
    expect(resistivityAt(silver, 293.15)).toBeCloseTo(1.587e-8, 13); // CRC Handbook 2010, p. 12-40 ff.: 1.587 at 293 K
    expect(Number(resistivityAt(silver, celsius(20)).toPrecision(3))).toBe(1.59e-8); // OpenStax Table 9.1: 1.59 × 10⁻⁸ Ω·m
    // CRC slope between 273 and 300 K, (1.629 − 1.467)/27 per K over 1.587: 0.00378 /K
    expect(Math.abs(silver.temperatureCoefficient - (1.629 - 1.467) / 27 / 1.587)).toBeLessThan(0.00003);
    expect(silver.temperatureCoefficient).toBe(0.0038); // OpenStax Table 9.1: α = 0.0038 /°C
    expect(silver.density).toBe(10500); // Incropera et al. 7th ed., Table A.1, pure silver at 300 K
  });

  it("gives brass the 1.5 × 10⁻³ /K of the Engineering ToolBox's resistivity table (brasses of 58 % and 63 % Cu)", () => {
    expect(brass.temperatureCoefficient).toBe(1.5e-3); // Engineering ToolBox, resistivity-conductivity-d_418
    expect(resistivityAt(brass, celsius(120)) / resistivityAt(brass, celsius(20))).toBeCloseTo(1 + 1.5e-3 * 100, 12);
  });

  it("holds end values outside the documented range", () => {
    expect(resistivityAt(copper, 10)).toBe(resistivityAt(copper, copper.temperatureRange.min));
    expect(resistivityAt(lowCarbonSteel, 3000)).toBe(resistivityAt(lowCarbonSteel, celsius(1300)));
  });

  it("gives copper at 100 °C by the IEC 60028 linear law computed by hand: (1/58) µΩ·m × (1 + 0.00393 × 80)", () => {
    const iec60028 = (1e-6 / 58) * (1 + 0.00393 * 80); // IEC 60028: 1/58 Ω·mm²/m at 20 °C, 0.00393 /K
    expect(Math.abs(resistivityAt(copper, celsius(100)) - iec60028) / iec60028).toBeLessThan(1e-4); // ANNEALED_COPPER_RESISTIVITY is 1.7241e-8, 1/58 rounded to 5 digits
  });

  it("throws InputError for bad temperature or material", () => {
    expect(() => resistivityAt(copper, 0)).toThrow(InputError);
    expect(() => resistivityAt(copper, -5)).toThrow(InputError);
    expect(() => resistivityAt(copper, Number.NaN)).toThrow(InputError);
    expect(() => resistivityAt(copper, Infinity)).toThrow(/temperature/);
    expect(() => resistivityAt(null as never, 300)).toThrow(InputError);
  });
});
