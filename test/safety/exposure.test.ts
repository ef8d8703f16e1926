import { describe, it, expect } from "vitest";
import { exposureCheck, icnirpReferenceLevel, InputError } from "../../src/index.js";

// ICNIRP (2010), Health Physics 99(6):818–836, Table 3 (occupational) and Table 4 (general
// public): values from the published tables.
describe("icnirpReferenceLevel: ICNIRP 2010 Tables 3 and 4", () => {
  it.each([
    // [frequency Hz, general public T, occupational T]
    [1, 4e-2, 0.2],
    [5, 4e-2 / 25, 0.2 / 25],
    [10, 5e-4, 2.5e-3],
    [50, 2e-4, 1e-3], // 50 Hz: 200 µT public, 1 mT occupational (ICNIRP 2010)
    [60, 2e-4, 1e-3],
    [350, 2e-4, 0.3 / 350],
    [1000, 8e-5, 3e-4],
    [3000, 8e-2 / 3000, 1e-4],
    [20000, 2.7e-5, 1e-4], // induction heating band: 27 µT public, 100 µT occupational
    [100000, 2.7e-5, 1e-4],
    [1e7, 2.7e-5, 1e-4],
  ])("at %s Hz: public %s T, occupational %s T", (f, pub, occ) => {
    expect(icnirpReferenceLevel(f, "general-public")).toBeCloseTo(pub, 15);
    expect(icnirpReferenceLevel(f, "occupational")).toBeCloseTo(occ, 15);
  });

  it("is continuous across band edges within the tables' rounding (≤ 1.3 %)", () => {
    for (const population of ["general-public", "occupational"] as const) {
      for (const edge of [8, 25, 300, 400, 3000]) {
        const below = icnirpReferenceLevel(edge * (1 - 1e-9), population);
        const above = icnirpReferenceLevel(edge * (1 + 1e-9), population);
        expect(Math.abs(above / below - 1)).toBeLessThan(0.013);
      }
    }
  });
});

describe("exposureCheck", () => {
  it("reports the level, ratio and exceedance, naming the guideline and table", () => {
    const r = exposureCheck({ fluxDensityRms: 54e-6, frequency: 30000, population: "general-public" });
    expect(r.referenceLevel).toBe(2.7e-5);
    expect(r.ratio).toBeCloseTo(2, 14);
    expect(r.exceeded).toBe(true);
    expect(r.source).toMatch(/ICNIRP \(2010\)/);
    expect(r.source).toMatch(/Health Physics 99\(6\)/);
    expect(r.source).toMatch(/Table 4/);
    expect(r.source).toMatch(/published tables/);
  });

  it("the same field is within the occupational level (Table 3)", () => {
    const r = exposureCheck({ fluxDensityRms: 54e-6, frequency: 30000, population: "occupational" });
    expect(r.exceeded).toBe(false);
    expect(r.ratio).toBeCloseTo(0.54, 14);
    expect(r.source).toMatch(/Table 3/);
  });

  it("exactly at the level is not exceeded", () => {
    expect(exposureCheck({ fluxDensityRms: 2e-4, frequency: 50, population: "general-public" }).exceeded).toBe(false);
  });

  it.each([
    ["negative flux density", { fluxDensityRms: -1, frequency: 50, population: "general-public" }],
    ["NaN flux density", { fluxDensityRms: Number.NaN, frequency: 50, population: "general-public" }],
    ["frequency below 1 Hz", { fluxDensityRms: 1e-6, frequency: 0.5, population: "general-public" }],
    ["frequency above 10 MHz", { fluxDensityRms: 1e-6, frequency: 2e7, population: "general-public" }],
    ["unknown population", { fluxDensityRms: 1e-6, frequency: 50, population: "children" }],
    ["not an object", null],
  ])("throws InputError for %s", (_name, options) => {
    expect(() => exposureCheck(options as never)).toThrow(InputError);
  });
});
