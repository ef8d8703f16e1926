import { describe, expect, it } from "vitest";
import { InputError, MU_0, celsius } from "../../src/index.js";
import {
  austeniticStainless,
  copper,
  ferriticStainless,
  lowCarbonSteel,
  mediumCarbonSteel,
  relativePermeabilityAt,
  saturationFluxDensityAt,
} from "../../src/materials/index.js";
import data from "../fixtures/materials/permeability-model.json" with { type: "json" };

const sets = { lowCarbonSteel, mediumCarbonSteel, ferriticStainless } as const;

describe("relativePermeabilityAt", () => {
  it("matches an independent mpmath evaluation of the documented model (fixture, generate.py)", () => {
    for (const c of data.cases) {
      const got = relativePermeabilityAt(sets[c.material as keyof typeof sets], {
        temperature: c.temperature,
        fieldStrengthPeak: c.fieldStrength,
      });
      expect(Math.abs(got - c.relativePermeability) / c.relativePermeability).toBeLessThanOrEqual(data.meta.rtol);
    }
  });

  it("is exactly 1 at and above the Curie temperature", () => {
    for (const m of [lowCarbonSteel, mediumCarbonSteel, ferriticStainless]) {
      const tc = m.curieTemperature as number;
      expect(relativePermeabilityAt(m, { temperature: tc })).toBe(1);
      expect(relativePermeabilityAt(m, { temperature: tc + 0.5, fieldStrengthPeak: 10 })).toBe(1);
    }
  });

  it("is exactly 1 for non-magnetic materials", () => {
    expect(relativePermeabilityAt(copper, { temperature: 300 })).toBe(1);
    expect(relativePermeabilityAt(austeniticStainless, { temperature: 300, fieldStrengthPeak: 1e4 })).toBe(1);
  });

  it("equals the low-field value without a field strength", () => {
    expect(relativePermeabilityAt(lowCarbonSteel, { temperature: 300 })).toBe(1000);
    expect(relativePermeabilityAt(lowCarbonSteel, { temperature: 300, fieldStrengthPeak: 0 })).toBe(1000);
  });

  it("approaches the saturated limit 1 + Bs/(μ0 H) in strong fields (B = μ0(H + Ms), common practice)", () => {
    const h = 1e7;
    const expected = 1 + 2.0 / MU_0 / h;
    const got = relativePermeabilityAt(lowCarbonSteel, { temperature: celsius(20), fieldStrengthPeak: h });
    expect(Math.abs(got - expected) / expected).toBeLessThan(2e-3);
  });

  it("follows the documented Fröhlich–Kennelly form at 20 °C, computed by hand: 1/(μr − 1) = 1/(μi − 1) + μ0 H / Bs", () => {
    expect(relativePermeabilityAt(lowCarbonSteel, { temperature: celsius(800) })).toBe(1); // above Tc: exactly 1 (documented limit)
    const mu0 = 1.25663706212e-6; // CODATA 2018
    const byHand = 1 + 1 / (1 / (1000 - 1) + (mu0 * 1e5) / 2.0); // μi = 1000, Bs = 2.0 T, H = 1e5 A/m, far below Tc (S = 1, m ratio 1)
    const got = relativePermeabilityAt(lowCarbonSteel, { temperature: celsius(20), fieldStrengthPeak: 1e5 });
    expect(Math.abs(got - byHand) / byHand).toBeLessThan(1e-9);
  });

  it("throws InputError for bad conditions", () => {
    expect(() => relativePermeabilityAt(lowCarbonSteel, { temperature: 0 })).toThrow(InputError);
    expect(() => relativePermeabilityAt(lowCarbonSteel, { temperature: 300, fieldStrengthPeak: -1 })).toThrow(/conditions\.fieldStrengthPeak/);
    expect(() => relativePermeabilityAt(lowCarbonSteel, { temperature: 300, fieldStrengthPeak: Number.NaN })).toThrow(InputError);
    expect(() => relativePermeabilityAt(lowCarbonSteel, null as never)).toThrow(InputError);
  });
});

describe("saturationFluxDensityAt", () => {
  it("returns the tabulated 20 °C value and 0 at and above Curie", () => {
    expect(saturationFluxDensityAt(lowCarbonSteel, celsius(20))).toBe(2);
    expect(saturationFluxDensityAt(lowCarbonSteel, lowCarbonSteel.curieTemperature as number)).toBe(0);
    expect(saturationFluxDensityAt(copper, 300)).toBe(0);
  });

  it("falls with temperature to between 0.6 and 0.8 of its 20 °C value at 0.85 Tc (consistency, not an outside check: the expected range is recalled from Kuz'min 2005, Fig. 1, and s, p are unverified, docs/unverified-values.md)", () => {
    const tc = lowCarbonSteel.curieTemperature as number;
    const ratio = saturationFluxDensityAt(lowCarbonSteel, 0.85 * tc) / 2;
    expect(ratio).toBeGreaterThan(0.6);
    expect(ratio).toBeLessThan(0.8);
  });

  it("throws InputError for a bad temperature", () => {
    expect(() => saturationFluxDensityAt(lowCarbonSteel, -1)).toThrow(InputError);
  });
});
