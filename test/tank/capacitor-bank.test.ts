import { describe, expect, it } from "vitest";
import { capacitorBank, E12, E24, E96, InputError } from "../../src/index.js";
import data from "../fixtures/tank/e-series.json" with { type: "json" };

describe("E-series (IEC 60063)", () => {
  it("match the generated IEC 60063 series (fixture e-series.json)", () => {
    expect([...E12]).toEqual(data.E12); // IEC 60063:2015 Table 1, via e_series.py
    expect([...E24]).toEqual(data.E24); // IEC 60063:2015 Table 1, via e_series.py
    expect([...E96]).toEqual(data.E96); // IEC 60063:2015 Table 2, via e_series.py
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
