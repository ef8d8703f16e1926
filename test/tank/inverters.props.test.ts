import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { currentFedParallelInverter, frequencyForPower, parallelTank, seriesInverter } from "../../src/index.js";
import { capacitanceArb, inductanceArb, logUniform, settings } from "./arbitraries.js";

describe("currentFedParallelInverter properties", () => {
  it("capacitor RMS current is √2·Q/π times the DC supply current, and power = Vdc·Idc = V̂²/(2R_d)", () => {
    fc.assert(
      fc.property(logUniform(1, 400), inductanceArb, capacitanceArb, logUniform(1e-4, 0.9), (v, L, C, ratio) => {
        const op = currentFedParallelInverter({ supplyVoltage: v, inductance: L, capacitance: C, coilResistance: ratio * Math.sqrt(L / C) });
        expect(op.capacitorCurrentRms / op.supplyCurrent / ((Math.SQRT2 * op.qualityFactor) / Math.PI)).toBeCloseTo(1, 12);
        expect(op.power / (op.tankVoltagePeak ** 2 / (2 * op.dynamicResistance))).toBeCloseTo(1, 12);
        expect(op.tankVoltagePeak / (Math.PI * v)).toBeCloseTo(1, 14);
      }),
      settings,
    );
  });

  it("balances energy: power into the tank = coil I²R loss (first harmonic)", () => {
    fc.assert(
      fc.property(logUniform(1, 400), inductanceArb, capacitanceArb, logUniform(1e-4, 0.9), (v, L, C, ratio) => {
        const R = ratio * Math.sqrt(L / C);
        const op = currentFedParallelInverter({ supplyVoltage: v, inductance: L, capacitance: C, coilResistance: R });
        expect(op.power / (op.coilCurrentRms ** 2 * R)).toBeCloseTo(1, 10);
      }),
      settings,
    );
  });

  it("runs at the tank's zero-phase frequency, which scales as 1/√(LC)", () => {
    fc.assert(
      fc.property(inductanceArb, capacitanceArb, logUniform(1e-4, 0.9), logUniform(0.1, 10), (L, C, ratio, k) => {
        const R = ratio * Math.sqrt(L / C);
        const a = currentFedParallelInverter({ supplyVoltage: 12, inductance: L, capacitance: C, coilResistance: R });
        expect(a.frequency / (parallelTank({ inductance: L, capacitance: C, coilResistance: R }).zeroPhaseFrequency as number)).toBeCloseTo(1, 12);
        // Same R/√(L/C) ratio, L and C both ×k: frequency ÷k.
        const b = currentFedParallelInverter({ supplyVoltage: 12, inductance: L * k, capacitance: C * k, coilResistance: R });
        expect((b.frequency * k) / a.frequency).toBeCloseTo(1, 10);
      }),
      settings,
    );
  });
});

describe("seriesInverter properties", () => {
  it("conserves energy (P = I²R) and peaks at resonance", () => {
    fc.assert(
      fc.property(logUniform(1, 1000), inductanceArb, capacitanceArb, logUniform(1e-3, 10), logUniform(0.3, 3), fc.constantFrom("half" as const, "full" as const), (v, L, C, ratio, fr, bridge) => {
        const R = ratio * Math.sqrt(L / C);
        const f0 = 1 / (2 * Math.PI * Math.sqrt(L * C));
        const op = seriesInverter({ supplyVoltage: v, bridge, inductance: L, capacitance: C, resistance: R, switchingFrequency: fr * f0 });
        expect(op.power / (op.currentRms ** 2 * R)).toBeCloseTo(1, 12);
        const atResonance = seriesInverter({ supplyVoltage: v, bridge, inductance: L, capacitance: C, resistance: R, switchingFrequency: f0 });
        expect(op.power).toBeLessThanOrEqual(atResonance.power * (1 + 1e-12));
        expect(op.zeroVoltageSwitching).toBe(op.phase > 0);
      }),
      settings,
    );
  });

  it("frequencyForPower inverts seriesInverter on the inductive side and falls as the target power rises", () => {
    fc.assert(
      fc.property(logUniform(1, 1000), inductanceArb, capacitanceArb, logUniform(1e-3, 10), fc.double({ min: 0.01, max: 0.99, noNaN: true }), (v, L, C, ratio, share) => {
        const R = ratio * Math.sqrt(L / C);
        const pMax = ((2 * v) / Math.PI) ** 2 / (2 * R);
        const options = { supplyVoltage: v, bridge: "half" as const, inductance: L, capacitance: C, resistance: R };
        const f = frequencyForPower({ ...options, power: share * pMax });
        const op = seriesInverter({ ...options, switchingFrequency: f });
        expect(op.power / (share * pMax)).toBeCloseTo(1, 8);
        expect(op.zeroVoltageSwitching).toBe(true);
        const fHigher = frequencyForPower({ ...options, power: Math.min(1, share * 1.01) * pMax });
        expect(fHigher).toBeLessThanOrEqual(f);
      }),
      settings,
    );
  });
});
