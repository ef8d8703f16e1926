import { describe, it, expect } from "vitest";
import { steadyStateTemperature, InputError, STEFAN_BOLTZMANN } from "../../src/index.js";

const base = { surfaceArea: 0.01, convectionCoefficient: 20, emissivity: 0, ambientTemperature: 293.15 };

describe("steadyStateTemperature: closed forms of the surface energy balance (Incropera 6th ed., eq. 1.12)", () => {
  it("convection only: Ta + P/(hA)", () => {
    expect(steadyStateTemperature({ ...base, power: 100 })).toBeCloseTo(293.15 + 100 / 0.2, 10);
  });

  it("radiation only: (Ta⁴ + P/(εσA))^{1/4}", () => {
    const t = steadyStateTemperature({ ...base, convectionCoefficient: 0, emissivity: 0.8, power: 100 });
    expect(t).toBeCloseTo(Math.pow(293.15 ** 4 + 100 / (0.8 * STEFAN_BOLTZMANN * 0.01), 0.25), 9);
  });

  it("both: the balance P = hA(T − Ta) + εσA(T⁴ − Ta⁴) holds to 1e-12 relative", () => {
    const t = steadyStateTemperature({ ...base, emissivity: 0.8, power: 250 });
    const loss = 20 * 0.01 * (t - 293.15) + 0.8 * STEFAN_BOLTZMANN * 0.01 * (t ** 4 - 293.15 ** 4);
    expect(Math.abs(loss / 250 - 1)).toBeLessThan(1e-12);
  });

  it("zero power: ambient", () => {
    expect(steadyStateTemperature({ ...base, emissivity: 0.5, power: 0 })).toBe(293.15);
  });

  it("temperature-dependent power: settles at the first balance met from the start", () => {
    // Power 500 W below 900 K, 0 above (a crude Curie-like drop): losses of 500 W need 2793 K
    // by convection alone, so the part stalls where the power drops.
    const t = steadyStateTemperature({ ...base, powerAt: (T) => (T < 900 ? 500 : 0) });
    expect(t).toBeGreaterThanOrEqual(899.9);
    expect(t).toBeLessThanOrEqual(900.1);
  });

  it("constant powerAt gives the same as power", () => {
    const a = steadyStateTemperature({ ...base, emissivity: 0.6, power: 300 });
    const b = steadyStateTemperature({ ...base, emissivity: 0.6, powerAt: () => 300 });
    expect(Math.abs(a / b - 1)).toBeLessThan(1e-12);
  });
});

describe("steadyStateTemperature: bad input throws InputError", () => {
  it.each([
    ["no losses at all (unbounded rise)", { ...base, convectionCoefficient: 0, power: 10 }],
    ["negative power", { ...base, power: -1 }],
    ["both power and powerAt", { ...base, power: 1, powerAt: () => 1 }],
    ["neither power nor powerAt", { ...base }],
    ["negative convection", { ...base, convectionCoefficient: -1, power: 1 }],
    ["zero area", { ...base, surfaceArea: 0, power: 1 }],
    ["negative ambient", { ...base, ambientTemperature: -3, power: 1 }],
    ["non-object options", null],
  ])("%s", (_name, options) => {
    expect(() => steadyStateTemperature(options as never)).toThrow(InputError);
  });
});
