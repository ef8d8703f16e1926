import { describe, expect, it } from "vitest";
import { capacitorBank, E12, E24, E96, InputError } from "../../src/index.js";
import data from "../fixtures/tank/e-series.json" with { type: "json" };

describe("E-series (IEC 60063)", () => {
  it("match the generated IEC 60063 series (fixture e-series.json)", () => {
    expect([...E12]).toEqual(data.E12); // IEC 60063:2015 Table 1, via e_series.py
    expect([...E24]).toEqual(data.E24); // IEC 60063:2015 Table 1, via e_series.py
    expect([...E96]).toEqual(data.E96); // IEC 60063:2015 Table 2, via e_series.py
  });
  it("equal the published IEC 60063 tables, transcribed from a textbook appendix", () => {
    // "Normreihen der Bauelemente", appendix A.5 of the RWTH Aachen MSP430 textbook (HTML
    // edition), which lists E12, E24, E48 and E96; E12/E24 also in the IEC 60063 table of the
    // Wikipedia article "E series of preferred numbers". Typed from those pages, not generated.
    const publishedE12 = [1.0, 1.2, 1.5, 1.8, 2.2, 2.7, 3.3, 3.9, 4.7, 5.6, 6.8, 8.2];
    const publishedE24 = [1.0, 1.1, 1.2, 1.3, 1.5, 1.6, 1.8, 2.0, 2.2, 2.4, 2.7, 3.0, 3.3, 3.6, 3.9, 4.3, 4.7, 5.1, 5.6, 6.2, 6.8, 7.5, 8.2, 9.1];
    const publishedE96 = [
      1.0, 1.02, 1.05, 1.07, 1.1, 1.13, 1.15, 1.18, 1.21, 1.24, 1.27, 1.3, 1.33, 1.37, 1.4, 1.43, 1.47, 1.5, 1.54, 1.58, 1.62, 1.65, 1.69, 1.74,
      1.78, 1.82, 1.87, 1.91, 1.96, 2.0, 2.05, 2.1, 2.15, 2.21, 2.26, 2.32, 2.37, 2.43, 2.49, 2.55, 2.61, 2.67, 2.74, 2.8, 2.87, 2.94, 3.01, 3.09,
      3.16, 3.24, 3.32, 3.4, 3.48, 3.57, 3.65, 3.74, 3.83, 3.92, 4.02, 4.12, 4.22, 4.32, 4.42, 4.53, 4.64, 4.75, 4.87, 4.99, 5.11, 5.23, 5.36, 5.49,
      5.62, 5.76, 5.9, 6.04, 6.19, 6.34, 6.49, 6.65, 6.81, 6.98, 7.15, 7.32, 7.5, 7.68, 7.87, 8.06, 8.25, 8.45, 8.66, 8.87, 9.09, 9.31, 9.53, 9.76,
    ];
    expect([...E12]).toEqual(publishedE12);
    expect([...E24]).toEqual(publishedE24);
    expect([...E96]).toEqual(publishedE96);
  });
  it("contain E12 inside E24", () => {
    for (const v of E12) expect(E24).toContain(v);
  });
});

describe("capacitorBank", () => {
  const base = {
    capacitance: 2e-6,
    voltageRms: 600,
    currentRms: 300,
    frequency: 40e3,
    series: "E12" as const,
    unitVoltageRmsRating: 400,
    unitCurrentRmsRating: 60,
  };

  it("runs the documented example: 2 in series × 6 in parallel of 0.68 µF", () => {
    const bank = capacitorBank(base);
    expect([bank.seriesCount, bank.parallelCount, bank.unitCapacitance]).toEqual([2, 6, 6.8e-7]);
    expect(bank.capacitance).toBeCloseTo(2.04e-6, 18);
    expect(bank.capacitanceError).toBeCloseTo(0.02, 12);
    expect(bank.withinTolerance).toBe(true);
  });

  it("keeps every unit within its voltage and current rating", () => {
    const bank = capacitorBank(base);
    expect(bank.unitVoltageRms).toBeLessThanOrEqual(400);
    expect(bank.unitCurrentRms).toBeLessThanOrEqual(60);
    // The achieved bank at 600 V, 40 kHz draws ωCV = 307.6 A > 300 A: that is the current shared.
    expect(bank.unitCurrentRms * bank.parallelCount).toBeCloseTo(2 * Math.PI * 40e3 * 2.04e-6 * 600, 9);
  });

  it("respects a reactive-power rating per unit", () => {
    const bank = capacitorBank({ ...base, unitReactivePowerRating: 8000 });
    expect(bank.unitReactivePower).toBeLessThanOrEqual(8000);
    expect(bank.unitCount).toBeGreaterThan(12);
  });

  it("accepts a custom list of mantissas and E96", () => {
    const bank = capacitorBank({ ...base, series: E96, tolerance: 0.01 });
    expect(bank.withinTolerance).toBe(true);
    expect(Math.abs(bank.capacitanceError)).toBeLessThanOrEqual(0.01);
  });

  it("returns the closest bank with withinTolerance false and a note when none meets the tolerance", () => {
    const bank = capacitorBank({ ...base, series: [1.0], tolerance: 0.001, maxUnits: 4, unitCurrentRmsRating: 1000 });
    expect(bank.withinTolerance).toBe(false);
    expect(bank.validity.map((v) => v.code)).toContain("bank-outside-tolerance");
  });

  it("throws InputError for bad inputs", () => {
    expect(() => capacitorBank({ ...base, capacitance: 0 })).toThrow(InputError);
    expect(() => capacitorBank({ ...base, series: "E7" as never })).toThrow(/series/);
    expect(() => capacitorBank({ ...base, series: [0.5] })).toThrow(InputError);
    expect(() => capacitorBank({ ...base, tolerance: 0 })).toThrow(InputError);
    expect(() => capacitorBank({ ...base, maxUnits: 0 })).toThrow(InputError);
    expect(() => capacitorBank({ ...base, minUnitCapacitance: 1e-3, maxUnitCapacitance: 1e-6 })).toThrow(InputError);
    // Ratings impossible within maxUnits: 600 V over 1 V units needs 600 in series.
    expect(() => capacitorBank({ ...base, unitVoltageRmsRating: 1 })).toThrow(/maxUnits/);
  });
});

describe("capacitorBank without unit ratings", () => {
  it("applies no rating limit and reports the per-unit stresses to check against a part", () => {
    const bank = capacitorBank({ capacitance: 4.7e-6, voltageRms: 300, currentRms: 350, frequency: 40e3, series: "E24" });
    expect(bank.unitCount).toBe(1); // 4.7 µF is an E24 value
    expect(bank.unitCapacitance).toBe(4.7e-6);
    expect(bank.capacitanceError).toBeCloseTo(0, 12);
    expect(bank.unitVoltageRms).toBe(300);
  });
});
