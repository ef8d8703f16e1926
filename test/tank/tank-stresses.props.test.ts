import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { parallelTank, seriesTank, tankImpedance, tankStresses } from "../../src/index.js";
import { capacitanceArb, inductanceArb, logUniform, resistanceArb, settings } from "./arbitraries.js";

describe("tankStresses properties", () => {
  it("conserves energy: power in = Re(V·I*) from the impedance = I²R losses (series tank)", () => {
    fc.assert(
      fc.property(inductanceArb, capacitanceArb, resistanceArb, logUniform(0.2, 5), logUniform(1e-3, 1e4), (L, C, R, ratio, v) => {
        const t = seriesTank({ inductance: L, capacitance: C, resistance: R });
        const f = ratio * t.undampedFrequency;
        const s = tankStresses(t, { frequency: f, voltageRms: v });
        const z = tankImpedance(t, f);
        expect(s.power / ((v * v * z.re) / (z.re * z.re + z.im * z.im))).toBeCloseTo(1, 10);
        expect(s.power / (s.coilCurrentRms ** 2 * R)).toBeCloseTo(1, 12);
      }),
      settings,
    );
  });

  it("conserves energy in the parallel tank: V²·Re Y = I_L²R + V²/Rp", () => {
    fc.assert(
      fc.property(inductanceArb, capacitanceArb, logUniform(1e-4, 2), logUniform(1e-2, 1e4), logUniform(0.2, 5), (L, C, ratio, rp, fr) => {
        const z0 = Math.sqrt(L / C);
        const t = parallelTank({ inductance: L, capacitance: C, coilResistance: ratio * z0, parallelResistance: rp * z0 });
        const f = fr * t.undampedFrequency;
        const s = tankStresses(t, { frequency: f, voltageRms: 10 });
        const z = tankImpedance(t, f);
        expect(s.power / ((100 * z.re) / (z.re * z.re + z.im * z.im))).toBeCloseTo(1, 9);
        expect(s.power).toBeCloseTo(s.coilLossPower + s.parallelResistancePower, 12);
      }),
      settings,
    );
  });

  it("makes the capacitor-to-line current ratio equal Q at resonance, to first order (error ≤ 1/Q)", () => {
    fc.assert(
      fc.property(inductanceArb, capacitanceArb, logUniform(1e-4, 0.1), (L, C, ratio) => {
        const t = parallelTank({ inductance: L, capacitance: C, coilResistance: ratio * Math.sqrt(L / C) });
        const s = tankStresses(t, { frequency: t.zeroPhaseFrequency as number, voltageRms: 1 });
        const q = t.qualityFactor;
        expect(Math.abs(s.capacitorCurrentRms / s.driveCurrentRms / q - 1)).toBeLessThanOrEqual(1 / q);
      }),
      settings,
    );
  });

  it("scales currents linearly and powers quadratically with the drive", () => {
    fc.assert(
      fc.property(inductanceArb, capacitanceArb, resistanceArb, logUniform(1e-2, 1e2), (L, C, R, k) => {
        const t = seriesTank({ inductance: L, capacitance: C, resistance: R });
        const a = tankStresses(t, { frequency: t.undampedFrequency * 1.1, currentRms: 1 });
        const b = tankStresses(t, { frequency: t.undampedFrequency * 1.1, currentRms: k });
        expect(b.capacitorVoltageRms / a.capacitorVoltageRms / k).toBeCloseTo(1, 12);
        expect(b.storedEnergyPeak / a.storedEnergyPeak / (k * k)).toBeCloseTo(1, 12);
        expect(b.capacitorReactivePower / a.capacitorReactivePower / (k * k)).toBeCloseTo(1, 12);
      }),
      settings,
    );
  });
});
