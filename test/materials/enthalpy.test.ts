import { describe, expect, it } from "vitest";
import { InputError, celsius } from "../../src/index.js";
import { austeniticStainless, copper, lowCarbonSteel, specificEnthalpyChange, specificHeatAt } from "../../src/materials/index.js";

const rel = (a: number, b: number): number => Math.abs(a - b) / Math.abs(b);

describe("specificEnthalpyChange", () => {
  it("integrates EN 1993-1-2 eq. (3.2) from 20 °C to 200 °C in closed form (88 191.1512 J/kg, polynomial integrated by hand)", () => {
    expect(rel(specificEnthalpyChange(lowCarbonSteel, { fromTemperature: celsius(20), toTemperature: celsius(200) }), 88191.1512)).toBeLessThan(1e-12);
  });

  it("captures the carbon-steel peak: 600–900 °C gives 650 × 300 + 101 326.025 J/kg (mpmath quad of EN 1993-1-2 eq. (3.2))", () => {
    const dh = specificEnthalpyChange(lowCarbonSteel, { fromTemperature: celsius(600), toTemperature: celsius(900) });
    expect(rel(dh, 650 * 300 + 101326.025021924)).toBeLessThan(1e-12);
  });

  it("integrates a table exactly: copper 300 → 400 K is (385 + 397)/2 × 100 J/kg (Incropera Table A.1 values)", () => {
    expect(specificEnthalpyChange(copper, { fromTemperature: 300, toTemperature: 400 })).toBeCloseTo(39100, 9);
  });

  it("is antisymmetric and additive", () => {
    const a = celsius(100);
    const b = celsius(760);
    const c = celsius(1250);
    for (const m of [lowCarbonSteel, austeniticStainless]) {
      const ab = specificEnthalpyChange(m, { fromTemperature: a, toTemperature: b });
      const bc = specificEnthalpyChange(m, { fromTemperature: b, toTemperature: c });
      const ac = specificEnthalpyChange(m, { fromTemperature: a, toTemperature: c });
      expect(specificEnthalpyChange(m, { fromTemperature: b, toTemperature: a })).toBe(-ab);
      expect(rel(ab + bc, ac)).toBeLessThan(1e-13);
    }
  });

  it("agrees with a fine trapezoid rule over specificHeatAt across the documented range", () => {
    for (const m of [lowCarbonSteel, austeniticStainless, copper]) {
      const a = m.temperatureRange.min - 50;
      const b = m.temperatureRange.max + 50;
      const n = 400000;
      const h = (b - a) / n;
      let s = 0;
      for (let i = 0; i < n; i++) s += 0.5 * h * (specificHeatAt(m, a + i * h) + specificHeatAt(m, a + (i + 1) * h));
      expect(rel(specificEnthalpyChange(m, { fromTemperature: a, toTemperature: b }), s)).toBeLessThan(1e-6);
    }
  });

  it("throws InputError for bad temperatures", () => {
    expect(() => specificEnthalpyChange(copper, { fromTemperature: 0, toTemperature: 300 })).toThrow(InputError);
    expect(() => specificEnthalpyChange(copper, { fromTemperature: 300, toTemperature: Number.NaN })).toThrow(/toTemperature/);
    expect(() => specificEnthalpyChange(copper, null as never)).toThrow(InputError);
  });
});
