import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { capacitorBank, E12, E24, E96 } from "../../src/index.js";
import { logUniform, settings } from "./arbitraries.js";

const seriesOf = { E12, E24, E96 } as const;

describe("capacitorBank properties", () => {
  it("never exceeds a unit rating, uses a standard value, and reports its achieved value consistently", () => {
    fc.assert(
      fc.property(
        logUniform(1e-8, 1e-4),
        logUniform(10, 3000),
        logUniform(1, 1000),
        logUniform(1e3, 1e6),
        fc.constantFrom("E12" as const, "E24" as const, "E96" as const),
        logUniform(100, 1500),
        logUniform(5, 200),
        (capacitance, voltageRms, currentRms, frequency, series, unitV, unitI) => {
          let bank;
          try {
            bank = capacitorBank({ capacitance, voltageRms, currentRms, frequency, series, unitVoltageRmsRating: unitV, unitCurrentRmsRating: unitI, maxUnits: 200 });
          } catch (e) {
            // Only when no array fits within maxUnits.
            expect(String(e)).toMatch(/maxUnits/);
            return;
          }
          expect(bank.unitVoltageRms).toBeLessThanOrEqual(unitV * (1 + 1e-9));
          expect(bank.unitCurrentRms).toBeLessThanOrEqual(unitI * (1 + 1e-9));
          expect(bank.capacitance / ((bank.unitCapacitance * bank.parallelCount) / bank.seriesCount)).toBeCloseTo(1, 12);
          expect(bank.capacitanceError).toBeCloseTo(bank.capacitance / capacitance - 1, 12);
          const exponent = Math.floor(Math.log10(bank.unitCapacitance) + 1e-12);
          const mantissa = Number((bank.unitCapacitance / Math.pow(10, exponent)).toPrecision(6));
          expect(seriesOf[series]).toContain(mantissa);
          expect(bank.withinTolerance).toBe(Math.abs(bank.capacitanceError) <= 0.05);
        },
      ),
      settings,
    );
  });
});
