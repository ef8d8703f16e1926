import { describe, expect, it } from "vitest";
import { InputError } from "../../src/index.js";
import { steinmetzLoss, steinmetzTemperatureFactor } from "../../src/coreloss/index.js";
import { inventedExampleFerrite } from "../../src/materials/index.js";

describe("steinmetzLoss", () => {
  it("evaluates k f^α B̂^β (Steinmetz 1892 form; value checked with python3 float arithmetic: 125296.80840681806)", () => {
    const p = steinmetzLoss({ k: 2.5, alpha: 1.45, beta: 2.55, frequency: 100e3, fluxDensityPeak: 0.1 });
    expect(Math.abs(p - 125296.80840681806) / p).toBeLessThan(1e-15);
  });

  it("gives zero at zero flux", () => {
    expect(steinmetzLoss({ k: 2.5, alpha: 1.45, beta: 2.55, frequency: 1e5, fluxDensityPeak: 0 })).toBe(0);
  });

  it("accepts a CoreMaterial's coefficients by spreading", () => {
    const p = steinmetzLoss({ ...inventedExampleFerrite.steinmetz, frequency: 1e5, fluxDensityPeak: 0.1 });
    expect(p).toBeGreaterThan(0);
  });

  it("throws InputError for bad input", () => {
    const o = { k: 2.5, alpha: 1.45, beta: 2.55, frequency: 1e5, fluxDensityPeak: 0.1 };
    expect(() => steinmetzLoss({ ...o, beta: 0 })).toThrow(InputError);
    expect(() => steinmetzLoss({ ...o, frequency: -1 })).toThrow(/frequency/);
    expect(() => steinmetzLoss({ ...o, fluxDensityPeak: -0.1 })).toThrow(/fluxDensityPeak/);
    expect(() => steinmetzLoss({ ...o, k: Infinity })).toThrow(InputError);
    expect(() => steinmetzLoss(undefined as never)).toThrow(InputError);
  });
});

describe("steinmetzTemperatureFactor", () => {
  const term = { referenceTemperature: 373.15, linear: 2e-3, quadratic: 1e-4 };
  it("is 1 at the reference temperature and follows the quadratic (common datasheet form)", () => {
    expect(steinmetzTemperatureFactor(term, 373.15)).toBe(1);
    expect(steinmetzTemperatureFactor(term, 363.15)).toBeCloseTo(0.99, 14);
    expect(steinmetzTemperatureFactor(term, 298.15)).toBeCloseTo(1 - 0.15 + 0.5625, 14);
  });

  it("converts from the datasheet form c_t0 − c_t1 θ + c_t2 θ² by dividing by its value at the reference", () => {
    const ct0 = 2.45;
    const ct1 = 0.031;
    const ct2 = 0.000165;
    const q = (theta: number): number => ct0 - ct1 * theta + ct2 * theta * theta;
    const ref = 100;
    const converted = { referenceTemperature: ref + 273.15, linear: (-ct1 + 2 * ct2 * ref) / q(ref), quadratic: ct2 / q(ref) };
    for (const theta of [25, 60, 90, 120]) {
      expect(steinmetzTemperatureFactor(converted, theta + 273.15)).toBeCloseTo(q(theta) / q(ref), 12);
    }
  });

  it("throws InputError when the factor is not positive or the input is bad", () => {
    expect(() => steinmetzTemperatureFactor({ referenceTemperature: 300, linear: -0.1, quadratic: 0 }, 320)).toThrow(InputError);
    expect(() => steinmetzTemperatureFactor(term, 0)).toThrow(/temperature/);
    expect(() => steinmetzTemperatureFactor({ ...term, linear: Number.NaN }, 300)).toThrow(/linear/);
  });
});
